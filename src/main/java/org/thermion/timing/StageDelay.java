package org.thermion.timing;

/**
 * The delay of one stage instance. {@code rise} is the output's rise time (through the
 * plate load), {@code fall} its fall time (through the conducting tube), both in seconds;
 * {@code farads} the capacitance its output drives, {@code fanOut} the stage inputs on it.
 * {@code riseGiven}/{@code fallGiven} say the stage declared the value rather than have it
 * computed. {@code note} explains a missing value (empty when none).
 */
public record StageDelay(double rise, double fall, double farads, int fanOut, boolean riseGiven,
                         boolean fallGiven, String note) {

    /** The slower edge. */
    public double worst() {
        return Math.max(rise, fall);
    }
}
