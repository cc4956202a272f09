package org.thermion.bench;

import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.file.Path;
import java.util.SplittableRandom;
import java.util.function.Consumer;
import java.util.function.Supplier;

/**
 * The measurements {@code bench} makes, each with a warm-up first: elaboration time,
 * retained heap, simulation speed of an engine, and the straight-line settle alone.
 */
public final class Measure {
    private final double seconds;

    /** {@code seconds}: how long each speed measurement runs (warm-up takes as long again). */
    public Measure(double seconds) {
        this.seconds = seconds;
    }

    /** A machine description to elaborate: from a file, or from text. */
    public record Source(String label, Path file, String text) {
        public Machine elaborate() {
            Diagnostics d = new Diagnostics();
            Elaborator e = new Elaborator(new SourceSet(), d);
            Machine m = text == null ? e.elaborate(file) : e.elaborateText(Path.of(label + ".machine"), text);
            if (m == null || d.hasErrors()) {
                throw new IllegalStateException(label + " did not elaborate (" + d.errorCount() + " errors); run `check` on it");
            }
            return m;
        }
    }

    /** Best wall time of parse + elaborate over {@code runs} runs after {@code warm} warm-up runs, in seconds. */
    public static double elaborateSeconds(Source s, int warm, int runs) {
        for (int i = 0; i < warm; i++) {
            s.elaborate();
        }
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            s.elaborate();
            best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
        }
        return best;
    }

    /**
     * Heap one machine retains, in bytes: used heap after full collections, before and while
     * {@code copies} elaborated copies are held (copies make small machines stand out of the
     * collector's noise), divided by the copies.
     */
    public static double retainedBytes(Supplier<Machine> make, int copies, Consumer<Machine> keep) {
        MemoryMXBean mx = ManagementFactory.getMemoryMXBean();
        long before = settledHeap(mx);
        Machine[] held = new Machine[copies];
        for (int i = 0; i < copies; i++) {
            held[i] = make.get();
        }
        long after = settledHeap(mx);
        keep.accept(held[0]);
        return Math.max(0, after - before) / (double) copies;
    }

    private static long settledHeap(MemoryMXBean mx) {
        long used = Long.MAX_VALUE;
        for (int i = 0; i < 4; i++) {
            System.gc();
            used = Math.min(used, mx.getHeapMemoryUsage().getUsed());
        }
        return used;
    }

    /** A speed: work done per second of one run. */
    public record Speed(long cycles, long gateEvaluations, double seconds) {
        public double cyclesPerSecond() {
            return cycles / seconds;
        }

        public double gateEvaluationsPerSecond() {
            return gateEvaluations / seconds;
        }
    }

    /**
     * Runs the machine on {@code sim} with a random ROM: on every lane alike ({@code lanes64}
     * false: one program, one set of inputs, so one lane's worth of distinct work) or with
     * independent random inputs per lane (the lanes' program counters soon part ways).
     */
    public Speed run(Simulator sim, boolean lanes64, long seed) {
        return run(sim, lanes64, seed, WARM_SETTLES);
    }

    /** As {@link #run(Simulator, boolean, long)}, warming up for at least {@code warmSettles} settles. */
    public Speed run(Simulator sim, boolean lanes64, long seed, long warmSettles) {
        Machine m = sim.machine();
        SplittableRandom rnd = new SplittableRandom(seed);
        if (m.rom() != null) {
            long[] rom = new long[m.rom().words()];
            for (int i = 0; i < rom.length; i++) {
                rom[i] = rnd.nextLong();
            }
            sim.loadRom(rom);
        }
        sim.reset(lanes64 ? new InitMode.Random(seed) : new InitMode.Zero());
        int inputs = m.inputs().size();
        long[][] stimulus = new long[64][inputs];
        for (long[] row : stimulus) {
            for (int i = 0; i < inputs; i++) {
                row[i] = lanes64 ? rnd.nextLong() : (rnd.nextBoolean() ? -1L : 0L);
            }
        }
        // The array engine's single loop compiles early; the generated code needs its full count.
        double limit = sim.compiledEngine() ? WARM_LIMIT_SECONDS : Math.max(2, 5 * seconds);
        return steady(slice -> timed(sim, stimulus, slice), Math.max(1, m.clock().phases()), warmSettles, limit);
    }

    /** Measuring rounds; the best counts, so a round slowed by other work on the machine does not. */
    static final int ROUNDS = 5;
    static final long WARM_SETTLES = 30_000;
    static final double WARM_LIMIT_SECONDS = 30;

    /**
     * Warms up, then measures: {@code round} does work for the given seconds and says how much.
     * Warm-up runs until the JIT has had its chance: at least {@code minSettles} settles
     * ({@code settlesPerUnit} per unit of work) and three rounds in a row no faster than the best
     * so far, within {@code limit} seconds. The generated code needs {@value #WARM_SETTLES}
     * settles: each of its methods runs once per settle, and the JIT compiles a method only
     * after thousands of calls. Then the best of {@value #ROUNDS} rounds.
     */
    private Speed steady(java.util.function.DoubleFunction<Speed> round, long settlesPerUnit, long minSettles, double limit) {
        double slice = Math.max(0.02, seconds / ROUNDS);
        long settles = 0;
        double best = 0;
        int stale = 0;
        long t0 = System.nanoTime();
        do {
            Speed s = round.apply(slice);
            settles += s.cycles() * settlesPerUnit;
            if (s.cyclesPerSecond() > best * 1.03) {
                best = s.cyclesPerSecond();
                stale = 0;
            } else {
                stale++;
            }
        } while ((settles < minSettles || stale < 3) && (System.nanoTime() - t0) * 1e-9 < limit);
        Speed top = null;
        for (int i = 0; i < ROUNDS; i++) {
            Speed s = round.apply(slice);
            if (top == null || s.cyclesPerSecond() > top.cyclesPerSecond()) {
                top = s;
            }
        }
        return top;
    }

    private static Speed timed(Simulator sim, long[][] stimulus, double seconds) {
        long budget = (long) (seconds * 1e9);
        long cycles = 0;
        long evals0 = sim.gateEvaluations();
        long t0 = System.nanoTime();
        long t;
        int batch = 16;
        do {
            for (int k = 0; k < batch; k++) {
                long[] row = stimulus[(int) (cycles & 63)];
                for (int i = 0; i < row.length; i++) {
                    sim.setInput(i, row[i]);
                }
                sim.stepCycle();
                cycles++;
            }
            t = System.nanoTime() - t0;
            if (t < budget / 8) {
                batch = Math.min(batch * 2, 1 << 16);
            }
        } while (t < budget);
        return new Speed(cycles, sim.gateEvaluations() - evals0, t * 1e-9);
    }

    /** The engine's settle alone (no latches, PC or ROM), called in a loop: settles and gate evaluations per second. */
    public Speed settleOnly(Simulator sim) {
        int gates = sim.machine().netlist().gates().size();
        Speed s = steady(slice -> referenceLoop(v -> sim.settle(), null, slice), 1, WARM_SETTLES,
                sim.compiledEngine() ? WARM_LIMIT_SECONDS : Math.max(2, 5 * seconds));
        return new Speed(s.cycles(), s.cycles() * gates, s.seconds());
    }

    /** The straight-line settle alone, called in a loop over one value array: settles and gate evaluations per second. */
    public Speed reference(Consumer<long[]> settle, int nets, int gates) {
        long[] v = new long[nets];
        SplittableRandom rnd = new SplittableRandom(5);
        for (int i = 0; i < nets; i++) {
            v[i] = rnd.nextLong();
        }
        v[0] = 0;
        v[1] = -1L;
        Speed s = steady(slice -> referenceLoop(settle, v, slice), 1, WARM_SETTLES, WARM_LIMIT_SECONDS);
        return new Speed(s.cycles(), s.cycles() * gates, s.seconds());
    }

    private static Speed referenceLoop(Consumer<long[]> settle, long[] v, double seconds) {
        long budget = (long) (seconds * 1e9);
        long n = 0;
        long t0 = System.nanoTime();
        long t;
        int batch = 16;
        do {
            for (int k = 0; k < batch; k++) {
                settle.accept(v);
            }
            n += batch;
            t = System.nanoTime() - t0;
            if (t < budget / 8) {
                batch = Math.min(batch * 2, 1 << 16);
            }
        } while (t < budget);
        return new Speed(n, 0, t * 1e-9);
    }
}
