package org.thermion.power.startup;

/**
 * How a power resistor is judged: by its temperature rise, a first-order lag of the power it
 * dissipates, calibrated by its short-time overload rating. A resistor that may take {@code k}
 * times its rated power for {@code t} seconds reaches its rated rise then, so its thermal time
 * constant is {@code tau = t / ln(k / (k - 1))}. The lagged power {@code P_f}, with
 * {@code tau dP_f/dt = P - P_f}, is the continuous rating that the run asks of the resistor: it is
 * within rating while {@code P_f} stays at or below the rated power. Default: 10 x for 5 s
 * (wirewound power resistor sheets, REFERENCES.md "Resistor short-time overload"; common
 * practice), so tau is about 47 s.
 *
 * @param multiple overload multiple of rated power ({@code > 1})
 * @param seconds  for how long
 */
public record ResistorRating(double multiple, double seconds) {
    /** The common-practice figure. */
    public static final ResistorRating COMMON_PRACTICE = new ResistorRating(10, 5);
    public static final String SOURCE = "10 x rated power for 5 s: wirewound power resistor sheets (REFERENCES.md; "
            + "common practice)";

    /** Power ratings resistors are commonly sold in, watts (common practice). */
    private static final double[] WATTS = {0.25, 0.5, 1, 2, 3, 5, 7, 10, 15, 20, 25, 50, 75, 100, 150, 200, 250, 300,
        500, 750, 1000};

    public ResistorRating {
        if (!(multiple > 1) || !(seconds > 0) || Double.isInfinite(multiple) || Double.isInfinite(seconds)) {
            throw new IllegalArgumentException("a short-time overload needs a multiple above 1 and a positive time");
        }
    }

    /** Thermal time constant, seconds. */
    public double tau() {
        return seconds / Math.log(multiple / (multiple - 1));
    }

    /** The smallest commonly sold rating of at least {@code watts} (NaN beyond the list). */
    public static double commonWatts(double watts) {
        for (double w : WATTS) {
            if (w >= watts) {
                return w;
            }
        }
        return Double.NaN;
    }
}
