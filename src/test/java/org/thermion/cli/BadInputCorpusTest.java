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
 * run. A case without its {@code .expected} file fails; {@code -Dgolden.update=true} writes them.
 */
class BadInputCorpusTest {
    static final Path DIR = Path.of("src/test/resources/org/thermion/badinput");
    static final String MACHINE = "examples/pumpstation/pumpstation.machine";

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
        String[] args;
        if (name.endsWith(".machine")) {
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
        assertThat(code).as(shown).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).as(shown).doesNotContain("internal error").doesNotContain("Exception");
        Golden.assertMatches(Golden.expectedFor(file), shown);
    }
}
