package org.thermion.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The one golden-file comparison of the test suite. A golden file holds the exact text a
 * report, screen or error message must produce. Run the tests with {@code -Dgolden.update=true}
 * to rewrite every golden file after a deliberate change, then review the diff before
 * committing. Without the switch a missing golden file fails: nothing is written.
 */
public final class Golden {
    /** The one switch that rewrites golden files. */
    public static final String UPDATE_SWITCH = "golden.update";

    private Golden() {
    }

    /** Asserts that {@code actual} equals the text of {@code file} (line ends normalised). */
    public static void assertMatches(Path file, String actual) {
        String text = actual.replace("\r\n", "\n");
        try {
            if (Boolean.getBoolean(UPDATE_SWITCH)) {
                Files.createDirectories(file.toAbsolutePath().getParent());
                Files.writeString(file, text, StandardCharsets.UTF_8);
            }
            assertThat(file).as("golden file %s is missing (run with -D%s=true to create it, then review it)",
                    file, UPDATE_SWITCH).exists();
            assertThat(text).as("output differs from golden file %s", file)
                    .isEqualTo(Files.readString(file, StandardCharsets.UTF_8).replace("\r\n", "\n"));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Every file in {@code folder} whose name ends in {@code suffix}, sorted by name: golden
     * corpora are found by listing their folder, never by a typed list. Fails on an empty folder.
     */
    public static List<Path> corpus(Path folder, String suffix) {
        try (Stream<Path> files = Files.list(folder)) {
            List<Path> found = files.filter(p -> p.getFileName().toString().endsWith(suffix)).sorted().toList();
            assertThat(found).as("corpus %s holds files ending in %s", folder, suffix).isNotEmpty();
            return found;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** {@code source} with its extension replaced by {@code .expected}. */
    public static Path expectedFor(Path source) {
        String name = source.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return source.resolveSibling((dot < 0 ? name : name.substring(0, dot)) + ".expected");
    }
}
