package org.thermion.power;

import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.sim.compiled.Engine;
import org.thermion.sim.Stimulus;

/**
 * Runs a machine on a ROM image for a number of cycles on simulator lane 0 and meters its
 * plate and bias current after every phase. A stimulus row applies at the start of its
 * cycle (0-based) and holds until changed; inputs start at 0.
 */
public final class ProgramRun {
    private ProgramRun() {
    }

    /** Runs {@code cycles} cycles; {@code rom} and {@code stimulus} may be null (no ROM image, inputs at 0). */
    public static CurrentMeter run(Machine m, long[] rom, Stimulus stimulus, long cycles, InitMode init) {
        if (cycles < 1) {
            throw new IllegalArgumentException("cycles must be at least 1, not " + cycles);
        }
        Simulator sim = Engine.DEFAULT.simulator(m, cycles);
        sim.reset(init);
        if (rom != null) {
            sim.loadRom(rom);
        }
        Stimulus.Cursor cursor = stimulus == null ? null : stimulus.cursor();
        boolean[] inputs = new boolean[m.inputs().size()];
        CurrentMeter meter = new CurrentMeter(m);
        for (long c = 0; c < cycles; c++) {
            if (cursor != null && cursor.advance(c, inputs)) {
                for (int i = 0; i < inputs.length; i++) {
                    sim.setInput(i, inputs[i] ? -1L : 0L);
                }
            }
            for (int p = 0; p < m.clock().phases(); p++) {
                sim.stepPhase();
                meter.sample(sim, 0);
            }
        }
        return meter;
    }
}
