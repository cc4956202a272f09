package org.thermion.sim;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.Machine;
import org.thermion.model.StateBit;
import org.thermion.sim.reference.IsaInterpreter;

import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.fail;

/**
 * Differential test: the demo's logic, simulated gate by gate, against the ISA interpreter
 * running the isa block's meanings, on random ROM images with random inputs. Every ISA
 * state bit and the PC are compared after every cycle, on every lane.
 */
class LogicVersusIsaTest {
    static final int CYCLES = 300;
    static final long SEED = 20261201L;

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void sixtyFourProgramsPerRunOneOnEachLane() {
        Machine m = SimMachines.demo();
        SplittableRandom rng = new SplittableRandom(SEED);
        // 16 runs x 64 lanes = 1024 random programs.
        for (int run = 0; run < 16; run++) {
            long[][] programs = new long[64][];
            for (int lane = 0; lane < 64; lane++) {
                programs[lane] = randomRom(m, rng);
            }
            compare(m, programs, rng, "run " + run, 0);
        }
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void oneProgramOnAllLanesWithDifferentInputsSoThePcsDrift() {
        sharedProgram(SEED + 1, "shared run ", 0);
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void lanesThatRunAlikeThenPartKeepTheirOwnPcs() {
        // Alike, every lane holds one PC (the simulator's scalar path, jumps included); then the
        // lanes' inputs differ and their PCs part.
        sharedProgram(SEED + 2, "alike-then-parted run ", CYCLES / 2);
    }

    private static void sharedProgram(long seed, String what, int alike) {
        Machine m = SimMachines.demo();
        SplittableRandom rng = new SplittableRandom(seed);
        for (int run = 0; run < 8; run++) {
            long[] rom = randomRom(m, rng);
            long[][] programs = new long[64][];
            java.util.Arrays.fill(programs, rom);
            compare(m, programs, rng, what + run, alike);
        }
    }

    private static long[] randomRom(Machine m, SplittableRandom rng) {
        long[] rom = new long[m.rom().words()];
        long mask = (1L << m.rom().width()) - 1;
        for (int i = 0; i < rom.length; i++) {
            rom[i] = rng.nextLong() & mask;
        }
        return rom;
    }

    /**
     * Lanes run programs[lane]; when every lane has the same ROM it is loaded, else forced per lane.
     * Before cycle {@code alike} every lane gets the same inputs.
     */
    private static void compare(Machine m, long[][] programs, SplittableRandom rng, String what, int alike) {
        boolean shared = true;
        for (long[] p : programs) {
            shared &= p == programs[0];
        }
        Simulator sim = new Simulator(m);
        sim.reset(new InitMode.Zero());
        IsaInterpreter[] ref = new IsaInterpreter[64];
        for (int lane = 0; lane < 64; lane++) {
            ref[lane] = new IsaInterpreter(m);
            ref[lane].loadRom(programs[lane]);
            ref[lane].reset();
        }
        if (shared) {
            sim.loadRom(programs[0]);
        }
        List<StateBit> state = m.isa().state();
        int inputs = m.inputs().size();
        int width = m.rom().width();
        for (int c = 0; c < CYCLES; c++) {
            for (int i = 0; i < inputs; i++) {
                long lanes = c < alike ? (rng.nextBoolean() ? -1L : 0L) : rng.nextLong();
                sim.setInput(i, lanes);
                for (int lane = 0; lane < 64; lane++) {
                    ref[lane].setInput(i, (lanes >>> lane & 1) == 1);
                }
            }
            if (!shared) {
                long[] bits = new long[width];
                for (int lane = 0; lane < 64; lane++) {
                    long word = programs[lane][sim.pc(lane)];
                    for (int b = 0; b < width; b++) {
                        bits[b] |= (word >>> b & 1) << lane;
                    }
                }
                sim.forceRomWord(bits);
            }
            sim.stepCycle();
            for (int lane = 0; lane < 64; lane++) {
                ref[lane].step();
                IsaInterpreter r = ref[lane];
                if (sim.pc(lane) != r.pc()) {
                    fail("%s lane %d cycle %d: logic PC %d, ISA PC %d (seed %d)", what, lane, c, sim.pc(lane),
                            r.pc(), SEED);
                }
                for (int s = 0; s < state.size(); s++) {
                    boolean logic = (sim.value(state.get(s).net()) >>> lane & 1) == 1;
                    if (logic != r.state(s)) {
                        fail("%s lane %d cycle %d: state %s is %s in logic, %s in the ISA (seed %d)", what, lane, c,
                                state.get(s).name(), logic, r.state(s), SEED);
                    }
                }
            }
        }
    }
}
