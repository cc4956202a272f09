package org.thermion.sim;

import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.model.StateBit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Runs a program on the machine's logic, lane 0, cycle by cycle: inputs from a stimulus,
 * output changes logged (in the phase whose latch loads cause them), watched nets tabled as
 * they stand at the end of each cycle with the logic settled, optionally a VCD. The run ends at the cycle
 * limit, when the PC becomes unknown, or at a fixed point: a cycle that left every latch
 * and the PC as it found them while no stimulus row is still to come, so every later cycle
 * would repeat it.
 */
public final class LogicRun {
    private final Machine machine;
    private final Simulator sim;
    private final Stimulus stimulus;
    private final List<String> watchNames;
    private final List<Integer> watchNets;
    private final VcdWriter vcd;

    /**
     * @param stimulus   input rows, or null for all inputs 0
     * @param watchNames names for the watch table, each with its net in {@code watchNets}
     * @param vcd        a writer to feed, or null
     */
    public LogicRun(Machine machine, long[] rom, InitMode init, Stimulus stimulus, List<String> watchNames,
                    List<Integer> watchNets, VcdWriter vcd) {
        this(new Simulator(machine), rom, init, stimulus, watchNames, watchNets, vcd);
    }

    /** As above, on a simulator already built (the engine the user chose). */
    public LogicRun(Simulator sim, long[] rom, InitMode init, Stimulus stimulus, List<String> watchNames,
                    List<Integer> watchNets, VcdWriter vcd) {
        Machine machine = sim.machine();
        this.machine = machine;
        this.sim = sim;
        this.stimulus = stimulus;
        this.watchNames = List.copyOf(watchNames);
        this.watchNets = List.copyOf(watchNets);
        this.vcd = vcd;
        sim.loadRom(rom);
        sim.reset(init);
    }

    public Simulator simulator() {
        return sim;
    }

