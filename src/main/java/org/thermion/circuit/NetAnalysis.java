package org.thermion.circuit;

import java.util.List;

/**
 * One net's figures: the driver's operating point in every input state solved (in the order of
 * {@link MarginAnalysis#states}) with its loads, and the net's levels and margins.
 */
public record NetAnalysis(List<DcResult> points, NoiseMargins margins) {
    public NetAnalysis {
        points = List.copyOf(points);
    }
}
