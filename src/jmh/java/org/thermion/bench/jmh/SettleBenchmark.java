package org.thermion.bench.jmh;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.thermion.bench.Measure;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.sim.compiled.Engine;
import org.thermion.sim.compiled.StraightLineCompiler;
import org.thermion.synth.SyntheticMachine;

import java.nio.file.Path;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;

/**
 * The hot loops under JMH: one settle of the array engine, of the compiled engine through
 * the simulator, of the straight-line code called alone, and a whole machine cycle on each
 * engine as {@code run} builds it (the compiled one with its generated latch loads), with
 * every lane alike ({@code lanes=1}) or the lanes' PCs parted by random latches ({@code lanes=64}).
 * Scores are per operation; divide the gate count by them for gate evaluations/s.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 5, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SettleBenchmark {
    /** "demo" (the bundled example, run from the repository root) or a synthetic size. */
    @Param({"demo", "10000"})
    public String machine;

    /** "1": every lane alike (latches start zero); "64": random latches part the lanes. */
    @Param({"1", "64"})
    public String lanes;

    private Simulator array;
    private Simulator compiled;
    private Consumer<long[]> straight;
    private long[] values;

    @Setup(Level.Trial)
    public void setUp() {
        Measure.Source src = machine.equals("demo")
                ? new Measure.Source("demo", Path.of("examples", "pumpstation", "pumpstation.machine"), null)
                : new Measure.Source(machine, null, SyntheticMachine.ofSize(Integer.parseInt(machine)).text());
        Machine m = src.elaborate();
        straight = StraightLineCompiler.compileConsumer(m.netlist());
        array = Engine.ARRAY.simulator(m);
        compiled = Engine.COMPILED.simulator(m);
        SplittableRandom rnd = new SplittableRandom(3);
        long[] rom = new long[m.rom().words()];
        for (int i = 0; i < rom.length; i++) {
            rom[i] = rnd.nextLong();
        }
        for (Simulator s : new Simulator[]{array, compiled}) {
            s.loadRom(rom);
            s.reset(lanes.equals("1") ? new InitMode.Zero() : new InitMode.Random(3));
        }
        values = new long[m.netlist().netCount()];
        for (int i = 2; i < values.length; i++) {
            values[i] = rnd.nextLong();
        }
        values[1] = -1L;
    }

    @Benchmark
    public long arraySettle() {
        array.settle();
        return array.value(2);
    }

    @Benchmark
    public long compiledSettle() {
        compiled.settle();
        return compiled.value(2);
    }

    @Benchmark
    public long straightLineSettle() {
        straight.accept(values);
        return values[values.length - 1];
    }

    @Benchmark
    public long arrayCycle() {
        array.stepCycle();
        return array.cycle();
    }

    @Benchmark
    public long compiledCycle() {
        compiled.stepCycle();
        return compiled.cycle();
    }
}
