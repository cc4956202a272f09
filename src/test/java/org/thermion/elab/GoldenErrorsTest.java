package org.thermion.elab;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every error class has a small broken description and the exact report it must give.
 * Run with -Dgolden.update=true to rewrite the expected files after a deliberate change.
 */
class GoldenErrorsTest {
    static final Path DIR = Path.of("src/test/resources/org/thermion/elab/errors");

    static final List<String> CASES = List.of("syntax", "unknown-name", "duplicate-name", "width-mismatch",
            "index-range", "undriven", "undriven-port", "two-drivers", "comb-loop", "wrong-unit", "out-of-range",
            "include-missing", "include-cycle", "stage-inputs", "no-stage", "latch-no-phase", "isa-opcode",
            "isa-unbound", "too-large", "unknown-module");

    @TestFactory
    Stream<DynamicTest> eachErrorClassReportsWhereAndWhat() {
        return CASES.stream().map(name -> DynamicTest.dynamicTest(name, () -> check(name)));
    }

    private void check(String name) throws IOException {
        Path file = DIR.resolve(name + ".machine");
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Object machine = new Elaborator(sources, diags).elaborate(file);
        StringWriter sw = new StringWriter();
        new DiagnosticPrinter(sources).print(diags, new PrintWriter(sw));
        String actual = sw.toString();
        assertThat(machine).as("a broken description elaborates to nothing").isNull();
        assertThat(diags.hasErrors()).isTrue();
        Path expected = DIR.resolve(name + ".expected");
        if (Boolean.getBoolean("golden.update") || !Files.exists(expected)) {
            Files.writeString(expected, actual);
        }
        assertThat(actual).isEqualTo(Files.readString(expected));
    }
}
