package org.thermion.model;

/**
 * Bypass relay coil data: ohms, rated, pick-up and drop-out volts, operate time in seconds, and
 * the current its contacts may make and carry (NaN: not declared).
 * A pick-up or drop-out given as NaN takes its default fraction of the rated voltage, so
 * every relay in a machine carries real thresholds.
 */
public record Relay(double coilOhms, double ratedVolts, double pickupVolts, double dropoutVolts,
                    double operateSeconds, double contactAmps) {

    /** Where the defaults below come from. */
    public static final String DEFAULTS_SOURCE = "REFERENCES.md: a 12 V relay data sheet gives a coil of about 100 ohm, "
            + "pick-up at most 7.2 V (60 %), drop-out at least 1.2 V (10 %), operate at most 10 ms";
    public static final double DEFAULT_COIL_OHMS = 100;
    public static final double DEFAULT_RATED_VOLTS = 12;
    /** Pick-up as a fraction of rated: the data sheet's worst case (7.2 V of 12 V). */
    public static final double PICKUP_FRACTION = 0.6;
    /** Drop-out as a fraction of rated: the data sheet's worst case (1.2 V of 12 V). */
    public static final double DROPOUT_FRACTION = 0.1;
    public static final double DEFAULT_OPERATE_SECONDS = 0.010;

    public Relay {
        if (Double.isNaN(pickupVolts)) {
            pickupVolts = PICKUP_FRACTION * ratedVolts;
        }
        if (Double.isNaN(dropoutVolts)) {
            dropoutVolts = DROPOUT_FRACTION * ratedVolts;
        }
    }

    /** The relay assumed when a soft start declares none: every figure at its default. */
    public static Relay standard() {
        return new Relay(DEFAULT_COIL_OHMS, DEFAULT_RATED_VOLTS, Double.NaN, Double.NaN, DEFAULT_OPERATE_SECONDS,
                Double.NaN);
    }
}
