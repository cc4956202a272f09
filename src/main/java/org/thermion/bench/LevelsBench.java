package org.thermion.bench;

import java.util.List;

import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.Tolerances;
import org.thermion.levels.LevelAnalysis;
import org.thermion.model.Machine;
import org.thermion.model.MarginRules;

/**
 * What the electrical analysis adds to {@code check}: every net's operating points, worst-case
 * margins and fan-out limit, lamp and coil drivers, each run with fresh caches (a new
 * {@link MachineCircuits}) after one warm-up run. Target: under 1 s on the 10^4-stage machine
 * (issue 16).
 */
final class LevelsBench {
    /** The most the analysis may add to check on the 10^4-stage synthetic machine (seconds). */
    static final double TARGET_SECONDS = 1.0;

    private LevelsBench() {
    }

    static void rows(List<BenchRow> rows, String who, Machine m, boolean quick, boolean held) {
        MarginRules r = MarginRules.DEFAULT;
        Tolerances t = new Tolerances(r.rail(), r.resistor(), r.endOfLife());
        LevelAnalysis.of(m, MachineCircuits.of(m), t, r.minMargin());
        double best = Double.POSITIVE_INFINITY;
        LevelAnalysis last = null;
        for (int i = 0; i < (quick ? 1 : 3); i++) {
            MachineCircuits circuits = MachineCircuits.of(m);
            long t0 = System.nanoTime();
            last = LevelAnalysis.of(m, circuits, t, r.minMargin());
            best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
        }
        String what = "levels and worst-case margins (added to check)";
        rows.add(held ? BenchRow.target(who, what, best, "s", TARGET_SECONDS, true, "1 s")
                : BenchRow.info(who, what, best, "s"));
        rows.add(BenchRow.info(who, "levels: kinds of net solved", last.kinds(), ""));
        rows.add(BenchRow.info(who, "levels: DC solves", last.rails().solver().solves(), ""));
    }
}
