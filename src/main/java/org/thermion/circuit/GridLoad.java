package org.thermion.circuit;

/** A receiver's grid network, its grid conducting into a cathode held at a rail when driven positive. */
public record GridLoad(GridNetwork network, GridCurrentLaw law, String cathodeRail) implements Load {
    public void attach(CircuitBuilder b, int out, String tag) {
        int pin = network.attach(b, out, tag);
        b.grid("gridcurrent", law, pin, b.rail(cathodeRail));
    }
}
