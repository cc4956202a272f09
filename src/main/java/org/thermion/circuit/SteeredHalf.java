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
        FlipFlop f = flipFlop;
        int rail = b.rail(f.plateRail());
        int k = f.cathode().attach(b);
        int qa = b.node("plateA");
        int qb = b.node("plateB");
        b.resistor("load", rail, qa, f.loadOhms());
        b.resistor("load", rail, qb, f.loadOhms());
        int in = b.source("in0", inputVolts[0]);
        int ga = f.cross().attach(b, in, "A");
        int gb = f.cross().attach(b, qa, "B");
        b.triode("tubeA", f.tube(), 1, qa, ga, k);
        b.triode("tubeB", f.tube(), 1, qb, gb, k);
        return qa;
    }

    public Load inputLoad() {
        return flipFlop.inputLoad();
    }
}
