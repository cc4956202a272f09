package org.thermion.elab;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.testing.Golden;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every error class has a small broken description and the exact report it must give. The
 * cases are the {@code .machine} files of the folder that declare a machine (the others are
 * parts they include); each must have its {@code .expected} file. Run with
 * {@code -Dgolden.update=true} to rewrite the expected files after a deliberate change.
 */
class GoldenErrorsTest {
    static final Path DIR = Path.of("src/test/resources/org/thermion/elab/errors");

    @TestFactory
    Stream<DynamicTest> eachErrorClassReportsWhereAndWhat() {
        return Golden.corpus(DIR, ".machine").stream().filter(GoldenErrorsTest::declaresAMachine)
                .map(file -> DynamicTest.dynamicTest(file.getFileName().toString(), () -> check(file)));
    }

    private static boolean declaresAMachine(Path file) {
        try {
            return Files.readAllLines(file).stream().anyMatch(l -> l.startsWith("machine "));
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private void check(Path file) {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Object machine = new Elaborator(sources, diags).elaborate(file);
        StringWriter sw = new StringWriter();
        new DiagnosticPrinter(sources).print(diags, new PrintWriter(sw));
        String actual = sw.toString();
        assertThat(machine).as("a broken description elaborates to nothing").isNull();
        assertThat(diags.hasErrors()).isTrue();
        Golden.assertMatches(Golden.expectedFor(file), actual);
    }
}
