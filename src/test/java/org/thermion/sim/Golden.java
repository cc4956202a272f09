package org.thermion.sim;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Compares text with a golden file under src/test/resources/org/thermion/sim/. Run with
 * {@code -Dgolden.update=true} to rewrite the files after a deliberate change (then review the diff).
 */
final class Golden {
    static final Path DIR = Path.of("src", "test", "resources", "org", "thermion", "sim");

    private Golden() {
    }

    static void check(String name, String actual) throws IOException {
        Path file = DIR.resolve(name);
        if (Boolean.getBoolean("golden.update")) {
            Files.createDirectories(file.getParent());
            Files.writeString(file, actual, StandardCharsets.UTF_8);
        }
        assertThat(file).as("golden file %s (run with -Dgolden.update=true to create it)", file).exists();
        assertThat(actual).isEqualTo(Files.readString(file, StandardCharsets.UTF_8));
    }
}
