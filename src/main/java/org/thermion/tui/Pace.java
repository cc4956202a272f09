package org.thermion.tui;

/**
 * Runs at the machine's own speed: how many cycles the real machine would have run since the
 * last look, at its declared clock period. It keeps at most a tenth of a second of arrears,
 * so a pause in drawing does not end in a burst.
 */
final class Pace {
    static final double MOST_BEHIND_SECONDS = 0.1;

    private final double periodSeconds;
    private long last = Long.MIN_VALUE;
    private double owed;

    Pace(double periodSeconds) {
        this.periodSeconds = periodSeconds;
    }

    /** Cycles due at {@code nowNanos} (whole cycles; the fraction carries over). */
    long due(long nowNanos) {
        if (last != Long.MIN_VALUE) {
            owed = Math.min(owed + (nowNanos - last) * 1e-9 / periodSeconds, MOST_BEHIND_SECONDS / periodSeconds);
        }
        last = nowNanos;
        return (long) owed;
    }

    /** Counts cycles run against what was due. */
    void ran(long cycles) {
        owed = Math.max(0, owed - cycles);
    }

    /** Starts afresh, as when a run starts. */
    void restart() {
        last = Long.MIN_VALUE;
        owed = 0;
    }
}
