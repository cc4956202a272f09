package org.thermion.power.startup;

import java.util.List;

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
 * @param neededWatts   the continuous rating the run asks of the resistor: the peak of its power lagged
 *                      by its thermal time constant ({@link ResistorRating})
 * @param rating        the short-time overload rating it is judged by
 * @param contactAmps   the bypass relay's declared contact rating (NaN: none declared)
 * @param makeAmps      current the contacts make: the rail's bypass peak (NaN: never closed)
 * @param carryAmps     current they carry at the end of the run
 * @param covers        the loads behind the resistor as the {@code covers} line names them (empty: the whole rail);
 *                      for a partial soft start the contacts make and carry its own branch's current
 */
public record SoftStartResult(String name, int rail, double ohms, double ratedWatts, double triggerTime,
                              double bypassTime, double joules, double peakWatts, double meanWatts, boolean thyratron,
                              double neededWatts, ResistorRating rating, double contactAmps, double makeAmps,
                              double carryAmps, List<String> covers) {
    public SoftStartResult {
        covers = List.copyOf(covers);
    }

    public boolean bypassed() {
        return !Double.isNaN(bypassTime);
    }

    /**
     * Within rating by temperature rise: the lagged power never exceeds the rated power, so a short
     * overload within the resistor's short-time rating passes (always true when no rating is declared).
     */
    public boolean withinRating() {
        return !(neededWatts > ratedWatts);
    }

    /** The contacts' declared rating covers the current they make and carry (true when none is declared). */
    public boolean contactsOk() {
        return Double.isNaN(contactAmps) || !(makeAmps > contactAmps) && !(bypassed() && carryAmps > contactAmps);
    }

    /** The smallest commonly sold power rating that covers {@link #neededWatts} (NaN beyond the list). */
    public double suggestedWatts() {
        return ResistorRating.commonWatts(neededWatts);
    }
}
