package org.thermion.bench;

import org.thermion.model.Machine;
import org.thermion.power.startup.PowerUpOptions;
import org.thermion.power.startup.PowerUpSolver;
import org.thermion.power.startup.ResistorSweep;
import org.thermion.power.startup.StartupNetwork;
import org.thermion.sim.Simulator;
import org.thermion.sim.compiled.Engine;
import org.thermion.sim.compiled.StraightLineCompiler;
import org.thermion.synth.SyntheticMachine;
import org.thermion.verify.Verifier;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * The whole benchmark in one run: for the demo and each synthetic size, elaboration time,
 * heap per stage instance, and the speed of each engine on one lane and on 64 lanes,
 * beside the straight-line reference (the generated settle called alone). Each figure is
 * set against its target.
 */
public final class BenchSuite {
    /** Targets of the speed-and-scale issue. */
    static final double ENGINE_VS_REFERENCE = 0.5;
    static final double GATE_EVALS_10K = 2e8;
    static final double LANES_GAIN = 40;
    static final double ELAB_100K_SECONDS = 2;
    static final double ELAB_GROWTH = 12;
    static final double HEAP_PER_STAGE = 2048;
    static final double POWERUP_SECONDS = 0.2;
    static final double SWEEP_SECONDS = 2;

    /**
     * The engine users get on the long runs measured here when they choose none: what
     * {@code auto} picks for a run of {@link Engine#LONG_RUN_CYCLES} cycles (the compiled engine).
     */
    public static Engine defaultEngine(Machine m) {
        return Engine.DEFAULT.forRun(m, Engine.LONG_RUN_CYCLES);
    }

    private final Path demo;
    private final List<Integer> sizes;
    private final List<Engine> engines;
    private final boolean quick;
    private final Measure measure;
    private final Consumer<String> progress;
    private final int compileMax;

    /** {@code compileMax}: largest netlist (in gates) that gets the straight-line reference and compiled engine. */
    public BenchSuite(Path demo, List<Integer> sizes, List<Engine> engines, boolean quick, double seconds,
                      int compileMax, Consumer<String> progress) {
        this.compileMax = compileMax;
        this.demo = demo;
        this.sizes = sizes;
        this.engines = engines;
        this.quick = quick;
        this.measure = new Measure(seconds);
        this.progress = progress;
    }

    public List<BenchRow> run() {
        List<BenchRow> rows = new ArrayList<>();
        List<Measure.Source> sources = new ArrayList<>();
        sources.add(new Measure.Source("demo", demo, null));
        for (int n : sizes) {
            SyntheticMachine sm = SyntheticMachine.ofSize(n);
            sources.add(new Measure.Source(label(n), null, sm.text()));
        }
        double elab10k = Double.NaN;
        double elab100k = Double.NaN;
        for (Measure.Source s : sources) {
            progress.accept("measuring " + s.label());
            Machine m = s.elaborate();
            int stages = m.stageInstanceCount();
            String who = s.label();
            rows.add(BenchRow.info(who, "stage instances", stages, ""));
            rows.add(BenchRow.info(who, "gates in the netlist (with free wires)", m.netlist().gates().size(), ""));
            int runs = quick ? 1 : (stages >= 50_000 ? 3 : 5);
            double t = Measure.elaborateSeconds(s, quick ? 1 : 2, runs);
            if (who.equals(label(100_000))) {
                elab100k = t;
                rows.add(BenchRow.target(who, "parse + elaborate", t, "s", ELAB_100K_SECONDS, true, "2 s"));
            } else {
                rows.add(BenchRow.info(who, "parse + elaborate", t, "s"));
            }
            if (who.equals(label(10_000))) {
                elab10k = t;
            }
            Machine[] hold = new Machine[1];
            m = null;
            int copies = Math.max(1, Math.min(20, 100_000 / stages));
            double bytes = Measure.retainedBytes(s::elaborate, copies, x -> hold[0] = x);
            m = hold[0];
            rows.add(BenchRow.target(who, "heap per stage instance", bytes / stages, "B", HEAP_PER_STAGE, true, "2 KB"));
            speeds(rows, who, m, stages);
            LevelsBench.rows(rows, who, m, quick, who.equals(label(10_000)));
            if (stages <= 10_000) {
                SheetsBench.rows(rows, who, m, quick, who.equals(label(10_000)));
            }
        }
        Machine demoMachine = sources.get(0).elaborate();
        verify(rows, demoMachine);
        powerUp(rows, demoMachine);
        PowerUpBench.rows(rows, quick, progress);
        ParseScaling.rows(rows, quick ? 1 : 3);
        if (!Double.isNaN(elab10k) && !Double.isNaN(elab100k)) {
            rows.add(BenchRow.target("scale", "elaborate time 10^5 / 10^4", elab100k / elab10k, "x", ELAB_GROWTH, true, "12 x"));
        }
        return rows;
    }

