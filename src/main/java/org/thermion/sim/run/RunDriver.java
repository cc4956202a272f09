package org.thermion.sim.run;

import org.thermion.sim.Stimulus;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntPredicate;

/**
 * The one run loop: clocks a {@link Clocked} machine phase by phase, applies stimulus rows at the
 * start of their cycles or phases, and ends at the cycle budget, a fixed point, an unknown PC, a breakpoint,
 * an observer's halt or a stop from outside ({@link #requestStop()} or an interrupt, checked
 * between cycles). What a caller wants to know about the run it learns through
 * {@link RunObserver}s.
 */
public final class RunDriver {
    private final Clocked machine;
    private final Stimulus stimulus;
    private final boolean[] inputs;
    private final List<RunObserver> observers = new ArrayList<>();
    private RunObserver[] active = new RunObserver[0];
    private boolean settleAfterPhase;
    private Stimulus.Cursor cursor;
    private IntPredicate breakpoint;
    private boolean fixedPoint;
    private volatile boolean stopRequested;
    // The PC is read at each cycle's start only when something uses it.
    private boolean needPc;
    private boolean pcUnknownStops;
    private int pcStart;

    /**
     * @param machine  what to clock
     * @param inputs   the number of machine inputs
     * @param stimulus input rows (each holds from its cycle on), or null to leave inputs to {@link #setInput}
     */
    public RunDriver(Clocked machine, int inputs, Stimulus stimulus) {
        this.machine = machine;
        this.stimulus = stimulus;
        this.inputs = new boolean[inputs];
        this.cursor = stimulus == null ? null : stimulus.cursor();
    }

    /** Adds an observer; observers hear of each event in the order they were added. */
    public RunDriver observe(RunObserver o) {
        observers.add(o);
        active = observers.toArray(new RunObserver[0]);
        settleAfterPhase |= o.wantsSettledPhases();
        needPc = true;
        return this;
    }

    /** Stops a run after a cycle that ends at an address where {@code test} holds. */
    public RunDriver breakpoints(IntPredicate test) {
        this.breakpoint = test;
        needPc = true;
        return this;
    }

    /** Ends a run at a fixed point: a cycle that changed nothing while no stimulus row is to come. */
    public RunDriver stopAtFixedPoint(boolean on) {
        this.fixedPoint = on;
        needPc |= on;
        return this;
    }

    /** Ends a run when the program counter becomes unknown (a jump decided by an unknown value). */
    public RunDriver stopWhenPcUnknown(boolean on) {
        this.pcUnknownStops = on;
        return this;
    }

    /**
     * Starts (or restarts, after the machine was reset) from cycle 0: rewinds the stimulus,
     * applies its first rows, settles the logic and tells the observers.
     */
    public void start() {
        stopRequested = false;
        if (stimulus != null) {
            cursor = stimulus.cursor();
            cursor.advance(machine.cycle(), inputs);
        }
        pushInputs();
        machine.settle();
        long c = machine.cycle();
        for (RunObserver o : active) {
            o.begin(c);
        }
    }

    /** Sets a switch; a stimulus row for the input overrides it when its cycle comes. */
    public void setInput(int index, boolean value) {
        inputs[index] = value;
        machine.setInput(index, value);
    }

    public boolean input(int index) {
        return inputs[index];
    }

    /** Asks a run on another thread to stop after its current cycle. */
    public void requestStop() {
        stopRequested = true;
    }

    /**
     * Runs up to {@code cycles} cycles from the machine's present state (a cycle already begun
     * is completed and counts as one). Without {@link #start()} the inputs and latches are as the
     * caller left them.
     */
    public Halt run(long cycles) {
        final Clocked m = machine;
        final int phases = m.phases();
        stopRequested = false;
        for (long done = 0; done < cycles; done++) {
            if (stopRequested || Thread.currentThread().isInterrupted()) {
                return new Halt(Halt.Kind.STOPPED, "stopped after cycle " + (m.cycle() - 1));
            }
            long c = m.cycle();
            int first = m.nextPhase();
            if (first == 1) {
                beginCycle(c);
            }
            for (int p = first; p <= phases; p++) {
                phase(c, p);
            }
            Halt halt = endCycle(c);
            if (halt != null) {
                return halt;
            }
        }
        return new Halt(Halt.Kind.CYCLE_LIMIT, "cycle limit of " + cycles + " reached");
    }

    /** Runs the next phase alone; after the last phase of a cycle, the cycle's checks may halt (else null). */
    public Halt stepPhase() {
        long c = machine.cycle();
        int p = machine.nextPhase();
        if (p == 1) {
            beginCycle(c);
        }
        phase(c, p);
        return p == machine.phases() ? endCycle(c) : null;
    }

    private void beginCycle(long c) {
        if (cursor != null && cursor.advance(c, inputs)) {
            pushInputs();
        }
        if (fixedPoint) {
            machine.beginCycle();
        }
        pcStart = needPc ? machine.pc() : 0;
    }

    private void phase(long c, int p) {
        if (p > 1 && cursor != null && cursor.advance(c, p, inputs)) {
            pushInputs();
        }
        final RunObserver[] obs = active;
        if (obs.length == 0) {
            machine.stepPhase();
            return;
        }
        for (RunObserver o : obs) {
            o.beforePhase(c, p);
        }
        machine.stepPhase();
        for (RunObserver o : obs) {
            o.phaseRan(c, p);
        }
        if (settleAfterPhase) {
            machine.settle();
        }
        for (RunObserver o : obs) {
            o.phaseSettled(c, p);
        }
    }

    private Halt endCycle(long c) {
        final Clocked m = machine;
        Halt halt = null;
        for (RunObserver o : active) {
            Halt h = o.cycleDone(c, pcStart);
            if (h != null && halt == null) {
                halt = h;
            }
        }
        if (halt != null) {
            return halt;
        }
        if (pcUnknownStops && m.hasPc() && !m.pcKnown()) {
            return new Halt(Halt.Kind.PC_UNKNOWN, "program counter unknown after cycle " + c);
        }
        if (breakpoint != null && m.pcKnown() && breakpoint.test(m.pc())) {
            return new Halt(Halt.Kind.BREAKPOINT, "breakpoint at address " + m.pc());
        }
        if (fixedPoint && m.repeated() && (cursor == null || !cursor.pending())) {
            return new Halt(Halt.Kind.FIXED_POINT, (m.hasPc() ? "fixed point at address " + pcStart : "fixed point")
                    + ": the machine repeats cycle " + c + " unchanged from here on");
        }
        return null;
    }

    /** Tells the observers the run is over. */
    public void finish(Halt halt) {
        long c = machine.cycle();
        for (RunObserver o : active) {
            o.end(c, halt);
        }
    }

    private void pushInputs() {
        for (int i = 0; i < inputs.length; i++) {
            machine.setInput(i, inputs[i]);
        }
    }
}
