package org.thermion.asm;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.thermion.testing.Golden;
import java.util.stream.Stream;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every error class against its golden file: {@code errors/NAME.asm} assembled for the demo
 * machine must print exactly {@code errors/NAME.expected}. Run with {@code -Dgolden.update=true}
 * to rewrite the golden files after a deliberate wording change (then review the diff).
 */
class AssemblerErrorsTest {
    static final Path DIR = Path.of("src", "test", "resources", "org", "thermion", "asm", "errors");
    static Machine m;

    @BeforeAll
    static void load() {
        m = DemoMachine.load();
    }

    /** The cases: every {@code .asm} file of the folder. */
    static Stream<String> cases() {
        return Golden.corpus(DIR, ".asm").stream().map(p -> p.getFileName().toString().replace(".asm", ""));
    }

    @ParameterizedTest
    @MethodSource("cases")
    void printsTheGoldenDiagnostics(String name) throws IOException {
        String text = Files.readString(DIR.resolve(name + ".asm"), StandardCharsets.UTF_8);
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assembleText(m, Path.of(name + ".asm"), text, src, d);
        StringWriter w = new StringWriter();
        new DiagnosticPrinter(src).print(d, new PrintWriter(w));
        assertThat(a).isNull();
        Golden.assertMatches(DIR.resolve(name + ".expected"), w.toString());
    }
}
