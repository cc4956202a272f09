package org.thermion.timing;

import java.util.List;

/**
 * The result of static timing at one clock period: the per-phase worst paths, the path
 * that limits the clock ({@code critical}, the one needing the longest period), the
 * shortest safe period and every stage instance's delay.
 */
public record TimingReport(String machine, int phases, double periodSeconds, double phaseSeconds,
                           List<PhaseTiming> perPhase, PhaseTiming critical, double minPeriodSeconds,
                           List<InstanceDelay> instances) {

    /** The highest safe clock rate in hertz (infinite when no path constrains the clock). */
    public double maxClockHertz() {
        return minPeriodSeconds > 0 ? 1 / minPeriodSeconds : Double.POSITIVE_INFINITY;
    }

    /** True when every phase's paths settle in time at {@link #periodSeconds()}. */
    public boolean passes() {
        return perPhase.stream().allMatch(PhaseTiming::passes);
    }
}
