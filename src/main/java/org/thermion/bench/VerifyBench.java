package org.thermion.bench;

import org.thermion.model.Machine;
import org.thermion.verify.Verifier;

import java.util.List;

/** The {@code verify} thread row: the demo's exhaustive check on one thread and on two. */
final class VerifyBench {
    private VerifyBench() {
    }

    /** Adds "verify, 1 -> 2 threads" (target 1.5 x); after a warm-up of each, one run each with {@code quick}, else the best of two. */
    static void threadRow(List<BenchRow> rows, String who, Machine m, boolean quick) {
        if (m.isa() == null) {
            rows.add(BenchRow.missing(who, "verify, 1 -> 2 threads", "the machine declares no isa"));
            return;
        }
        Verifier.Options one = Verifier.Options.defaults().withThreads(1);
        Verifier.Options two = Verifier.Options.defaults().withThreads(2);
        ThreadGain g = ThreadGain.measure(() -> new Verifier(m, one).run(), () -> new Verifier(m, two).run(), quick ? 1 : 2);
        rows.add(BenchRow.info(who, "verify on 1 thread", g.oneSeconds(), "s"));
        g.addRow(rows, who, "verify, 1 -> 2 threads");
    }
}
