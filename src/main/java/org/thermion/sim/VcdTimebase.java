package org.thermion.sim;

import org.thermion.model.Clock;

/**
 * The VCD time unit for a clock: the largest of s, ms, us, ns, ps, fs in which one phase
 * is a whole number of units, so every phase boundary falls on an exact timestamp.
 */
public record VcdTimebase(String unit, long ticksPerPhase, int phases) {
    private static final String[] UNITS = {"s", "ms", "us", "ns", "ps", "fs"};

    public static VcdTimebase of(Clock clock) {
        int phases = Math.max(1, clock.phases());
        double phase = clock.periodSeconds() / phases;
        double scale = 1;
        for (String u : UNITS) {
            double ticks = phase * scale;
            long rounded = Math.round(ticks);
            if (rounded >= 1 && Math.abs(ticks - rounded) <= 1e-6 * ticks) {
                return new VcdTimebase(u, rounded, phases);
            }
            scale *= 1000;
        }
        return new VcdTimebase("fs", Math.max(1, Math.round(phase * 1e15)), phases);
    }

    /** Time at the start of phase {@code phase} (1-based) of cycle {@code cycle}. */
    public long phaseStart(long cycle, int phase) {
        return (cycle * phases + (phase - 1)) * ticksPerPhase;
    }

    /** Time at the end of that phase, when its latches load. */
    public long phaseEnd(long cycle, int phase) {
        return phaseStart(cycle, phase) + ticksPerPhase;
    }
}
