package org.thermion.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** What the command does with no arguments: the bundled example machine. */
final class DefaultRun {
    private DefaultRun() {
    }

    static int run(PrintWriter out, PrintWriter err) {
        Path machine = BundledExample.machine();
        return Main.commandLine().setOut(out).setErr(err).execute("check", machine.toString());
    }

    /** The bundled example, from the working tree when present, else unpacked from the jar. */
    static final class BundledExample {
        static final String[] FILES = {"pumpstation.machine", "decoder.machine"};

        static Path machine() {
            Path local = Path.of("examples", "pumpstation", "pumpstation.machine");
            if (Files.isRegularFile(local)) {
                return local;
            }
            try {
                Path dir = Files.createTempDirectory("thermion-example");
                for (String f : FILES) {
                    try (InputStream in = DefaultRun.class.getResourceAsStream("/examples/pumpstation/" + f)) {
                        if (in == null) {
                            throw new IllegalStateException("bundled example missing from the jar: " + f);
                        }
                        Files.copy(in, dir.resolve(f), StandardCopyOption.REPLACE_EXISTING);
                    }
                    dir.resolve(f).toFile().deleteOnExit();
                }
                dir.toFile().deleteOnExit();
                return dir.resolve(FILES[0]);
            } catch (IOException e) {
                throw new IllegalStateException("cannot unpack the bundled example: " + e.getMessage(), e);
            }
        }
    }
}
