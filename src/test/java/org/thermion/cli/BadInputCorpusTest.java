package org.thermion.cli;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.thermion.testing.Golden;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The corpus of bad inputs: one file per error class in {@link #DIR}, found by listing the
 * folder, each with the exact answer beside it in a {@code .expected} file (the command, its
 * exit code and what it printed). A {@code .machine} file is checked, a {@code .asm} file
 * assembled for the pump station, a {@code .csv} file read as the stimulus of a pump station
 * run; a {@code plan-*.machine} file is given to {@code plan}, and an {@code obs-*.csv} file is read
 * as the lamps seen on c17's plan by {@code diagnose}. A {@code check-*.machine} file is read
 * without fault but fails {@code check}'s electrical judgement (exit 1: a circuit with no DC
 * solution, a relay coil short of its pick-up), each error at its place in the source. A case
 * without its {@code .expected} file fails; {@code -Dgolden.update=true} writes them.
 */
class BadInputCorpusTest {
    static final Path DIR = Path.of("src/test/resources/org/thermion/badinput");
    static final String MACHINE = "examples/pumpstation/pumpstation.machine";
    static final String C17 = "src/test/resources/org/thermion/faults/c17.machine";

    @TestFactory
    Stream<DynamicTest> everyBadInputIsAnsweredInWordsWithExitTwo() {
        List<Path> cases = new ArrayList<>();
        for (String suffix : List.of(".machine", ".asm", ".csv")) {
            cases.addAll(Golden.corpus(DIR, suffix));
        }
        return cases.stream().map(p -> DynamicTest.dynamicTest(p.getFileName().toString(), () -> check(p)));
    }

    private static void check(Path file) {
        String name = file.toString();
        String base = file.getFileName().toString();
        String[] args;
        if (base.startsWith("plan-")) {
            args = new String[] {"plan", name};
        } else if (base.startsWith("trace-")) {
            args = new String[] {"powerup", MACHINE, "--fit", name};
        } else if (base.startsWith("obs-")) {
            args = new String[] {"diagnose", C17, name};
        } else if (name.endsWith(".machine")) {
            args = new String[] {"check", name};
        } else if (name.endsWith(".asm")) {
            args = new String[] {"asm", MACHINE, name};
        } else {
            args = new String[] {"run", MACHINE, "programs/pump.asm", "--inputs", name, "--cycles", "30"};
        }
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out)).setErr(new PrintWriter(err)).execute(args);
        String shown = "$ thermion " + String.join(" ", args) + "\nexit " + code + "\n" + out + err;
        assertThat(code).as(shown).isEqualTo(base.startsWith("check-") ? ExitCodes.CHECK_FAILED : ExitCodes.BAD_INPUT);
        if (base.startsWith("check-")) {
            assertThat(err.toString()).as(shown).containsPattern(":\\d+:\\d+: error: ");
        }
        assertThat(err.toString()).as(shown).doesNotContain("internal error").doesNotContain("Exception");
        Golden.assertMatches(Golden.expectedFor(file), shown);
    }
}
