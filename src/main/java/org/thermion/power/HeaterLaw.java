package org.thermion.power;

import org.thermion.model.HeaterRating;

/**
 * A heater's resistance in the steady state as a function of the current it carries: constant at
 * its hot resistance ({@link #HOT}, a fair model near the rating), or the thermal equilibrium of a
 * tungsten wire (the power-up model's, so the budget's steady figures and the power-up's end state
 * agree: {@code org.thermion.power.startup.SteadyHeaters}).
 */
@FunctionalInterface
public interface HeaterLaw {
    /** Rated volts over rated amps whatever the current. */
    HeaterLaw HOT = (tube, rating, amps) -> rating.hotOhms();

    /** Ohms of a heater of tube type {@code tube} (machine index) wired at {@code rating}, carrying {@code amps}. */
    double ohms(int tube, HeaterRating rating, double amps);
}
