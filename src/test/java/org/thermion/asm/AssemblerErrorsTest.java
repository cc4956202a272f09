package org.thermion.asm;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
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

    @ParameterizedTest
    @ValueSource(strings = {"unknown-mnemonic", "too-wide", "undefined-label", "duplicate-label", "rom-too-large",
            "syntax", "numbers", "directives", "several"})
    void printsTheGoldenDiagnostics(String name) throws IOException {
        String text = Files.readString(DIR.resolve(name + ".asm"), StandardCharsets.UTF_8);
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assembleText(m, Path.of(name + ".asm"), text, src, d);
        StringWriter w = new StringWriter();
        new DiagnosticPrinter(src).print(d, new PrintWriter(w));
        Path golden = DIR.resolve(name + ".expected");
        if (Boolean.getBoolean("golden.update")) {
            Files.writeString(golden, w.toString(), StandardCharsets.UTF_8);
        }
        assertThat(a).isNull();
        assertThat(w.toString()).isEqualTo(Files.readString(golden, StandardCharsets.UTF_8));
    }
}
