package org.thermion.circuit;

/**
 * A cathode's return: a resistor ({@code ohms} 0 for none) to a rail; {@code coil} the relay coil
 * that resistor is (a follower driving its coil), null for a plain resistor.
 */
public record CathodeReturn(double ohms, String rail, RelayCoil coil) {
    public CathodeReturn {
        Checks.nonNegative("cathode ohms", ohms);
        if (coil != null && coil.ohms() != ohms) {
            throw new IllegalArgumentException("a cathode coil of " + coil.ohms() + " ohm in a return of " + ohms + " ohm");
        }
    }

    /** A plain resistor to a rail. */
    public CathodeReturn(double ohms, String rail) {
        this(ohms, rail, null);
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
