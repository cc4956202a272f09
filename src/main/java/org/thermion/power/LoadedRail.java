package org.thermion.power;

import org.thermion.model.Rail;

/**
 * A rail's voltage under load: nominal less its source resistance times what it delivers, where
 * what it delivers depends on the voltage (heater strings through their {@link HeaterLaw}, plate
 * and bias loads as conductances, their nominal current scaled by the voltage, as the power-up
 * model takes them). The two agree at one voltage, found by bisection (the delivered current
 * rises with the voltage). Magnitudes throughout: a negative rail is solved on its absolute value.
 */
public final class LoadedRail {
    private LoadedRail() {
    }

    /**
     * The loaded voltage (magnitude) of rail {@code index}, with heater strings as {@code heaters}
     * gives them at any voltage and {@code stageAmps} of plate and bias load at the nominal voltage.
     */
    public static double volts(Rail rail, HeaterAnalysis heaters, int index, double stageAmps) {
        double nominal = Math.abs(rail.volts());
        double rs = rail.sourceOhms();
        if (!(rs > 0) || !(nominal > 0)) {
            return nominal;
        }
        double lo = 0;
        double hi = nominal;
        for (int k = 0; k < 100 && hi - lo > 1e-9 * nominal; k++) {
            double v = 0.5 * (lo + hi);
            double delivered = heaters.railAmpsAt(index, v) + stageAmps * v / nominal;
            if (v + rs * delivered > nominal) {
                hi = v;
            } else {
                lo = v;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** Loaded over nominal voltage: what a conductance's current is scaled by (1 for a rail of 0 V). */
    public static double scale(Rail rail, double loadedVolts) {
        double nominal = Math.abs(rail.volts());
        return nominal > 0 ? loadedVolts / nominal : 1;
    }
}
