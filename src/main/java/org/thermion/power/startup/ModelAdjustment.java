package org.thermion.power.startup;

import org.thermion.model.Rail;

/**
 * Figures a bench measurement corrects in the power-up model ({@link TraceFit}): every heater's
 * cold-to-hot resistance ratio (NaN: each tube's own, declared or from the tungsten table), a
 * factor on every heater's warm-up time (its thermal time constant), and one rail's actual
 * voltage and source resistance (NaN: as declared; {@code rail} -1: none).
 */
public record ModelAdjustment(double coldHotRatio, double warmupScale, int rail, double railVolts, double sourceOhms) {
    public ModelAdjustment {
        if (!(warmupScale > 0) || !Double.isNaN(coldHotRatio) && !(coldHotRatio > 1)
                || !Double.isNaN(sourceOhms) && !(sourceOhms >= 0)) {
            throw new IllegalArgumentException("model adjustment out of range: ratio " + coldHotRatio + ", warm-up x"
                    + warmupScale + ", source " + sourceOhms + " ohm");
        }
    }

    /** The model as declared. */
    public static ModelAdjustment none() {
        return new ModelAdjustment(Double.NaN, 1, -1, Double.NaN, Double.NaN);
    }

    /** True when nothing is changed. */
    public boolean isNone() {
        return Double.isNaN(coldHotRatio) && warmupScale == 1 && (rail < 0 || Double.isNaN(railVolts) && Double.isNaN(sourceOhms));
    }

    /** Rail {@code index} as the model sees it. */
    Rail apply(Rail r, int index) {
        if (index != rail) {
            return r;
        }
        // The actual voltage keeps the declared sign: a magnitude is what a meter on the rail reads.
        double v = Double.isNaN(railVolts) ? r.volts() : Math.copySign(Math.abs(railVolts), r.volts());
        return new Rail(r.name(), v, Double.isNaN(sourceOhms) ? r.sourceOhms() : sourceOhms, r.limitAmps());
    }

    /** A heater's warm-up time (NaN in: the assumption's default) under this adjustment. */
    double warmup(double declared, ThermalAssumptions a) {
        if (warmupScale == 1) {
            return declared;
        }
        return (Double.isNaN(declared) ? a.defaultWarmup() : declared) * warmupScale;
    }

    /** A heater's cold-to-hot ratio (NaN in and out: from the tungsten table). */
    double ratio(double declared) {
        return Double.isNaN(coldHotRatio) ? declared : coldHotRatio;
    }
}
