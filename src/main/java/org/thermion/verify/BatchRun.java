package org.thermion.verify;

import org.thermion.model.Gate;
import org.thermion.model.Isa;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.sim.run.LogicLane;
import org.thermion.sim.run.RunDriver;
import org.thermion.sim.run.RunObserver;
import org.thermion.sim.compiled.Engine;

/**
 * Runs the logic one machine cycle on a batch: all latches 0 except the ISA's state bits,
 * which take the batch's values, and the inhibit latch, set for an inhibited batch; the ROM data
 * nets (or the word's switches) carry each lane's instruction word; the PC starts at the batch's. With {@code snapshot} it keeps every net's value at each phase's settle.
 */
final class BatchRun {
    private final Machine machine;
    private final Simulator sim;
    private final RunDriver driver;
    private final RunDriver snapshots;
    private final Snapshots snapshot = new Snapshots();
    private final int[] stateLatch;
    private final int romWidth;
    private final int inhibitLatch;
    private final boolean[] gateDriven;

    BatchRun(Machine machine) {
        this.machine = machine;
        this.sim = Engine.DEFAULT.simulator(machine);
        LogicLane lane = new LogicLane(sim);
        this.driver = new RunDriver(lane, machine.inputs().size(), null);
        this.snapshots = new RunDriver(lane, machine.inputs().size(), null).observe(snapshot);
        Netlist nl = machine.netlist();
        int[] latchOf = new int[nl.netCount()];
        java.util.Arrays.fill(latchOf, -1);
        for (Latch l : nl.latches()) {
            latchOf[l.output()] = l.id();
        }
        Isa isa = machine.isa();
        stateLatch = new int[isa.state().size()];
        for (int s = 0; s < stateLatch.length; s++) {
            int net = isa.state().get(s).net();
            stateLatch[s] = net >= 0 && net < latchOf.length ? latchOf[net] : -1;
            if (stateLatch[s] < 0) {
                throw new IllegalArgumentException("state bit '" + isa.state().get(s).name()
                        + "' is not held by a latch; verify sets the state through its latch");
            }
        }
        romWidth = machine.rom() != null ? machine.rom().dataNets().length : 0;
        inhibitLatch = isa.inhibitNet() >= 0 ? latchOf[isa.inhibitNet()] : -1;
        gateDriven = new boolean[nl.netCount()];
        for (Gate g : nl.gates()) {
            gateDriven[g.output()] = true;
        }
        if (machine.rom() != null) {
            for (int d : machine.rom().dataNets()) {
                gateDriven[d] = true;
            }
        }
    }

    Machine machine() {
        return machine;
    }

    int stateLatch(int s) {
        return stateLatch[s];
    }

    /** One cycle's outcome: state bits after, PC per lane, and per-phase net values when kept. */
    static final class Result {
        long[] state;
        int[] pc = new int[64];
        /** Lanes whose inhibit latch holds 1 after the cycle (0 without one). */
        long inhibit;
        long[] lastSettle;
        long[][] atPhase;
    }

    Result run(Batch b, boolean snapshot) {
        sim.reset(new InitMode.Zero());
        for (int s = 0; s < stateLatch.length; s++) {
            sim.setLatch(stateLatch[s], b.state[s]);
        }
        if (inhibitLatch >= 0) {
            sim.setLatch(inhibitLatch, b.inhibited ? -1L : 0L);
        }
        for (int i = 0; i < b.inputs.length; i++) {
            sim.setInput(i, b.inputs[i]);
        }
        int[] switches = machine.isa().wordInputs();
        for (int i = 0; i < switches.length; i++) {
            sim.setInput(switches[i], b.wordBits[i]);
        }
        if (b.pc != 0) {
            for (int lane = 0; lane < 64; lane++) {
                sim.setPc(lane, b.pc);
            }
        }
        if (machine.rom() != null) {
            sim.forceRomWord(romWidth == b.wordBits.length ? b.wordBits : java.util.Arrays.copyOf(b.wordBits, romWidth));
        }
        int phases = sim.phases();
        Result r = new Result();
        if (snapshot) {
            r.atPhase = new long[phases + 1][];
            this.snapshot.into = r;
            snapshots.run(1);
        } else {
            driver.run(1);
        }
        r.state = new long[stateLatch.length];
        for (int s = 0; s < stateLatch.length; s++) {
            r.state[s] = sim.value(machine.isa().state().get(s).net());
        }
        for (int lane = 0; lane < 64; lane++) {
            r.pc[lane] = sim.pc(lane);
        }
        r.inhibit = inhibitLatch >= 0 ? sim.value(machine.isa().inhibitNet()) : 0L;
        r.lastSettle = snapshot ? r.atPhase[phases] : null;
        return r;
    }

    /** The value of {@code net} after the last settle (gate-driven nets) or now (latches). */
    long value(int net) {
        return sim.value(net);
    }

    /** Keeps every net's value at each phase's settle: gate outputs as settled, latch outputs as before the loads. */
    private final class Snapshots implements RunObserver {
        Result into;
        private long[] pre;

        @Override
        public void beforePhase(long cycle, int phase) {
            pre = values(machine.netlist().netCount());
        }

        @Override
        public void phaseRan(long cycle, int phase) {
            int nets = pre.length;
            long[] at = new long[nets];
            for (int n = 0; n < nets; n++) {
                // Gate outputs hold this settle's value; latch outputs already hold the load.
                at[n] = gateDriven[n] ? sim.value(n) : pre[n];
            }
            into.atPhase[phase] = at;
        }
    }

    private long[] values(int nets) {
        long[] v = new long[nets];
        for (int n = 0; n < nets; n++) {
            v[n] = sim.value(n);
        }
        return v;
    }
}
