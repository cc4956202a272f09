package org.thermion.power.startup;

/** Preferred resistor values of the E12 and E24 series (IEC 60063). */
public final class PreferredValues {
    private static final double[] E12 = {1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2};
    private static final double[] E24 = {1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3,
        4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};

    private PreferredValues() {
    }

    /** The E24 value nearest {@code ohms} on a logarithmic scale. */
    public static double nearestE24(double ohms) {
        return nearest(ohms, E24);
    }

    /** The E12 value nearest {@code ohms}. */
    public static double nearestE12(double ohms) {
        return nearest(ohms, E12);
    }

    /** True when {@code ohms} is an E12 value. */
    public static boolean isE12(double ohms) {
        return Math.abs(nearestE12(ohms) / ohms - 1) < 1e-9;
    }

    private static double nearest(double ohms, double[] series) {
        if (!(ohms > 0) || Double.isInfinite(ohms)) {
            throw new IllegalArgumentException("a preferred value needs a positive resistance");
        }
        double decade = Math.pow(10, Math.floor(Math.log10(ohms)));
        double best = Double.NaN, dist = Double.POSITIVE_INFINITY;
        for (double scale : new double[] {decade / 10, decade, decade * 10}) {
            for (double v : series) {
                double c = v * scale;
                double d = Math.abs(Math.log(c / ohms));
                if (d < dist) {
                    dist = d;
                    best = c;
                }
            }
        }
        // Round away the binary noise of the decade scaling (values have two significant figures).
        double mag = Math.pow(10, Math.floor(Math.log10(best)) - 1);
        return Math.round(best / mag) * mag;
    }
}
