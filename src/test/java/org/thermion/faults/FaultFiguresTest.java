package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.thermion.model.Machine;
import org.thermion.synth.SyntheticMachine;

import java.util.List;
import java.util.function.Supplier;

/**
 * Speed figures, measured by hand and never asserted:
 * {@code mvn -B -o test -Dtest=FaultFiguresTest -Dfaults.figures=true}.
 */
@EnabledIfSystemProperty(named = "faults.figures", matches = "true")
class FaultFiguresTest {

    private static double bestSeconds(int runs, Runnable r) {
        double best = Double.MAX_VALUE;
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            r.run();
            best = Math.min(best, (System.nanoTime() - t0) / 1e9);
        }
        return best;
    }

    private static <T> T timed(String what, Supplier<T> s) {
        long t0 = System.nanoTime();
        T t = s.get();
        System.out.printf("FIGURE %s: %.3f s%n", what, (System.nanoTime() - t0) / 1e9);
        return t;
    }

    @Test
    void demo() {
        Machine demo = Bench.demo();
        long[] rom = Bench.demoRom(demo);
        FaultCircuit c = FaultCircuit.of(demo);
        FaultList faults = FaultList.of(c, SocketPins.of(demo));
        System.out.printf("FIGURE demo bridges: %d, %d collapsed%n", faults.bridges().size(), faults.bridgeCollapsedCount());
        System.out.printf("FIGURE demo faults: %d stuck-at, %d collapsed (%d after dominance), %d all, %d collapsed all%n",
                faults.stuckAtCount(), faults.stuckAtCollapsedCount(), faults.stuckAtTargetCount(), faults.all().size(),
                faults.collapsed().size());
        try (FaultSimulator two = new FaultSimulator(c, rom, 2); FaultSimulator one = new FaultSimulator(c, rom, 1)) {
            new PlanGenerator(two, faults, Effort.DEFAULT).generate();
            Plan plan = timed("demo plan generation (2 threads)", () -> new PlanGenerator(two, faults, Effort.DEFAULT).generate());
            System.out.println("FIGURE demo plan: " + plan.steps().size() + " steps " + plan.counts());
            java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
            long cpu0 = mx.getCurrentThreadCpuTime();
            long wall0 = System.nanoTime();
            new PlanGenerator(one, faults, Effort.DEFAULT).generate();
            System.out.printf("FIGURE demo plan generation on 1 thread, bridges included: %.3f s CPU, %.3f s wall (load average %.1f)%n",
                    (mx.getCurrentThreadCpuTime() - cpu0) / 1e9, (System.nanoTime() - wall0) / 1e9,
                    java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            FaultList plain = FaultList.of(c);
            cpu0 = mx.getCurrentThreadCpuTime();
            new PlanGenerator(one, plain, Effort.DEFAULT).generate();
            System.out.printf("FIGURE demo plan generation on 1 thread, no bridges: %.3f s CPU%n",
                    (mx.getCurrentThreadCpuTime() - cpu0) / 1e9);
            List<Fault> all = plan.faults();
            double t1 = bestSeconds(7, () -> one.firstDetection(all, plan.steps()));
            double t2 = bestSeconds(7, () -> two.firstDetection(all, plan.steps()));
            System.out.printf("FIGURE demo %d collapsed faults against the plan: %.4f s on 1 thread, %.4f s on 2 (x%.2f)%n",
                    all.size(), t1, t2, t1 / t2);
            double r1 = bestSeconds(5, () -> one.responses(faults.all(), plan.steps()));
            double r2 = bestSeconds(5, () -> two.responses(faults.all(), plan.steps()));
            System.out.printf("FIGURE demo all %d faults, full responses: %.4f s on 1 thread, %.4f s on 2 (x%.2f)%n",
                    faults.all().size(), r1, r2, r1 / r2);
        }
    }

    @Test
    void synthetic10k() {
        SyntheticMachine s = SyntheticMachine.ofSize(10_000);
        Machine m = timed("synthetic 10^4 elaboration", () -> Bench.text(s.text()));
        long[] rom = Bench.rom(m, s.program());
        FaultCircuit c = FaultCircuit.of(m);
        FaultList faults = FaultList.of(c);
        System.out.printf("FIGURE synthetic: %d stages, %d slots, %d stuck-at, %d collapsed%n",
                m.stageInstanceCount(), c.slotCount(), faults.stuckAtCount(), faults.stuckAtCollapsedCount());
        List<Step> steps = RandomMachines.steps(11, m.inputs().size(), 4);
        List<Fault> sample = faults.collapsed().subList(0, 64 * 16);
        List<Fault> few = faults.collapsed().subList(0, 8);
        OneFaultSimulator ref = new OneFaultSimulator(c, rom);
        double tr = bestSeconds(1, () -> {
            for (Fault f : few) {
                ref.run(f, steps);
            }
        }) / few.size();
        try (FaultSimulator two = new FaultSimulator(c, rom, 2); FaultSimulator one = new FaultSimulator(c, rom, 1)) {
            one.responses(sample, steps);
            double t1 = bestSeconds(3, () -> one.responses(sample, steps)) / sample.size();
            double t2 = bestSeconds(3, () -> two.responses(sample, steps)) / sample.size();
            List<Fault> lanes = sample.subList(0, 64);
            double single = bestSeconds(2, () -> {
                for (Fault f : lanes) {
                    one.responses(List.of(f), steps);
                }
            }) / lanes.size();
            double packed = bestSeconds(3, () -> one.responses(lanes, steps)) / lanes.size();
            System.out.printf("FIGURE synthetic flat program, one fault per run %.6f s, 64 per run %.6f s per fault (x%.1f)%n",
                    single, packed, single / packed);
            System.out.printf("FIGURE synthetic fault simulation per fault: reference %.4f s, fast %.6f s on 1 thread"
                    + " (x%.0f), %.6f s on 2 threads (x%.0f); 1->2 threads x%.2f%n", tr, t1, tr / t1, t2, tr / t2, t1 / t2);
        }
    }
}
