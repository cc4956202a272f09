package org.thermion.circuit;

import java.util.List;

/**
 * A diode gate's input: the gate's pull resistor reaches the driving net through one diode
 * (as if this input alone carried the gate's current: the heavier case), and so do the inputs
 * the gate's output feeds ({@code beyond}): through a conducting diode the driver carries
 * them too, so a chain of diode gates loads the stage at its head.
 */
public record DiodeLoad(ChildDiode diode, DiodeGate.Kind kind, double pullOhms, String pullRail, List<Load> beyond)
        implements Load {

    public DiodeLoad {
        beyond = List.copyOf(beyond);
    }

    public void attach(CircuitBuilder b, int out, String tag) {
        int node = b.node("gate" + tag);
        b.resistor("pull", node, b.rail(pullRail), pullOhms);
        if (kind == DiodeGate.Kind.AND) {
            b.diode("diode", diode, node, out);
        } else {
            b.diode("diode", diode, out, node);
        }
        if (!beyond.isEmpty()) {
            String old = b.nest("next");
            b.attachAll(beyond, node, tag + ".");
            b.restorePrefix(old);
        }
    }
}
