package org.thermion.circuit;

/**
 * One published figure of a tube at stated conditions, used to fit model parameters or to
 * check them. Plate and screen volts are to the cathode. The grid is either held at
 * {@code gridVolts} (fixed bias, {@code cathodeOhms} 0) or at the foot of a cathode resistor
 * ({@code cathodeOhms} > 0: the grid sits at −Rk·Ik, solved).
 *
 * @param screenVolts NaN for a triode
 * @param value       in SI units: amperes, siemens, or plain for the amplification factor
 * @param source      the sheet or book and how the figure was read, or "from memory"
 */
public record FitPoint(double plateVolts, double screenVolts, double gridVolts, double cathodeOhms,
                       Quantity quantity, double value, String source) {

    /** What the figure is. */
    public enum Quantity { PLATE_CURRENT, SCREEN_CURRENT, TRANSCONDUCTANCE, AMPLIFICATION }

    public FitPoint {
        Checks.positive("plate volts", plateVolts);
        Checks.nonNegative("cathode ohms", cathodeOhms);
        Checks.positive("value", value);
        if (cathodeOhms == 0) {
            Checks.finite("grid volts", gridVolts);
        }
    }

    /** A fixed-bias point. */
    public static FitPoint fixed(double vp, double vg2, double vg, Quantity q, double value, String source) {
        return new FitPoint(vp, vg2, vg, 0, q, value, source);
    }

    /** A cathode-biased point (grid returned to the cathode resistor's foot). */
    public static FitPoint selfBiased(double vp, double vg2, double rk, Quantity q, double value, String source) {
        return new FitPoint(vp, vg2, Double.NaN, rk, q, value, source);
    }

    /** The model's figure at this point's conditions. */
    public double modelValue(TubeModel model) {
        double vg = cathodeOhms > 0 ? selfBias(model) : gridVolts;
        switch (quantity) {
            case PLATE_CURRENT:
                return plate(model, plateVolts, vg);
            case SCREEN_CURRENT:
                return model instanceof KorenPentode p ? p.screenCurrent(vg, screenVolts) : 0;
            case TRANSCONDUCTANCE:
                return gm(model, vg);
            default:
                double rpInv = (plate(model, plateVolts + 0.5, vg) - plate(model, plateVolts - 0.5, vg));
                return rpInv > 0 ? gm(model, vg) / rpInv : Double.POSITIVE_INFINITY;
        }
    }

    /** The model's relative error at this point, (model − published) / published. */
    public double relativeError(TubeModel model) {
        return modelValue(model) / value - 1;
    }

    private double gm(TubeModel model, double vg) {
        double h = 0.01;
        return (plate(model, plateVolts, vg + h) - plate(model, plateVolts, vg - h)) / (2 * h);
    }

    private double plate(TubeModel model, double vp, double vg) {
        if (model instanceof KorenTriode t) {
            return t.plateCurrent(vp, vg);
        }
        if (model instanceof KorenPentode p) {
            return p.plateCurrent(vp, vg, screenVolts);
        }
        throw new IllegalArgumentException("fit points apply to triodes and pentodes, not " + model.name());
    }

    private double cathodeCurrent(TubeModel model, double vg) {
        double ik = plate(model, plateVolts, vg);
        return model instanceof KorenPentode p ? ik + p.screenCurrent(vg, screenVolts) : ik;
    }

    /** Grid-to-cathode volts where vg = −Rk·Ik(vg): bisection, Ik rises with vg. */
    private double selfBias(TubeModel model) {
        double lo = -100;
        double hi = 0;
        for (int i = 0; i < 60; i++) {
            double mid = 0.5 * (lo + hi);
            if (mid + cathodeOhms * cathodeCurrent(model, mid) > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
