package org.thermion.bench;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.MachineReader;

import java.nio.file.Path;
import java.util.List;

/**
 * Parse time against input size: a module block holding only comment lines, at 10^4 and
 * 10^5 lines. Linear parsing gives a ratio near 10; an ambiguous grammar rule that looks
 * ahead over every following line makes it near 100.
 */
final class ParseScaling {
    static final double GROWTH = 15;

    private ParseScaling() {
    }

    static void rows(List<BenchRow> rows, int runs) {
        double small = seconds(10_000, runs);
        double large = seconds(100_000, runs);
        rows.add(BenchRow.info("parse", "comment-only block, 10^4 lines", small, "s"));
        rows.add(BenchRow.info("parse", "comment-only block, 10^5 lines", large, "s"));
        rows.add(BenchRow.target("parse", "parse time 10^5 / 10^4 lines", large / small, "x", GROWTH, true, "15 x"));
    }

    /** Best of {@code runs} parses after one warm-up. */
    private static double seconds(int lines, int runs) {
        StringBuilder b = new StringBuilder("module notes {\n");
        for (int i = 0; i < lines; i++) {
            b.append("  # note ").append(i).append(": nothing here but words\n");
        }
        String text = b.append("}\n").toString();
        Path nominal = Path.of("comments.machine");
        MachineReader.parse(nominal, text, new Diagnostics());
        double best = Double.POSITIVE_INFINITY;
        for (int r = 0; r < runs; r++) {
            long t0 = System.nanoTime();
            MachineReader.parse(nominal, text, new Diagnostics());
            best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
        }
        return best;
    }
}
