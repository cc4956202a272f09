package org.thermion.circuit;

/** A pentode's screen supply: a dropping resistor ({@code ohms} 0 for none) from a rail. */
public record ScreenSupply(double ohms, String rail) {
    public ScreenSupply {
        Checks.nonNegative("screen ohms", ohms);
    }

    int attach(CircuitBuilder b) {
        int r = b.rail(rail);
        if (ohms == 0) {
            return r;
        }
        int s = b.node("screen");
        b.resistor("screen", r, s, ohms);
        return s;
    }
}
