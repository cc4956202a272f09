package org.thermion.power.startup;

import org.thermion.model.HeaterRating;
import org.thermion.model.TubeType;

/**
 * Builds calibrated heater models: radiation constant from the rating, heat capacity from the
 * warm-up time. Because the heater equation is {@code C dT/dt = f(T)}, every time along a warm-up
 * scales exactly with {@code C}: one run at {@code C = 1 J/K} of the standard test (its 80 % point
 * found by root finding, its time by event detection) fixes {@code C = t_declared / t_unit}.
 */
public final class HeaterCalibration {
    private HeaterCalibration() {
    }

    /** The model for {@code tube} wired at {@code rating}. */
    public static HeaterModel calibrate(TubeType tube, HeaterRating rating, ThermalAssumptions a) {
        return calibrate(tube.name(), rating, tube.warmupSeconds(), tube.coldHotRatio(), a);
    }

    /**
     * The model for a heater given its warm-up time (NaN: the documented default) and cold/hot
     * ratio (NaN: from the tungsten table).
     */
    public static HeaterModel calibrate(String tube, HeaterRating rating, double warmupSeconds, double coldHotRatio,
                                        ThermalAssumptions a) {
        boolean declared = !Double.isNaN(warmupSeconds);
        double tw = declared ? warmupSeconds : a.defaultWarmup();
        HeaterModel unit = HeaterModel.uncalibrated(tube, rating, a, coldHotRatio, tw, declared);
        double tUnit = HeaterBench.warmupTime(unit);
        if (!(tUnit > 0)) {
            throw new IllegalStateException("warm-up test of " + tube + " did not reach 80 % of rated voltage");
        }
        return unit.withHeatCapacity(tw / tUnit);
    }
}
