package org.thermion.power.startup;

/**
 * One heater position through power-up; identical strings share a trajectory, so one entry
 * stands for {@code count} heaters.
 *
 * @param tube           tube type
 * @param ratedVolts     rating the heater is wired for
 * @param ratedAmps      rated current
 * @param rail           rail index
 * @param string         description of its string, e.g. "6AL5 + 6AU6"
 * @param position       position in the string (0-based)
 * @param count          heaters sharing this trajectory
 * @param mixed          true when its string mixes heater types
 * @param warmSeconds    time to 95 % of its operating temperature (NaN: not within the run)
 * @param peakVoltRatio  highest heater voltage over rated during the run
 * @param peakVoltTime   when it occurred
 * @param finalVolts     heater voltage at the end of the run
 * @param finalKelvin    temperature at the end of the run
 * @param joulesIn       electrical energy into one heater
 * @param joulesRadiated energy one heater's cathode radiated
 * @param joulesStored   heat stored in one heater's wire and cathode sleeve above ambient
 * @param finalCathodeKelvin cathode sleeve temperature at the end of the run
 * @param emitSeconds    when the cathode crossed its emission threshold (NaN: not within the run)
 */
public record HeaterWarmup(String tube, double ratedVolts, double ratedAmps, int rail, String string, int position,
                           int count, boolean mixed, double warmSeconds, double peakVoltRatio, double peakVoltTime,
                           double finalVolts, double finalKelvin, double joulesIn, double joulesRadiated,
                           double joulesStored, double finalCathodeKelvin, double emitSeconds) {
}
