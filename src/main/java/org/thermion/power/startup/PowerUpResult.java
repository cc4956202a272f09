package org.thermion.power.startup;

import java.util.List;

/**
 * Everything a power-up solve found.
 *
 * @param machine      machine name
 * @param options      what was solved
 * @param models       the calibrated heater models, one per tube type and rating in use
 * @param rails        every rail, in machine order
 * @param softStarts   every soft-start network
 * @param heaters      every distinct heater trajectory
 * @param relayChecks  one per thyratron-triggered bypass
 * @param t            sample times shared by the rails' arrays
 * @param heaterKelvin per entry of {@code heaters}, its wire temperature at each sample
 * @param cathodeKelvin per entry of {@code heaters}, its cathode temperature at each sample
 * @param evaluations  right-hand-side evaluations the integrator made
 * @param notes        assumptions a reader should know of (defaulted warm-up times, assumed arc drops)
 */
public record PowerUpResult(String machine, PowerUpOptions options, List<HeaterModel> models, List<RailTransient> rails,
                            List<SoftStartResult> softStarts, List<HeaterWarmup> heaters,
                            List<RelayDriverCheck> relayChecks, double[] t, double[][] heaterKelvin,
                            double[][] cathodeKelvin, long evaluations,
                            List<String> notes) {

    /** The rail with this index. */
    public RailTransient rail(int index) {
        return rails.get(index);
    }

    /** Latest time any heater reaches 95 % of its operating temperature (NaN when one never does). */
    public double allWarmSeconds() {
        return latest(HeaterWarmup::warmSeconds);
    }

    /** Latest time any cathode crosses its emission threshold: every tube conducts from then (NaN: one never does). */
    public double allEmitSeconds() {
        return latest(HeaterWarmup::emitSeconds);
    }

    private double latest(java.util.function.ToDoubleFunction<HeaterWarmup> time) {
        double w = 0;
        for (HeaterWarmup h : heaters) {
            double t = time.applyAsDouble(h);
            if (Double.isNaN(t)) {
                return Double.NaN;
            }
            w = Math.max(w, t);
        }
        return w;
    }

    /** The heater in a mixed string that ran furthest over its rating, or null when no string is mixed. */
    public HeaterWarmup worstMixedOverVoltage() {
        HeaterWarmup worst = null;
        for (HeaterWarmup h : heaters) {
            if (h.mixed() && (worst == null || h.peakVoltRatio() > worst.peakVoltRatio())) {
                worst = h;
            }
        }
        return worst;
    }
}
