package org.thermion.build;

import org.thermion.faults.Step;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;

import java.util.ArrayList;
import java.util.List;

/**
 * The logic states a voltage chart is drawn for, simulated on lane 0: the machine at rest after
 * reset (every latch cleared, every switch off, the program counter at 0), and the state after
 * each step of a bench procedure as the bring-up plan runs it (latches power up unknown, each step
 * sets the switches and clocks its cycles). Without a program the ROM's lines are unknown.
 */
public final class ChartStates {
    private ChartStates() {
    }

    /** At rest after reset. */
    public static PinVoltages.State atRest(Machine m, long[] rom) {
        Simulator sim = simulator(m, rom);
        sim.reset(new InitMode.Zero());
        sim.settle();
        return snapshot(m, sim, rom, "rest", "after reset: latches cleared, switches off");
    }

    /** After each of {@code steps}, from power-up with every latch unknown. */
    public static List<PinVoltages.State> afterSteps(Machine m, long[] rom, List<Step> steps) {
        Simulator sim = simulator(m, rom);
        sim.reset(new InitMode.Unknown());
        List<PinVoltages.State> out = new ArrayList<>(steps.size());
        int k = 0;
        for (Step s : steps) {
            boolean[] in = s.inputs();
            for (int i = 0; i < in.length; i++) {
                sim.setInput(i, in[i] ? -1L : 0L);
            }
            for (int c = 0; c < s.cycles(); c++) {
                sim.stepCycle();
            }
            sim.settle();
            k++;
            out.add(snapshot(m, sim, rom, "step " + k, "plan step " + k + ": switches " + s));
        }
        return out;
    }

    private static Simulator simulator(Machine m, long[] rom) {
        Simulator sim = new Simulator(m);
        if (rom != null) {
            sim.loadRom(rom);
        }
        return sim;
    }

    private static PinVoltages.State snapshot(Machine m, Simulator sim, long[] rom, String name, String what) {
        int n = m.netlist().netCount();
        boolean[] high = new boolean[n];
        boolean[] unknown = new boolean[n];
        for (int i = 0; i < n; i++) {
            high[i] = (sim.value(i) & 1L) != 0;
            unknown[i] = (sim.unknown(i) & 1L) != 0;
        }
        if (m.rom() != null && rom == null) {
            for (int d : m.rom().dataNets()) {
                unknown[d] = true;
            }
        }
        return new PinVoltages.State(name, what, high, unknown);
    }
}