    /** One engine's figures on one machine. */
    private record EngineRun(Engine engine, Measure.Speed one, Measure.Speed all, double logic) {
    }

    private void speeds(List<BenchRow> rows, String who, Machine m, int stages) {
        int gates = m.netlist().gates().size();
        Consumer<long[]> settle = null;
        if (gates > compileMax) {
            rows.add(BenchRow.missing(who, "straight-line reference and compiled engine",
                    "skipped: " + gates + " gates is past --compile-max " + compileMax));
        } else {
            long t0 = System.nanoTime();
            settle = StraightLineCompiler.compileConsumer(m.netlist());
            rows.add(BenchRow.info(who, "straight-line: generate + load", (System.nanoTime() - t0) * 1e-9, "s"));
            // Warm the generated classes before any engine is timed on them.
            measure.reference(settle, m.netlist().netCount(), gates);
        }
        List<EngineRun> runs = new ArrayList<>();
        // The default engine first, so the shared simulator code is compiled for it as in a
        // normal run (one engine per process), not for whichever engine ran before.
        List<Engine> order = new ArrayList<>(engines);
        Engine chosen = defaultEngine(m);
        order.sort(java.util.Comparator.comparing(e -> e != chosen));
        for (Engine e : order) {
            if (e == Engine.COMPILED && settle == null) {
                continue;
            }
            Consumer<long[]> s = settle;
            Simulator sim = e == Engine.COMPILED ? new Simulator(m, (Simulator.Settle) s, StraightLineCompiler.latchLoads(m)) : new Simulator(m);
            Measure.Speed one = measure.run(sim, false, 17);
            Measure.Speed all = measure.run(sim, true, 17);
            runs.add(new EngineRun(e, one, all, measure.settleOnly(sim).gateEvaluationsPerSecond()));
        }
        // The reference measured again last: the compiled engine runs the same generated classes,
        // so by now the JIT has surely compiled all of them (a big netlist's take seconds).
        double reference = Double.NaN;
        if (settle != null) {
            reference = measure.reference(settle, m.netlist().netCount(), gates).gateEvaluationsPerSecond();
            rows.add(BenchRow.info(who, "straight-line reference: gate evals/s", reference, "/s"));
        }
        boolean heldToRatio = who.equals("demo") || who.equals(label(10_000));
        for (EngineRun run : runs) {
            engineRows(rows, who, run, reference, heldToRatio, run.engine() == chosen);
        }
    }

