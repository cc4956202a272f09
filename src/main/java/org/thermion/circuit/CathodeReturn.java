package org.thermion.circuit;

/** A cathode's return: a resistor ({@code ohms} 0 for none) to a rail. */
public record CathodeReturn(double ohms, String rail) {
    public CathodeReturn {
        Checks.nonNegative("cathode ohms", ohms);
    }

    /** Cathode tied to ground. */
    public static CathodeReturn grounded() {
        return new CathodeReturn(0, RailSet.GROUND);
    }

    /** Adds the return; returns the cathode's node. */
    int attach(CircuitBuilder b) {
        int r = b.rail(rail);
        if (ohms == 0) {
            return r;
        }
        int k = b.node("cathode");
        b.resistor("cathode", k, r, ohms);
        return k;
    }
}
