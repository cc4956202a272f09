package org.thermion.fuzz;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The fuzzer: seeded cases (see {@link CaseGenerator}) run through every command in-process
 * and judged by {@link Runner}. The short pass runs by default in {@code mvn -B verify}: at
 * most {@code fuzz.seconds} (default 45) or {@code fuzz.inputs} cases. The long pass runs on
 * demand: {@code mvn -B -o test -Pfuzz-long} (10^5 cases, no time limit). {@code -Dfuzz.seed=S}
 * picks another master seed; {@code -Dfuzz.case=C} replays one case by the seed printed with
 * its failure.
 */
class FuzzTest {
    static final long DEFAULT_SEED = 20261203L;

    @Test
    void noInputCrashesHangsMisplacesAnErrorOrChangesAFile() throws Exception {
        long master = Long.getLong("fuzz.seed", DEFAULT_SEED);
        long inputs = Long.getLong("fuzz.inputs", 100_000);
        long seconds = Long.getLong("fuzz.seconds", 45);
        Long only = Long.getLong("fuzz.case");
        CaseGenerator gen = new CaseGenerator();
        Random seeds = new Random(master);
        List<String> failures = new ArrayList<>();
        long t0 = System.nanoTime();
        int ran = 0;
        try (Runner runner = new Runner()) {
            for (long i = 0; i < (only != null ? 1 : inputs); i++) {
                if (only == null && seconds > 0 && System.nanoTime() - t0 > seconds * 1_000_000_000L) {
                    break;
                }
                long seed = only != null ? only : seeds.nextLong();
                FuzzCase c = gen.make(seed);
                Runner.Outcome o = runner.run(c);
                ran++;
                if (!o.problems().isEmpty()) {
                    failures.add(c + "\n  -> " + String.join("\n  -> ", o.problems()) + "\n  exit " + o.code() + ", stderr:\n"
                            + indent(o.err()) + "\n  replay: -Dtest=FuzzTest -Dfuzz.case=" + seed);
                    if (failures.size() >= 10) {
                        break;
                    }
                }
            }
        }
        System.out.printf("fuzz: %d cases from master seed %d in %.1f s, %d failing%n", ran, master,
                (System.nanoTime() - t0) * 1e-9, failures.size());
        assertThat(failures).as("fuzz failures (master seed %d)", master).isEmpty();
        assertThat(ran).as("cases run").isGreaterThan(only != null ? 0 : 20);
    }

    private static String indent(String s) {
        String cut = s.length() > 3000 ? s.substring(0, 3000) + "\n..." : s;
        return "    " + cut.replace("\n", "\n    ");
    }
}
