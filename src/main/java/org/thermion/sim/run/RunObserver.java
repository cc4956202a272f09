package org.thermion.sim.run;

/**
 * Something that follows a run: output changes, a value change dump, current metering, the UI,
 * verify's snapshots. Each hook has an empty default, so an observer writes only what it needs.
 * Hooks run on the driver's thread between phases; they read the simulator they were built on.
 */
public interface RunObserver {

    /** Before the first cycle, with the first stimulus row applied and the logic settled. */
    default void begin(long cycle) {
    }

    /** Before phase {@code phase} of cycle {@code cycle} runs. */
    default void beforePhase(long cycle, int phase) {
    }

    /**
     * After the phase: gate-driven nets hold what they settled to during it, latches what they
     * loaded at its end (no settle since the loads).
     */
    default void phaseRan(long cycle, int phase) {
    }

    /** True when {@link #phaseSettled} needs the logic settled again after the phase's loads. */
    default boolean wantsSettledPhases() {
        return false;
    }

    /**
     * After the phase, the logic settled on what the latches now hold, when some observer
     * asked for it ({@link #wantsSettledPhases}); else with the values of {@link #phaseRan}.
     */
    default void phaseSettled(long cycle, int phase) {
    }

    /**
     * After the whole cycle; {@code pcStart} is the address the cycle ran. A non-null halt stops
     * the run after this cycle.
     */
    default Halt cycleDone(long cycle, int pcStart) {
        return null;
    }

    /** The run ended after {@code cycles} cycles in all. */
    default void end(long cycles, Halt halt) {
    }
}
