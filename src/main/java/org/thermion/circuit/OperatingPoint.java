package org.thermion.circuit;

import java.util.List;
import java.util.Map;

/**
 * A solved stage: output volts, every node's volts, the current each rail supplies (positive
 * out of the rail), each input source's current, each part's current, each tube's dissipation,
 * the stage's own grid current, and the largest current sum left at any free node.
 */
public record OperatingPoint(String stage, double outputVolts, Map<String, Double> nodeVolts,
                             Map<String, Double> railAmps, Map<String, Double> inputAmps, List<PartCurrent> parts,
                             List<TubeDissipation> tubes, double gridAmps, double maxResidualAmps, int iterations)
        implements DcResult {

    public OperatingPoint {
        nodeVolts = Map.copyOf(nodeVolts);
        railAmps = Map.copyOf(railAmps);
        inputAmps = Map.copyOf(inputAmps);
        parts = List.copyOf(parts);
        tubes = List.copyOf(tubes);
    }

    /** Current from rail {@code name} (0 when the stage does not use it). */
    public double railAmps(String name) {
        return railAmps.getOrDefault(name, 0.0);
    }

    /** The current through the first part labelled {@code label} (e.g. "driver.load"), or NaN. */
    public double partAmps(String label) {
        for (PartCurrent p : parts) {
            if (p.label().equals(label)) {
                return p.amps();
            }
        }
        return Double.NaN;
    }

    /** True when some tube exceeds a known rating. */
    public boolean overRating() {
        return tubes.stream().anyMatch(TubeDissipation::overRating);
    }
}
