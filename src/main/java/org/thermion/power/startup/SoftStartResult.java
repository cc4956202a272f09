package org.thermion.power.startup;

/**
 * One soft-start network through power-up.
 *
 * @param name          soft-start name
 * @param rail          rail index
 * @param ohms          resistor used (declared or overridden)
 * @param ratedWatts    the resistor's rating (infinite when not declared)
 * @param triggerTime   when the trigger fired: the delay, or the thyratron firing (NaN: never)
 * @param bypassTime    when the relay closed: trigger plus operate time (NaN: never within the run)
 * @param joules        energy dissipated in the resistor
 * @param peakWatts     highest dissipation (at switch-on, or while the supply is limited)
 * @param meanWatts     energy over the time the resistor was in circuit
 * @param thyratron     true when a thyratron triggers the bypass
 */
public record SoftStartResult(String name, int rail, double ohms, double ratedWatts, double triggerTime,
                              double bypassTime, double joules, double peakWatts, double meanWatts, boolean thyratron) {

    public boolean bypassed() {
        return !Double.isNaN(bypassTime);
    }

    /** Mean dissipation within the rating (always true when no rating is declared). */
    public boolean withinRating() {
        return !(meanWatts > ratedWatts);
    }
}
