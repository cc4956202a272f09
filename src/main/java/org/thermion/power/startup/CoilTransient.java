package org.thermion.power.startup;

/**
 * What a thyratron-driven bypass relay's coil saw during the run: its voltage comes from its own
 * supply at each instant (that rail's source resistance, any soft start in it, its other loads),
 * less the arc drop and the plate resistor's drop.
 *
 * @param pickupVolts    the relay's pick-up voltage
 * @param dropoutVolts   its drop-out voltage
 * @param atFireVolts    coil voltage the moment the thyratron fired (NaN: never fired)
 * @param maxVolts       highest coil voltage seen (0 when it never fired)
 * @param maxTime        when
 * @param railVoltsAtMax the supply's nominal voltage (magnitude)
 * @param busVoltsAtMax  what the supply delivered at that moment, after its source and soft-start resistance
 * @param arcVolts       the tube's drop while conducting
 * @param plateVoltsAtMax drop across the plate resistor at that moment
 * @param closeTime      first closing of the contacts (NaN: never)
 * @param openings       times the closed contacts opened again because the coil fell below drop-out
 * @param firstOpening   the first such time (NaN: none)
 */
public record CoilTransient(double pickupVolts, double dropoutVolts, double atFireVolts, double maxVolts, double maxTime,
                            double railVoltsAtMax, double busVoltsAtMax, double arcVolts, double plateVoltsAtMax,
                            double closeTime, int openings, double firstOpening) {

    public boolean closed() {
        return !Double.isNaN(closeTime);
    }

    /** Closed, then opened again under a sagging supply. */
    public boolean chattered() {
        return openings > 0;
    }

    /** Why the relay never closed, in words (empty when it closed). */
    public String whyOpen() {
        if (closed()) {
            return "";
        }
        if (Double.isNaN(atFireVolts)) {
            return "the thyratron never fired, so the coil saw no current";
        }
        return String.format(java.util.Locale.ROOT, "the coil reached at most %.3g V (at %.3g s) against its %.3g V "
                        + "pick-up: of the %.3g V supply, %.3g V went in its source and soft-start resistance, %.3g V in "
                        + "the arc and %.3g V across the plate resistor", maxVolts, maxTime, pickupVolts, railVoltsAtMax,
                railVoltsAtMax - busVoltsAtMax, arcVolts, plateVoltsAtMax);
    }
}
