package org.thermion.elab;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.testing.Golden;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Bad property values, one file per kind of mistake, each with the exact report beside it:
 * unknown keys with the nearest known one, wrong units, values out of range with the limit,
 * numbers too large to read, keys given twice and required keys missing. The cases are the
 * {@code .machine} files of the folder.
 */
class PropertyErrorsTest {
    static final Path DIR = Path.of("src/test/resources/org/thermion/elab/props");

    @TestFactory
    Stream<DynamicTest> everyBadPropertyIsReportedWhereAndWithItsLimit() {
        return Golden.corpus(DIR, ".machine").stream()
                .map(file -> DynamicTest.dynamicTest(file.getFileName().toString(), () -> check(file)));
    }

    private static void check(Path file) {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Object machine = new Elaborator(sources, diags).elaborate(file);
        StringWriter sw = new StringWriter();
        new DiagnosticPrinter(sources).print(diags, new PrintWriter(sw));
        assertThat(machine).as("a description with bad properties elaborates to nothing").isNull();
        assertThat(diags.errorCount()).as("several mistakes in one file are all reported").isGreaterThan(1);
        Golden.assertMatches(Golden.expectedFor(file), sw.toString());
    }
}
