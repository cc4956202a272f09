package org.thermion.sim.compiled;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.synth.SyntheticMachine;

import java.nio.file.Path;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The compiled engine against the array engine: same inputs, same values on every net. */
class CompiledEngineTest {

    static Machine demo() {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborate(Path.of("examples", "pumpstation", "pumpstation.machine"));
        assertThat(d.hasErrors()).isFalse();
        return m;
    }

    static Machine synthetic(int size) {
        SyntheticMachine sm = SyntheticMachine.ofSize(size);
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborateText(Path.of(sm.name() + ".machine"), sm.text());
        assertThat(d.hasErrors()).isFalse();
        return m;
    }

    /** Runs both engines in lock step from the same random start, ROM and inputs; compares all nets each phase. */
    static void differential(Machine m, long seed, int cycles) {
        Assumptions.assumeTrue(StraightLineCompiler.available(), "needs a JDK");
        Simulator array = new Simulator(m);
        Simulator compiled = new Simulator(m, StraightLineCompiler.compile(m.netlist()));
        SplittableRandom rnd = new SplittableRandom(seed);
        long[] rom = new long[m.rom().words()];
        for (int i = 0; i < rom.length; i++) {
            rom[i] = rnd.nextLong();
        }
        for (Simulator s : new Simulator[]{array, compiled}) {
            s.loadRom(rom);
            s.reset(new InitMode.Random(seed));
        }
        int nets = m.netlist().netCount();
        for (int c = 0; c < cycles; c++) {
            for (int i = 0; i < m.inputs().size(); i++) {
                long lanes = rnd.nextLong();
                array.setInput(i, lanes);
                compiled.setInput(i, lanes);
            }
            for (int p = 0; p < m.clock().phases(); p++) {
                array.stepPhase();
                compiled.stepPhase();
                for (int n = 0; n < nets; n++) {
                    if (array.value(n) != compiled.value(n)) {
                        throw new AssertionError("seed " + seed + ": net " + m.netlist().netName(n) + " differs at cycle "
                                + c + " phase " + (p + 1) + ": array " + Long.toHexString(array.value(n))
                                + ", compiled " + Long.toHexString(compiled.value(n)));
                    }
                }
            }
            for (int lane = 0; lane < Simulator.LANES; lane++) {
                assertThat(compiled.pc(lane)).isEqualTo(array.pc(lane));
            }
        }
        assertThat(compiled.cycle()).isEqualTo(cycles);
        assertThat(compiled.gateEvaluations()).isEqualTo(array.gateEvaluations());
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void demoAgreesWithTheArrayEngineOverRandomRuns() {
        Machine m = demo();
        for (long seed : new long[]{1, 2, 3}) {
            differential(m, seed, 500);
        }
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void syntheticMachineAgreesWithTheArrayEngine() {
        differential(synthetic(3000), 7, 300);
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void largeNetlistsSplitIntoManyMethodsAndClasses() {
        Machine m = synthetic(10_000);
        StraightLineSource src = new StraightLineSource(m.netlist(), "x.y");
        // 10,000 stages (9376 gates) need two 8000-gate classes, the entry class, and many methods
        // under the bytecode limit (at most about 400 gates each).
        assertThat(src.units()).hasSize(3);
        assertThat(src.methods()).isGreaterThan(m.netlist().gates().size() / 400);
        differential(m, 11, 20);
    }

    @Test
    void statementsMeanWhatTheArrayEngineComputes() {
        StringBuilder b = new StringBuilder();
        StraightLineSource.statement(b, new org.thermion.model.Gate(0, org.thermion.model.GateFn.NAND, new int[]{4, 5, 6}, 9, 0, 0));
        StraightLineSource.statement(b, new org.thermion.model.Gate(1, org.thermion.model.GateFn.NOT, new int[]{9}, 10, 0, 0));
        StraightLineSource.statement(b, new org.thermion.model.Gate(2, org.thermion.model.GateFn.XOR, new int[]{2, 3}, 11, 0, 0));
        assertThat(b.toString()).isEqualTo("        v[9] = ~(v[4] & v[5] & v[6]);\n        v[10] = ~v[9];\n"
                + "        v[11] = v[2] ^ v[3];\n");
    }

    @Test
    void engineWordsParse() {
        assertThat(Engine.parse("compiled")).isEqualTo(Engine.COMPILED);
        assertThat(Engine.parse("Array")).isEqualTo(Engine.ARRAY);
        assertThatThrownBy(() -> Engine.parse("fast")).hasMessageContaining("choose array or compiled");
    }
}
