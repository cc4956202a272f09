package org.thermion.power.startup;

import org.hipparchus.analysis.interpolation.AkimaSplineInterpolator;
import org.hipparchus.analysis.polynomials.PolynomialSplineFunction;

/**
 * Electrical resistivity of tungsten against temperature, interpolated from a table.
 *
 * <p>Table (micro-ohm centimetres), as collected in the project's REFERENCES.md:
 * 293-900 K from the CRC handbook table "Electrical Resistivity of Pure Metals" (from memory),
 * 1000-1500 K from the Jones &amp; Langmuir tungsten table (from memory), 2000 K from the
 * tungsten.com materials page. Between points an Akima spline is used (it passes through
 * every tabulated point and does not overshoot between them, so resistance stays monotonic);
 * outside the table the end segments are extended linearly, which only matters for a heater
 * driven far over its rating.
 */
public final class TungstenResistivity {
    /** Tabulated temperatures in kelvin. */
    static final double[] KELVIN = {293, 300, 400, 500, 600, 700, 800, 900, 1000, 1100, 1200, 1300, 1400, 1500, 2000};
    /** Tabulated resistivity in micro-ohm centimetres, same order. */
    static final double[] MICRO_OHM_CM = {5.28, 5.44, 7.83, 10.3, 13.0, 15.7, 18.6, 21.5, 24.93, 27.94, 30.98, 34.08,
            37.19, 40.36, 55.7};

    private static final TungstenResistivity TABLE = new TungstenResistivity();

    private final PolynomialSplineFunction spline;
    private final double lowSlope;
    private final double highSlope;

    private TungstenResistivity() {
        spline = new AkimaSplineInterpolator().interpolate(KELVIN, MICRO_OHM_CM);
        int n = KELVIN.length;
        lowSlope = (MICRO_OHM_CM[1] - MICRO_OHM_CM[0]) / (KELVIN[1] - KELVIN[0]);
        highSlope = (MICRO_OHM_CM[n - 1] - MICRO_OHM_CM[n - 2]) / (KELVIN[n - 1] - KELVIN[n - 2]);
    }

    /** The shared table (immutable). */
    public static TungstenResistivity table() {
        return TABLE;
    }

    /** Resistivity in micro-ohm centimetres at {@code kelvin}. */
    public double at(double kelvin) {
        int n = KELVIN.length;
        if (kelvin <= KELVIN[0]) {
            return Math.max(0.05, MICRO_OHM_CM[0] + lowSlope * (kelvin - KELVIN[0]));
        }
        if (kelvin >= KELVIN[n - 1]) {
            return MICRO_OHM_CM[n - 1] + highSlope * (kelvin - KELVIN[n - 1]);
        }
        return spline.value(kelvin);
    }
}
