package org.thermion.power;

import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;

import java.util.Comparator;
import java.util.List;

/**
 * Runs a machine on a ROM image for a number of cycles on simulator lane 0 and meters its
 * plate and bias current after every phase. Input changes apply at the start of their
 * cycle (0-based) and hold until changed; inputs start at 0.
 */
public final class ProgramRun {
    private ProgramRun() {
    }

    /** An input bit set to {@code value} from cycle {@code cycle} on; {@code input} indexes machine.inputs(). */
    public record InputChange(long cycle, int input, boolean value) {
    }

    public static CurrentMeter run(Machine m, long[] rom, List<InputChange> changes, long cycles, InitMode init) {
        if (cycles < 1) {
            throw new IllegalArgumentException("cycles must be at least 1, not " + cycles);
        }
        Simulator sim = new Simulator(m);
        sim.reset(init);
        if (rom != null) {
            sim.loadRom(rom);
        }
        List<InputChange> sorted = changes.stream().sorted(Comparator.comparingLong(InputChange::cycle)).toList();
        CurrentMeter meter = new CurrentMeter(m);
        int next = 0;
        for (long c = 0; c < cycles; c++) {
            while (next < sorted.size() && sorted.get(next).cycle() <= c) {
                InputChange ch = sorted.get(next++);
                sim.setInput(ch.input(), ch.value() ? -1L : 0L);
            }
            for (int p = 0; p < m.clock().phases(); p++) {
                sim.stepPhase();
                meter.sample(sim, 0);
            }
        }
        return meter;
    }
}