    private static void engineRows(List<BenchRow> rows, String who, EngineRun run, double reference, boolean heldToRatio,
                                   boolean isDefault) {
        Engine e = run.engine();
        Measure.Speed one = run.one();
        Measure.Speed all = run.all();
        double logic = run.logic();
        String name = e.word() + (isDefault ? " (default)" : "");
        rows.add(BenchRow.info(who, name + ", settle alone: gate evals/s", logic, "/s"));
        // Share of a one-lane cycle spent outside the logic: latch loads, PC, ROM, inputs.
        double outside = 1 - one.gateEvaluationsPerSecond() / logic;
        rows.add(BenchRow.info(who, name + ", 1 lane: cycles/s", one.cyclesPerSecond(), "/s"));
        double evals1 = one.gateEvaluationsPerSecond();
        if (who.equals(label(10_000))) {
            BenchRow r = BenchRow.target(who, name + ", 1 lane: gate evals/s", evals1, "/s", GATE_EVALS_10K, false, "2e8 /s (guide)");
            if (Boolean.FALSE.equals(r.met())) {
                r = r.withNote(String.format(java.util.Locale.ROOT, "settle alone %.3g /s; %.0f %% of a cycle outside logic",
                        logic, 100 * Math.max(0, outside)));
            }
            rows.add(r);
        } else {
            rows.add(BenchRow.info(who, name + ", 1 lane: gate evals/s", evals1, "/s"));
        }
        double lane64 = all.gateEvaluationsPerSecond() * Simulator.LANES;
        rows.add(BenchRow.info(who, name + ", 64 lanes: cycles/s", all.cyclesPerSecond(), "/s"));
        rows.add(BenchRow.info(who, name + ", 64 lanes: lane-evals/s", lane64, "/s"));
        BenchRow lanes = BenchRow.target(who, name + ", 64 lanes / 1 lane (lane-evals)", lane64 / evals1, "x", LANES_GAIN, false, "40 x");
        if (Boolean.FALSE.equals(lanes.met())) {
            // With the lanes' PCs apart, each cycle reads the ROM once per lane (64 lookups between
            // bit planes and words); alike, once for all. The difference is that read.
            lanes = lanes.withNote(String.format(java.util.Locale.ROOT,
                    "%.3f us/cycle with lanes parted vs %.3f us alike: the per-lane ROM read (%.3f us) costs more than this machine's logic (%.3f us a cycle)",
                    1e6 / all.cyclesPerSecond(), 1e6 / one.cyclesPerSecond(),
                    1e6 / all.cyclesPerSecond() - 1e6 / one.cyclesPerSecond(), 1e6 * one.gateEvaluations() / one.cycles() / logic));
        }
        rows.add(lanes);
        if (!Double.isNaN(reference)) {
            double ratio = evals1 / reference;
            if (isDefault && heldToRatio) {
                BenchRow r = BenchRow.target(who, name + " / straight-line reference", ratio, "x", ENGINE_VS_REFERENCE, false, "0.5 x");
                if (Boolean.FALSE.equals(r.met())) {
                    r = r.withNote(String.format(java.util.Locale.ROOT,
                            "settle alone %.2f x; %.0f %% of a cycle outside the logic (latch loads, PC, ROM read, inputs)",
                            logic / reference, 100 * Math.max(0, outside)));
                }
                rows.add(r);
            } else {
                rows.add(BenchRow.info(who, name + " / straight-line reference", ratio, "x"));
            }
        }
    }

    /** Exhaustive verification of the demo against its ISA: cases per second (best run after a warm-up). */
    private void verify(List<BenchRow> rows, Machine demo) {
        if (demo.isa() == null) {
            rows.add(BenchRow.missing("demo", "verify: cases/s", "the machine declares no isa"));
            return;
        }
        progress.accept("measuring verify on the demo");
        long[] cases = new long[1];
        double t = best(() -> cases[0] = new Verifier(demo, Verifier.Options.defaults()).run().cases(), quick ? 1 : 3);
        rows.add(BenchRow.info("demo", "verify: " + cases[0] + " cases", t, "s"));
        rows.add(BenchRow.info("demo", "verify: cases/s", cases[0] / t, "/s"));
        VerifyBench.threadRow(rows, "demo", demo, quick);
    }

    /** Power-up solve times on the demo: 30 s of switch-on, and a 50-point soft-start resistor sweep. */
    private void powerUp(List<BenchRow> rows, Machine demo) {
        progress.accept("measuring powerup on the demo");
        PowerUpOptions o = PowerUpOptions.defaults().withSeconds(30);
        double single = best(() -> PowerUpSolver.solve(demo, o), quick ? 1 : 3);
        rows.add(BenchRow.target("demo", "powerup: solve 30 s", single, "s", POWERUP_SECONDS, true, "0.2 s"));
        if (demo.softStarts().isEmpty()) {
            rows.add(BenchRow.missing("demo", "powerup: 50-point sweep", "the machine has no soft start"));
            return;
        }
        StartupNetwork net = StartupNetwork.of(demo, o.assumptions(), o.drawMode());
        String name = demo.softStarts().get(0).name();
        double[] ohms = ResistorSweep.range(0.05, 2.5, 0.05);
        double sweep = best(() -> ResistorSweep.run(net, o, name, ohms), 1);
        rows.add(BenchRow.target("demo", "powerup: sweep of " + ohms.length + " resistor values, 30 s each", sweep, "s",
                SWEEP_SECONDS, true, "2 s"));
    }

    /** Best wall time of {@code runs} runs after one warm-up run, in seconds. */
    static double best(Runnable r, int runs) {
        r.run();
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            r.run();
            best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
        }
        return best;
    }

    /** The label of a synthetic machine of {@code n} stage instances. */
    public static String label(int n) {
        return "synth " + n;
    }
}