    /** Runs at most {@code maxCycles} cycles. {@code vcdDate} and {@code version} go into the VCD header. */
    public RunResult run(long maxCycles, String vcdDate, String version) {
        List<Port> inputs = machine.inputs();
        boolean[] in = new boolean[inputs.size()];
        Stimulus.Cursor cursor = stimulus == null ? null : stimulus.cursor();
        if (cursor != null) {
            cursor.advance(0, in);
        }
        applyInputs(in);
        sim.settle();
        OutputLog log = new OutputLog(sim, 0);
        StringBuilder initial = new StringBuilder();
        for (Port o : machine.outputs()) {
            initial.append(OutputLog.level(sim, o.net(), 0));
        }
        if (vcd != null) {
            vcd.begin(sim, vcdDate, version);
        }
        List<Latch> latches = machine.netlist().latches();
        List<UnknownReport> unknowns = new ArrayList<>();
        List<Port> outputs = machine.outputs();
        boolean[] outputKnown = new boolean[outputs.size()];
        boolean[] outputReported = new boolean[outputs.size()];
        for (int o = 0; o < outputs.size(); o++) {
            outputKnown[o] = (sim.unknown(outputs.get(o).net()) & 1L) == 0;
        }
        int[] outputLatch = latchOf(outputs);
        boolean jumpReported = false;
        List<WatchRow> rows = new ArrayList<>();
        String stop = "cycle limit of " + maxCycles + " reached";
        long cycles = 0;
        int pcPhase = machine.pc() == null ? -1 : machine.pc().phase();
        // Gate-driven outputs and watched nets are read with the logic settled after the loads,
        // so a change a load causes is logged in the phase of that load.
        boolean resettle = !watchNets.isEmpty();
        for (int o : outputLatch) {
            resettle |= o < 0;
        }
        for (long c = 0; c < maxCycles; c++) {
            if (c > 0 && cursor != null && cursor.advance(c, in)) {
                applyInputs(in);
            }
            sim.clearLatchChanges();
            long pcUnknownBefore = sim.pcUnknown() & 1L;
            int pcStart = sim.pc(0);
            for (int p = 1; p <= sim.phases(); p++) {
                sim.stepPhase();
                if (vcd != null) {
                    // Before any second settle: the dump stamps gate values at the phase's start.
                    vcd.afterPhase(sim, c, p);
                }
                if (resettle) {
                    sim.settle();
                }
                log.observe(sim, c, p);
                if (sim.threeValued()) {
                    for (int o = 0; o < outputs.size(); o++) {
                        boolean x = (sim.unknown(outputs.get(o).net()) & 1L) != 0;
                        if (x && !outputReported[o]) {
                            String what = null;
                            if (outputKnown[o]) {
                                what = "output becomes unknown";
                            } else if (outputLatch[o] >= 0 && loadedNow(latches.get(outputLatch[o]), p)) {
                                what = "output latch loaded with an unknown value";
                            }
                            if (what != null) {
                                unknowns.add(new UnknownReport(c, p, outputs.get(o).name(), what));
                                outputReported[o] = true;
                            }
                        }
                        outputKnown[o] |= !x;
                    }
                    if (p == pcPhase && !jumpReported && (sim.unknown(machine.pc().jumpNet()) & 1L) != 0) {
                        unknowns.add(new UnknownReport(c, p, machine.netlist().netName(machine.pc().jumpNet()),
                                "jump decision unknown"));
                        jumpReported = true;
                    }
                }
            }
            cycles = c + 1;
            if (!watchNets.isEmpty()) {
                StringBuilder sb = new StringBuilder(watchNets.size());
                for (int n : watchNets) {
                    sb.append(OutputLog.level(sim, n, 0));
                }
                rows.add(new WatchRow(c, pcStart, sb.toString()));
            }
            if ((sim.pcUnknown() & 1L) != 0) {
                stop = "program counter unknown after cycle " + c;
                break;
            }
            // Each latch loads once a cycle, so no change during the cycle means the same state after it.
            boolean still = (sim.latchChanges() & 1L) == 0 && (sim.pcUnknown() & 1L) == pcUnknownBefore;
            if (sim.pc(0) == pcStart && still && (cursor == null || !cursor.pending())) {
                stop = (machine.pc() == null ? "fixed point" : "fixed point at address " + pcStart)
                        + ": the machine repeats cycle " + c
                        + " unchanged from here on";
                break;
            }
        }
        if (sim.threeValued()) {
            for (int o = 0; o < outputs.size(); o++) {
                if (!outputReported[o] && (sim.unknown(outputs.get(o).net()) & 1L) != 0) {
                    unknowns.add(new UnknownReport(cycles, 0, outputs.get(o).name(),
                            "output still unknown at the end of the run"));
                }
            }
        }
        if (vcd != null) {
            vcd.finish(cycles);
        }
        // The ISA's state bits by name; a machine without an ISA shows every latch instead.
        List<StateBit> state = machine.isa() != null ? machine.isa().state()
                : latches.stream().map(l -> new StateBit(machine.netlist().netName(l.output()), l.output(), null)).toList();
        StringBuilder st = new StringBuilder();
        for (StateBit b : state) {
            st.append(OutputLog.level(sim, b.net(), 0));
        }
        return new RunResult(cycles, stop, log.changes(), unknowns, state.stream().map(StateBit::name).toList(),
                st.toString(), sim.pc(0), (sim.pcUnknown() & 1L) == 0, watchNames, rows, initial.toString());
    }

    private boolean loadedNow(Latch l, int phase) {
        if (l.phase() != phase) {
            return false;
        }
        if (l.enable() < 0) {
            return true;
        }
        // An enable that is 1 or unknown may have loaded the latch.
        return ((sim.value(l.enable()) | sim.unknown(l.enable())) & 1L) != 0;
    }

    private int[] latchOf(List<Port> outputs) {
        int[] r = new int[outputs.size()];
        List<Latch> latches = machine.netlist().latches();
        for (int o = 0; o < r.length; o++) {
            r[o] = -1;
            for (int i = 0; i < latches.size(); i++) {
                if (latches.get(i).output() == outputs.get(o).net()) {
                    r[o] = i;
                }
            }
        }
        return r;
    }

    private void applyInputs(boolean[] in) {
        for (int i = 0; i < in.length; i++) {
            sim.setInput(i, in[i] ? -1L : 0L);
        }
    }

}
