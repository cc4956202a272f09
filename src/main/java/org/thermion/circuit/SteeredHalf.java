package org.thermion.circuit;

/**
 * A flip-flop opened at one cross-coupling link, as its steering input sees it: half A's grid
 * network fed from the input instead of from plate B, half B still driven from plate A, both
 * cathodes on the flip-flop's one return. Its curve from the input to plate A gives the
 * flip-flop's input thresholds with the other half counted: its current in a shared cathode
 * resistor and its divider on plate A. Opened, the circuit has one DC solution where the closed
 * loop has two.
 */
public record SteeredHalf(FlipFlop flipFlop) implements StageCircuit {

    public String name() {
        return flipFlop.name();
    }

    public int inputs() {
        return 1;
    }

    public boolean logic(boolean[] in, boolean stored) {
        return !in[0];
    }

    public boolean inverting() {
        return true;
    }

    public int build(CircuitBuilder b, double[] inputVolts, boolean stored) {
        return flipFlop.halves(b, b.source("in0", inputVolts[0]))[0];
    }

    public Load inputLoad() {
        return flipFlop.inputLoad();
    }
}
