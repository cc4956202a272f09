package org.thermion.sim.run;

/**
 * What the {@link RunDriver} clocks: one lane of the machine's logic, or its instruction-set
 * meaning. Nets are the netlist's; a level is '0', '1' or 'x'.
 */
public interface Clocked {

    /** Clock phases per cycle. */
    int phases();

    /** Cycles completed since reset. */
    long cycle();

    /** The 1-based phase the next {@link #stepPhase()} runs. */
    int nextPhase();

    /** Runs the next clock phase. */
    void stepPhase();

    /** Lets the logic settle on what the latches hold now (nothing to do without gates). */
    void settle();

    /** Drives input {@code index} (machine order). */
    void setInput(int index, boolean value);

    /** The program counter (0 without one). */
    int pc();

    /** False when the program counter is unknown. */
    boolean pcKnown();

    /** True when the machine has a program counter. */
    boolean hasPc();

    /** The level of a net: '0', '1' or 'x'. */
    char level(int net);

    /** Notes the state at the start of a cycle, for {@link #repeated()}. */
    void beginCycle();

    /**
     * After a cycle begun with {@link #beginCycle()}: true when it left the state and the PC as it
     * found them, so that with the same inputs every later cycle would repeat it.
     */
    boolean repeated();
}
