package org.thermion.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Compares output with a golden file under src/test/resources. Run the tests with
 * {@code -Dthermion.golden.update=true} to rewrite the files after a deliberate change,
 * then review the diff before committing.
 */
final class Golden {
    static final Path DIR = Path.of("src/test/resources/org/thermion/cli/budget");

    private Golden() {
    }

    static void assertMatches(String name, String actual) throws IOException {
        Path file = DIR.resolve(name);
        String text = actual.replace("\r\n", "\n");
        if (Boolean.getBoolean("thermion.golden.update")) {
            Files.writeString(file, text, StandardCharsets.UTF_8);
        }
        assertThat(Files.exists(file)).as("golden file %s exists (create it with -Dthermion.golden.update=true)", file).isTrue();
        assertThat(text).isEqualTo(Files.readString(file, StandardCharsets.UTF_8));
    }
}
