package org.thermion.circuit;

import java.util.Map;

/**
 * Tolerance ends for worst-case margins: rails and resistors ± a fraction (default 5 %, common
 * practice), and tube emission down to an end-of-life fraction of a new tube's current
 * (default 70 %: a receiving tube is commonly treated as worn at 60–70 % of its new plate
 * current or transconductance, the "replace" marks of tube testers; REFERENCES.md "End of life").
 * {@code lightRise} widens a rail's high end by how far it rises when the machine's load is
 * lightest, over the voltage the solve takes it at (the heaviest load's): a rail runs anywhere
 * from its heaviest-load voltage less its tolerance to its lightest-load voltage plus it.
 */
public record Tolerances(double rail, double resistor, double endOfLife, Map<String, Double> lightRise) {
    /** ±5 % rails, ±5 % resistors, emission down to 70 %. */
    public static final Tolerances DEFAULT = new Tolerances(0.05, 0.05, 0.70);

    public Tolerances {
        if (!(rail >= 0 && rail < 1) || !(resistor >= 0 && resistor < 1) || !(endOfLife > 0 && endOfLife <= 1)) {
            throw new IllegalArgumentException("tolerances must lie in [0, 1), end of life in (0, 1]");
        }
        lightRise = Map.copyOf(lightRise);
        for (double r : lightRise.values()) {
            if (!(r >= 1 && r < 10)) {
                throw new IllegalArgumentException("a rail's rise at light load must lie in [1, 10), not " + r);
            }
        }
    }

    /** Rails at their declared voltages, the same at every load. */
    public Tolerances(double rail, double resistor, double endOfLife) {
        this(rail, resistor, endOfLife, Map.of());
    }

    /** These tolerances with rails that rise by these factors at the lightest load (by rail name). */
    public Tolerances withLightRise(Map<String, Double> rise) {
        return new Tolerances(rail, resistor, endOfLife, rise);
    }

    /** A rail's two ends as factors of the voltage it is solved at: {low, high}. */
    public double[] railEnds(String name) {
        return new double[] {1 - rail, (1 + rail) * lightRise.getOrDefault(name, 1.0)};
    }

    /** The two ends of a parameter: {low, high} factors. */
    double[] ends(Parameter p) {
        switch (p.kind()) {
            case RAIL:
                return railEnds(p.label().startsWith("rail.") ? p.label().substring(5) : p.label());
            case RESISTOR:
                return new double[] {1 - resistor, 1 + resistor};
            default:
                return new double[] {endOfLife, 1};
        }
    }
}
