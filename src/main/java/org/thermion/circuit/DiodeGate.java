package org.thermion.circuit;

import java.util.List;

/**
 * A diode gate: AND (pull-up to a positive rail, each input's diode cathode on the input, so
 * any low input pulls the output down) or OR (pull-down, each input's diode anode on the input).
 * {@code outputLoads} are the inputs its output feeds where it stands as a receiver: a diode
 * gate has no gain, so what it drives loads the stage driving it ({@link DiodeLoad}).
 */
public record DiodeGate(String name, ChildDiode diode, Kind kind, int inputs, double pullOhms, String pullRail,
                        List<Load> outputLoads) implements StageCircuit {

    /** Which function. */
    public enum Kind { AND, OR }

    /** The gate alone, its output feeding nothing. */
    public DiodeGate(String name, ChildDiode diode, Kind kind, int inputs, double pullOhms, String pullRail) {
        this(name, diode, kind, inputs, pullOhms, pullRail, List.of());
    }

    public DiodeGate {
        outputLoads = List.copyOf(outputLoads);
        Checks.positive("pull ohms", pullOhms);
        if (inputs < 1) {
            throw new IllegalArgumentException("stage " + name + ": at least one input");
        }
    }

    public boolean logic(boolean[] in, boolean stored) {
        return kind == Kind.AND ? StageCircuit.all(in) : StageCircuit.any(in);
    }

    public boolean inverting() {
        return false;
    }

    public int build(CircuitBuilder b, double[] inputVolts, boolean stored) {
        int out = b.node("out");
        b.resistor("pull", out, b.rail(pullRail), pullOhms);
        for (int i = 0; i < inputs; i++) {
            int in = b.source("in" + i, inputVolts[i]);
            if (kind == Kind.AND) {
                b.diode("diode" + i, diode, out, in);
            } else {
                b.diode("diode" + i, diode, in, out);
            }
        }
        return out;
    }

    public Load inputLoad() {
        return new DiodeLoad(diode, kind, pullOhms, pullRail, outputLoads);
    }

    /** This gate as a receiver whose output feeds {@code loads}. */
    public DiodeGate feeding(List<Load> loads) {
        return new DiodeGate(name, diode, kind, inputs, pullOhms, pullRail, loads);
    }
}
