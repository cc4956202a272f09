package org.thermion.circuit;

/**
 * One rail under load: its declared volts and source resistance, the current drawn from it
 * (signed, positive out of the rail), the volts at its terminals, and its current limit.
 */
public record RailState(String rail, double nominalVolts, double sourceOhms, double amps, double volts,
                        double limitAmps) {

    /** True when the rail is asked for more than its declared limit. */
    public boolean overLimit() {
        return Math.abs(amps) > limitAmps;
    }
}
