package org.thermion.power.startup;

/**
 * One rail through power-up. Currents are magnitudes in amperes, times in seconds.
 *
 * @param rail            rail index in the machine
 * @param name            rail name
 * @param volts           the rail's nominal voltage, signed as declared
 * @param limitAmps       its current limit (infinite when none)
 * @param t               sample times (a bypass shows as two samples at the same time)
 * @param amps            rail current at each sample
 * @param busVolts        voltage at the rail's bus (after the source and whole-rail soft-start resistances;
 *                        loads a partial soft start covers sit one resistor further)
 * @param switchOnPeak    highest current before the bypass (the whole run when the rail has no soft start)
 * @param switchOnTime    when it occurred
 * @param bypassPeak      highest current from the bypass on (NaN without a bypass)
 * @param bypassPeakTime  when it occurred
 * @param bypassTime      when the bypass relay closed (NaN: never, or no soft start)
 * @param peakDemand      highest current the loads asked for, before any current limit
 * @param secondsInLimit  time the supply spent holding its limit
 * @param finalAmps       current at the end of the run
 * @param hasSoftStart    whether a soft-start resistor sits in this rail
 * @param hasLoad         whether anything draws from this rail
 */
public record RailTransient(int rail, String name, double volts, double limitAmps, double[] t, double[] amps,
                            double[] busVolts, double switchOnPeak, double switchOnTime, double bypassPeak,
                            double bypassPeakTime, double bypassTime, double peakDemand, double secondsInLimit,
                            double finalAmps, boolean hasSoftStart, boolean hasLoad) {

    /** The larger of the two peaks. */
    public double worstPeak() {
        return Double.isNaN(bypassPeak) ? switchOnPeak : Math.max(switchOnPeak, bypassPeak);
    }

    /** True when the loads never asked more than the supply's limit. */
    public boolean withinLimit() {
        return !(peakDemand > limitAmps);
    }
}
