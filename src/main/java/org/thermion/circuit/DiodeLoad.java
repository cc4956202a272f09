package org.thermion.circuit;

/**
 * A diode gate's input: the gate's pull resistor reaches the driving net through one diode
 * (as if this input alone carried the gate's current: the heavier case).
 */
public record DiodeLoad(ChildDiode diode, DiodeGate.Kind kind, double pullOhms, String pullRail) implements Load {
    public void attach(CircuitBuilder b, int out, String tag) {
        int node = b.node("gate" + tag);
        b.resistor("pull", node, b.rail(pullRail), pullOhms);
        if (kind == DiodeGate.Kind.AND) {
            b.diode("diode", diode, node, out);
        } else {
            b.diode("diode", diode, out, node);
        }
    }
}
