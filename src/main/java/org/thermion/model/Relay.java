package org.thermion.model;

/** Bypass relay coil data: ohms, rated, pick-up and drop-out volts, operate time in seconds. */
public record Relay(double coilOhms, double ratedVolts, double pickupVolts, double dropoutVolts,
                    double operateSeconds) {
}
