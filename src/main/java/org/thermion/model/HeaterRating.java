package org.thermion.model;

/** One way a heater can be wired: its rated voltage and current (e.g. 12.6 V 0.15 A). */
public record HeaterRating(double volts, double amps) {
    public double hotOhms() {
        return volts / amps;
    }

    public double watts() {
        return volts * amps;
    }
}
