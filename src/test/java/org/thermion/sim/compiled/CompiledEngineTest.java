package org.thermion.sim.compiled;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.sim.GateProgramTest;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.synth.SyntheticMachine;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
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
        Simulator array = new Simulator(m);
        Simulator compiled = Engine.COMPILED.simulator(m);
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
                assertThat(compiled.latchChanges()).isEqualTo(array.latchChanges());
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
        // Both phases' latches load through generated code.
        assertThat(Engine.COMPILED.simulator(m).suppliedLoadPhases()).isEqualTo(2);
        for (long seed : new long[]{1, 2, 3}) {
            differential(m, seed, 500);
        }
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void syntheticMachineAgreesWithTheArrayEngine() {
        Machine m = synthetic(3000);
        // Its slices latch straight from other latches, so both phases take the staged loop.
        assertThat(Engine.COMPILED.simulator(m).suppliedLoadPhases()).isZero();
        differential(m, 7, 300);
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void largeNetlistsSplitIntoManyMethodsAndClasses() {
        Machine m = synthetic(10_000);
        StraightLineCompiler.Generated g = StraightLineCompiler.generate(m.netlist());
        // 10,000 stages (9376 gates) need two 6000-gate classes and the entry class, and many
        // methods under the bytecode limit (at most about 400 gates each).
        assertThat(g.classes()).hasSize(3);
        assertThat(g.methods()).isGreaterThan(m.netlist().gates().size() / 400);
        differential(m, 11, 20);
    }

    /** Every function at every width from 0 to 6 inputs, against the array engine's opcodes. */
    @Test
    void everyGateShapeMeansWhatTheArrayEngineComputes() {
        List<Gate> gates = new ArrayList<>();
        int inputs = 8;
        int net = 2 + inputs;
        for (GateFn fn : GateFn.values()) {
            for (int width = 0; width <= 6; width++) {
                int[] in = new int[width];
                for (int k = 0; k < width; k++) {
                    in[k] = 2 + (k * 3 + width) % inputs;
                }
                gates.add(new Gate(gates.size(), fn, in, net++, 0, 0));
            }
        }
        String[] names = new String[net];
        for (int n = 0; n < net; n++) {
            names[n] = "n" + n;
        }
        Netlist nl = new Netlist(names, new int[net], gates, List.of());
        java.util.function.Consumer<long[]> settle = StraightLineCompiler.compileConsumer(nl);
        SplittableRandom rnd = new SplittableRandom(3);
        for (int trial = 0; trial < 20; trial++) {
            long[] v = new long[net];
            v[Netlist.CONST1] = -1L;
            for (int i = 0; i < inputs; i++) {
                v[2 + i] = rnd.nextLong();
            }
            settle.accept(v);
            for (Gate g : gates) {
                assertThat(v[g.output()]).as("%s of %d inputs", g.fn(), g.inputs().length).isEqualTo(GateProgramTest.eval(g, v));
            }
        }
    }

    @Test
    void autoCompilesSmallMachinesAndLongRuns() {
        Machine small = demo();
        assertThat(Engine.AUTO.forRun(small, 0)).isEqualTo(Engine.COMPILED);
        Machine big = synthetic(10_000);
        // 9376 gates: the JIT's warm-up of the generated code outweighs a run of 10^4 cycles.
        assertThat(Engine.AUTO.forRun(big, 10_000)).isEqualTo(Engine.ARRAY);
        assertThat(Engine.AUTO.forRun(big, 2_000_000)).isEqualTo(Engine.COMPILED);
        assertThat(Engine.ARRAY.forRun(small, 0)).isEqualTo(Engine.ARRAY);
        assertThat(Engine.AUTO.simulator(big, 10).compiledEngine()).isFalse();
        assertThat(Engine.AUTO.simulator(small, 10).compiledEngine()).isTrue();
    }

    @Test
    void autoLeavesTheLargestNetlistsToTheArrayEngineEvenOnLongRuns() {
        assertThat(Engine.choose(46_888, 2, 1_000_000)).isEqualTo(Engine.COMPILED);
        assertThat(Engine.choose(93_792, 2, 1_000_000)).isEqualTo(Engine.ARRAY);
        assertThat(Engine.choose(93_792, 2, 10)).isEqualTo(Engine.ARRAY);
        assertThat(Engine.choose(137, 2, 1)).isEqualTo(Engine.COMPILED);
    }

    @Test
    void engineWordsParse() {
        assertThat(Engine.parse("compiled")).isEqualTo(Engine.COMPILED);
        assertThat(Engine.parse("Array")).isEqualTo(Engine.ARRAY);
        assertThat(Engine.parse("auto")).isEqualTo(Engine.DEFAULT);
        assertThatThrownBy(() -> Engine.parse("fast")).hasMessageContaining("choose auto, compiled or array");
    }
}
