package org.thermion.bench;

import org.thermion.asm.Assembler;
import org.thermion.asm.Assembly;
import org.thermion.elab.Elaborator;
import org.thermion.faults.Effort;
import org.thermion.faults.Fault;
import org.thermion.faults.FaultCircuit;
import org.thermion.faults.FaultList;
import org.thermion.faults.SocketPins;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.OneFaultSimulator;
import org.thermion.faults.Outcome;
import org.thermion.faults.Plan;
import org.thermion.faults.PlanGenerator;
import org.thermion.faults.Step;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.synth.SyntheticMachine;

import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.function.Consumer;

/**
 * The bring-up rows of {@code bench} (the plan and fault simulation): all collapsed faults of
 * the demo against its plan (< 1 s), plan generation on the demo (< 5 s) and on the synthetic
 * 10^4-stage machine (< 60 s, with its detected, proven and aborted counts), the bit-parallel
 * fault simulator against the one-fault-at-a-time reference on 10^4 stages (>= 50 x), and the
 * speed-up from one thread to two (>= 1.5 x).
 */
public final class FaultBench {
    static final double DEMO_FAULTS_SECONDS = 1;
    static final double DEMO_PLAN_SECONDS = 5;
    static final double SYNTH_PLAN_SECONDS = 60;
    static final double VS_REFERENCE = 50;
    static final double THREAD_GAIN = 1.5;

    private FaultBench() {
    }

    /** Adds the rows for the demo ({@code demo} running {@code program}) and the synthetic 10^4-stage machine. */
    public static void rows(List<BenchRow> all, Path demo, Path program, boolean quick, Consumer<String> progress) {
        // Each row is also told as it is measured, so a long run stopped early still leaves its figures.
        List<BenchRow> rows = new java.util.AbstractList<>() {
            @Override
            public BenchRow get(int i) {
                return all.get(i);
            }

            @Override
            public int size() {
                return all.size();
            }

            @Override
            public void add(int i, BenchRow r) {
                all.add(i, r);
                progress.accept("  " + r.machine() + ": " + r.measure() + " = " + r.value() + " " + r.unit()
                        + (r.target() == null ? "" : " (target " + r.target() + ")"));
            }
        };
        progress.accept("measuring fault simulation and plan generation on the demo");
        Machine m = elaborate(demo, null);
        if (m == null) {
            rows.add(BenchRow.missing("demo", "bring-up plan", "the demo does not elaborate"));
            return;
        }
        long[] rom = m.rom() == null ? null : assemble(m, program, null);
        demoRows(rows, m, rom, quick);
        progress.accept("measuring verify on the demo, 1 and 2 threads");
        VerifyBench.threadRow(rows, "demo", m, quick);
        progress.accept("measuring fault simulation and plan generation on the synthetic 10^4-stage machine");
        SyntheticMachine s = SyntheticMachine.ofSize(10_000);
        Machine big = elaborate(Path.of(s.name() + ".machine"), s.text());
        long[] bigRom = big == null ? null : assemble(big, Path.of(s.name() + ".asm"), s.program());
        if (big == null || bigRom == null) {
            rows.add(BenchRow.missing(s.name(), "bring-up plan", "the synthetic machine does not elaborate"));
            return;
        }
        synthRows(rows, s.name(), big, bigRom, quick);
    }

    private static void demoRows(List<BenchRow> rows, Machine m, long[] rom, boolean quick) {
        FaultCircuit c = FaultCircuit.of(m);
        FaultList faults = FaultList.of(c, SocketPins.of(m)); // as plan makes it, solder bridges included
        try (FaultSimulator one = new FaultSimulator(c, rom, 1); FaultSimulator two = new FaultSimulator(c, rom, 2)) {
            new PlanGenerator(two, faults, Effort.DEFAULT).generate();
            Plan[] plan = new Plan[1];
            double tPlan = best(() -> plan[0] = new PlanGenerator(two, faults, Effort.DEFAULT).generate(), quick ? 1 : 2);
            rows.add(BenchRow.target("demo", "plan generation (2 threads)", tPlan, "s", DEMO_PLAN_SECONDS, true, "5 s"));
            // The processor time of one thread tells the work apart from a machine shared with other jobs.
            java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
            long cpu0 = mx.getCurrentThreadCpuTime();
            new PlanGenerator(one, faults, Effort.DEFAULT).generate();
            rows.add(BenchRow.info("demo", "plan generation, processor time on 1 thread",
                    (mx.getCurrentThreadCpuTime() - cpu0) / 1e9, "s"));
            counts(rows, "demo", plan[0]);
            List<Fault> collapsed = plan[0].faults();
            List<Step> steps = plan[0].steps();
            double t2 = best(() -> two.firstDetection(collapsed, steps), quick ? 3 : 7);
            rows.add(BenchRow.target("demo", collapsed.size() + " collapsed faults against the plan (2 threads)", t2, "s",
                    DEMO_FAULTS_SECONDS, true, "1 s"));
            ThreadGain.measure(() -> one.responses(faults.all(), steps), () -> two.responses(faults.all(), steps),
                    quick ? 3 : 7).addRow(rows, "demo", "fault simulation, 1 -> 2 threads");
        }
    }

