package org.thermion.model;

import java.util.List;

/**
 * Heaters wired together across a rail: one heater alone (parallel wiring) or several in
 * series. Each entry names an envelope and the heater rating it is wired for.
 * {@code dropOhms} is the declared dropping resistor; {@code shunt} whether shunts are fitted.
 */
public record HeaterString(int rail, List<Integer> envelopes, List<HeaterRating> ratings, double dropOhms,
                           boolean shunt, int module, int rule) {
    public HeaterString {
        envelopes = List.copyOf(envelopes);
        ratings = List.copyOf(ratings);
    }
}
