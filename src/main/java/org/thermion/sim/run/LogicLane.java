package org.thermion.sim.run;

import org.thermion.sim.Simulator;

/** Lane 0 of the machine's logic as the {@link RunDriver} clocks it; inputs drive every lane alike. */
public final class LogicLane implements Clocked {
    private final Simulator sim;
    private final boolean hasPc;
    private int pcStart;
    private long pcUnknownBefore;

    public LogicLane(Simulator sim) {
        this.sim = sim;
        this.hasPc = sim.machine().pc() != null;
    }

    @Override
    public int phases() {
        return sim.phases();
    }

    @Override
    public long cycle() {
        return sim.cycle();
    }

    @Override
    public int nextPhase() {
        return sim.nextPhase();
    }

    @Override
    public void stepPhase() {
        sim.stepPhase();
    }

    @Override
    public void settle() {
        sim.settle();
    }

    @Override
    public void setInput(int index, boolean value) {
        sim.setInput(index, value ? -1L : 0L);
    }

    @Override
    public int pc() {
        return sim.pc(0);
    }

    @Override
    public boolean pcKnown() {
        return (sim.pcUnknown() & 1L) == 0;
    }

    @Override
    public boolean hasPc() {
        return hasPc;
    }

    @Override
    public char level(int net) {
        return level(sim, net, 0);
    }

    /** The value of a net on a lane as '0', '1' or 'x'. */
    public static char level(Simulator sim, int net, int lane) {
        if ((sim.unknown(net) >>> lane & 1L) != 0) {
            return 'x';
        }
        return (sim.value(net) >>> lane & 1L) != 0 ? '1' : '0';
    }

    @Override
    public void beginCycle() {
        sim.clearLatchChanges();
        pcStart = sim.pc(0);
        pcUnknownBefore = sim.pcUnknown() & 1L;
    }

    // Each latch loads once a cycle, so no change during the cycle means the same state after it.
    @Override
    public boolean repeated() {
        return (sim.latchChanges() & 1L) == 0 && (sim.pcUnknown() & 1L) == pcUnknownBefore && sim.pc(0) == pcStart;
    }
}
