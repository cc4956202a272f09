package org.thermion.sim.run;

/**
 * Why a run (or one batch of it) ended: the kind, for callers that act on it, and the words a
 * report prints.
 */
public record Halt(Kind kind, String words) {

    /** The ways a run ends. */
    public enum Kind {
        /** The cycles asked for have run; the run can go on. */
        CYCLE_LIMIT,
        /** The last cycle changed nothing and no stimulus row is to come: every later cycle repeats it. */
        FIXED_POINT,
        /** The program counter became unknown (a jump decided by an unknown value). */
        PC_UNKNOWN,
        /** The program counter reached a breakpoint. */
        BREAKPOINT,
        /** An observer saw a value it stops on (an unknown value, a watched change). */
        OBSERVED,
        /** Stopped from outside: {@link RunDriver#requestStop()} or the thread was interrupted. */
        STOPPED
    }

    /** True when the run may go on from here (only the cycle budget ran out). */
    public boolean resumable() {
        return kind == Kind.CYCLE_LIMIT || kind == Kind.STOPPED;
    }
}
