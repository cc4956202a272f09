package org.thermion.timing;

import java.util.List;

/**
 * The worst path into the latches that load on {@code phase}. The path starts at the end
 * of {@code launchPhase} (when its source changes) and must settle {@code setup} before the
 * end of {@code phase}, {@code span} phase widths later: {@code budget} = span x phase width
 * - setup. {@code slack} = budget - arrival. {@code endpoint} names the capturing latch (or
 * the program counter). {@code path} is empty when nothing reaches this phase's latches.
 */
public record PhaseTiming(int phase, int launchPhase, int span, String endpoint, double setup, double budget,
                          double arrival, double slack, List<PathStep> path) {

    public boolean hasPath() {
        return !path.isEmpty();
    }

    public boolean passes() {
        return !hasPath() || slack >= 0;
    }
}
