package org.thermion.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.OperatingSystemMXBean;
import java.util.List;

/**
 * The speed-up of one piece of work from one thread to two, and how many processors the
 * two-thread runs really got (process processor time over wall time): on a machine shared with
 * other jobs the second figure tells a slow parallel code apart from a second core that was busy.
 * One- and two-thread runs alternate so a burst of load spoils both alike; each keeps its best.
 */
record ThreadGain(double gain, double oneSeconds, double processors) {
    /** Below this many processors the two-thread runs were starved, and the row says so. */
    static final double STARVED = 1.8;

    /** Measures after one warm-up run of each; {@code rounds} runs of each after that. */
    static ThreadGain measure(Runnable one, Runnable two, int rounds) {
        one.run();
        two.run();
        double b1 = Double.MAX_VALUE;
        double b2 = Double.MAX_VALUE;
        double cpu = 0;
        double wall = 0;
        for (int r = 0; r < rounds; r++) {
            b1 = Math.min(b1, FaultBench.best(one, 1));
            double c0 = processSeconds();
            double t = FaultBench.best(two, 1);
            cpu += processSeconds() - c0;
            wall += t;
            b2 = Math.min(b2, t);
        }
        return new ThreadGain(b1 / b2, b1, cpu / wall);
    }

    /** Adds the target row (1.5 x), noting when the second processor was not really there. */
    void addRow(List<BenchRow> rows, String who, String measure) {
        BenchRow row = BenchRow.target(who, measure, gain, "x", FaultBench.THREAD_GAIN, false, "1.5 x");
        if (processors < STARVED) {
            row = row.withNote(String.format(java.util.Locale.ROOT,
                    "the 2-thread runs got %.2f processors (machine busy)", processors));
        }
        rows.add(row);
    }

    // NaN where the platform does not tell a process's processor time.
    private static double processSeconds() {
        OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
        if (os instanceof com.sun.management.OperatingSystemMXBean) {
            return ((com.sun.management.OperatingSystemMXBean) os).getProcessCpuTime() * 1e-9;
        }
        return Double.NaN;
    }
}
