package org.thermion.circuit;

import java.util.Map;

/**
 * The currents one instance of a stage type takes from each rail (signed: positive out of the
 * rail, so a negative rail's sink current is negative), at its lightest and its heaviest input
 * state, and whether they were computed from its circuit or typed in as draw lines.
 */
public record StageCurrents(String stage, Map<String, Double> least, Map<String, Double> most, boolean computed) {
    public StageCurrents {
        least = Map.copyOf(least);
        most = Map.copyOf(most);
    }

    /** The current from {@code rail} at the given loading (0 when the stage does not use it). */
    public double amps(String rail, Loading loading) {
        return (loading == Loading.LIGHT ? least : most).getOrDefault(rail, 0.0);
    }
}
