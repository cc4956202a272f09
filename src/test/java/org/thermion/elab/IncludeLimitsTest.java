package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.thermion.lang.Diagnostic;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Includes that are too deep, not UTF-8, not a file name, or a directory: each one clear error at the include. */
class IncludeLimitsTest {
    @TempDir
    Path dir;

    private List<Diagnostic> errors(Path root) {
        Diagnostics diags = new Diagnostics();
        new Elaborator(new SourceSet(), diags).elaborate(root);
        return diags.all().stream().filter(Diagnostic::isError).toList();
    }

    @Test
    void aChainOfThreeThousandIncludesStopsAtTheDepthLimit() throws IOException {
        for (int i = 0; i < 3000; i++) {
            Files.writeString(dir.resolve("f" + i + ".machine"), i < 2999 ? "include \"f" + (i + 1) + ".machine\"\n" : "# end\n");
        }
        List<Diagnostic> e = errors(dir.resolve("f0.machine"));
        assertThat(e.get(0).message()).isEqualTo("includes nested deeper than 64 files");
        // f0 is the first file open; the include on the 64th file (f63) would open a 65th.
        assertThat(e.get(0).span().file().getFileName().toString()).isEqualTo("f63.machine");
        assertThat(e.get(0).span().line()).isEqualTo(1);
    }

    @Test
    void aLatin1IncludeIsReportedAsNotUtf8NotAsMissing() throws IOException {
        Files.write(dir.resolve("parts.machine"), "# résistance\n".getBytes(StandardCharsets.ISO_8859_1));
        Files.writeString(dir.resolve("top.machine"), "include \"parts.machine\"\n");
        List<Diagnostic> e = errors(dir.resolve("top.machine"));
        assertThat(e.get(0).message()).startsWith("not valid UTF-8: byte 0xE9 at line 1, byte 4");
        assertThat(e.get(0).span().file().getFileName().toString()).isEqualTo("parts.machine");
    }

    @Test
    void aNulInAnIncludePathIsNamed() throws IOException {
        Files.write(dir.resolve("top.machine"), "include \"a\u0000b\"\n".getBytes(StandardCharsets.UTF_8));
        List<Diagnostic> e = errors(dir.resolve("top.machine"));
        assertThat(e.get(0).message()).isEqualTo("include path is not a file name: it holds a NUL character");
        assertThat(e.get(0).span().line()).isEqualTo(1);
    }

    @Test
    void anIncludeNamingADirectoryIsSaidToBeOne() throws IOException {
        Files.createDirectory(dir.resolve("sub"));
        Files.writeString(dir.resolve("top.machine"), "include \"sub\"\n");
        List<Diagnostic> e = errors(dir.resolve("top.machine"));
        assertThat(e.get(0).message()).endsWith("sub: it is a directory");
    }
}
