package org.thermion.circuit;

/**
 * Tolerance ends for worst-case margins: rails and resistors ± a fraction (default 5 %, common
 * practice), and tube emission down to an end-of-life fraction of a new tube's current
 * (default 70 %: a receiving tube is commonly treated as worn at 60–70 % of its new plate
 * current or transconductance, the "replace" marks of tube testers; REFERENCES.md "End of life").
 */
public record Tolerances(double rail, double resistor, double endOfLife) {
    /** ±5 % rails, ±5 % resistors, emission down to 70 %. */
    public static final Tolerances DEFAULT = new Tolerances(0.05, 0.05, 0.70);

    public Tolerances {
        if (!(rail >= 0 && rail < 1) || !(resistor >= 0 && resistor < 1) || !(endOfLife > 0 && endOfLife <= 1)) {
            throw new IllegalArgumentException("tolerances must lie in [0, 1), end of life in (0, 1]");
        }
    }

    /** The two ends of a parameter: {low, high} factors. */
    double[] ends(Parameter p) {
        switch (p.kind()) {
            case RAIL:
                return new double[] {1 - rail, 1 + rail};
            case RESISTOR:
                return new double[] {1 - resistor, 1 + resistor};
            default:
                return new double[] {endOfLife, 1};
        }
    }
}
