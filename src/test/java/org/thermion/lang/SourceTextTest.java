package org.thermion.lang;

import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** Input files are UTF-8; anything else is named as such, at its line and byte. */
class SourceTextTest {
    private static final Path FILE = Path.of("notes.machine");

    @Test
    void utf8TextIsReturnedAsIs() {
        Diagnostics diags = new Diagnostics();
        String text = "# Widerstand 4,7 kΩ\nrail b { voltage 48 V }\n";
        assertThat(SourceText.decode(FILE, text.getBytes(StandardCharsets.UTF_8), new SourceSet(), diags)).isEqualTo(text);
        assertThat(diags.hasErrors()).isFalse();
    }

    @Test
    void latin1IsReportedAtTheLineAndByteOfTheFirstBadByte() {
        Diagnostics diags = new Diagnostics();
        SourceSet sources = new SourceSet();
        // "é" in Latin-1 is the single byte 0xE9 (ISO/IEC 8859-1), which UTF-8 never uses alone.
        byte[] bytes = "rail b\n# café\n".getBytes(StandardCharsets.ISO_8859_1);
        assertThat(SourceText.decode(FILE, bytes, sources, diags)).isNull();
        Diagnostic d = diags.all().get(0);
        assertThat(d.message()).isEqualTo("not valid UTF-8: byte 0xE9 at line 2, byte 6 of the line (byte 13 of the file)");
        assertThat(d.span().line()).isEqualTo(2);
        assertThat(d.span().col()).isEqualTo(6);
        assertThat(sources.line(FILE, 2)).startsWith("# caf");
    }

    @Test
    void theColumnCountsCharactersNotBytes() {
        Diagnostics diags = new Diagnostics();
        byte[] ok = "Ω ".getBytes(StandardCharsets.UTF_8);
        byte[] bytes = new byte[ok.length + 1];
        System.arraycopy(ok, 0, bytes, 0, ok.length);
        bytes[ok.length] = (byte) 0xFF;
        SourceText.decode(FILE, bytes, new SourceSet(), diags);
        assertThat(diags.all().get(0).span().col()).isEqualTo(3);
    }

    @Test
    void anEmptyFileNameIsNamedAsSuchNotAsTheCurrentDirectory() {
        Diagnostics diags = new Diagnostics();
        assertThat(SourceText.read(Path.of(""), "program", new SourceSet(), diags)).isNull();
        assertThat(diags.all().get(0).message()).isEqualTo("cannot read the program: no file name given");
    }

    @Test
    void aDirectoryIsSaidToBeOne(@org.junit.jupiter.api.io.TempDir Path dir) {
        Diagnostics diags = new Diagnostics();
        assertThat(SourceText.read(dir, "stimulus file", new SourceSet(), diags)).isNull();
        assertThat(diags.all().get(0).message()).isEqualTo("cannot read stimulus file " + dir + ": it is a directory");
    }
}
