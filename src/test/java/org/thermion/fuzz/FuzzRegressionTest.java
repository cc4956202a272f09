package org.thermion.fuzz;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Cases the fuzzer once failed on, replayed by their seeds (what each one found is beside it).
 * They stay green once fixed; a new crasher's seed goes here with a line on what it found.
 */
class FuzzRegressionTest {
    /** Seed and what it found. */
    record Crasher(long seed, String found) {
    }

    static final List<Crasher> CRASHERS = List.of(
            new Crasher(-229654252595052775L, "a NUL in an --output path: picocli's conversion named InvalidPathException"
                    + " (and a 30,000-line comment block, which once took minutes to parse)"),
            new Crasher(-8338292015918893875L, "a NUL in the positional machine path: the same"));

    @TestFactory
    Stream<DynamicTest> everyOnceFailingCaseNowPasses() {
        CaseGenerator gen = new CaseGenerator();
        return CRASHERS.stream().map(c -> DynamicTest.dynamicTest(c.seed() + ": " + c.found(), () -> {
            FuzzCase fc = gen.make(c.seed());
            try (Runner r = new Runner()) {
                Runner.Outcome o = r.run(fc);
                assertThat(o.problems()).as("%s\n%s", fc, o.err()).isEmpty();
            }
        }));
    }
}