    private static void synthRows(List<BenchRow> rows, String who, Machine m, long[] rom, boolean quick) {
        FaultCircuit c = FaultCircuit.of(m);
        FaultList faults = FaultList.of(c);
        rows.add(BenchRow.info(who, "collapsed faults", faults.collapsed().size(), ""));
        List<Step> steps = Step.random(new Random(11), m.inputs().size(), 4, 4);
        // Enough batches that each of two threads gets several (16 per thread with --quick).
        List<Fault> sample = faults.collapsed().subList(0, Math.min(faults.collapsed().size(), 64 * (quick ? 32 : 64)));
        List<Fault> few = faults.collapsed().subList(0, Math.min(faults.collapsed().size(), quick ? 2 : 8));
        OneFaultSimulator ref = new OneFaultSimulator(c, rom);
        double tRef = best(() -> few.forEach(f -> ref.run(f, steps)), 1) / few.size();
        try (FaultSimulator one = new FaultSimulator(c, rom, 1); FaultSimulator two = new FaultSimulator(c, rom, 2)) {
            ThreadGain g = ThreadGain.measure(() -> one.responses(sample, steps), () -> two.responses(sample, steps),
                    quick ? 5 : 9);
            rows.add(BenchRow.target(who, "fault simulation / one-fault-at-a-time reference (1 thread)",
                    tRef / (g.oneSeconds() / sample.size()), "x", VS_REFERENCE, false, "50 x"));
            g.addRow(rows, who, "fault simulation, 1 -> 2 threads");
            if (quick) {
                rows.add(BenchRow.missing(who, "plan generation (2 threads)", "left out with --quick (minutes)"));
                return;
            }
            Plan[] plan = new Plan[1];
            double tPlan = best(() -> plan[0] = new PlanGenerator(two, faults, Effort.DEFAULT).generate(), 1);
            rows.add(BenchRow.target(who, "plan generation (2 threads)", tPlan, "s", SYNTH_PLAN_SECONDS, true, "60 s"));
            counts(rows, who, plan[0]);
        }
    }

    private static void counts(List<BenchRow> rows, String who, Plan p) {
        int proven = 0;
        for (Outcome o : Outcome.values()) {
            proven += o.proven() ? p.count(o) : 0;
        }
        rows.add(BenchRow.info(who, "plan: steps", p.steps().size(), ""));
        rows.add(BenchRow.info(who, "plan: faults detected", p.count(Outcome.DETECTED), ""));
        rows.add(BenchRow.info(who, "plan: faults proven undetectable", proven, ""));
        rows.add(BenchRow.info(who, "plan: faults aborted", p.count(Outcome.ABORTED), ""));
    }


    /** Best wall time of {@code runs} runs, no warm-up (the caller warms), in seconds. */
    static double best(Runnable r, int runs) {
        double b = Double.MAX_VALUE;
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            r.run();
            b = Math.min(b, (System.nanoTime() - t0) * 1e-9);
        }
        return b;
    }

    private static Machine elaborate(Path file, String text) {
        Diagnostics d = new Diagnostics();
        Elaborator e = new Elaborator(new SourceSet(), d);
        Machine m = text == null ? e.elaborate(file) : e.elaborateText(file, text);
        return d.hasErrors() ? null : m;
    }

    private static long[] assemble(Machine m, Path file, String text) {
        Diagnostics d = new Diagnostics();
        Assembly a = text == null ? Assembler.assemble(m, file, new SourceSet(), d)
                : Assembler.assembleText(m, file, text, new SourceSet(), d);
        return a == null || d.hasErrors() ? null : a.words();
    }
}
