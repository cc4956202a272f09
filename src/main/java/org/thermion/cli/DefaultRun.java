package org.thermion.cli;

import org.thermion.tui.DecodeLamp;
import org.thermion.tui.Session;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * What the command does with no arguments, on the bundled example (the pump station and
 * pump.asm): on a terminal it opens the UI; without one (piped, CI) it runs the program
 * headless through a day of switch changes (programs/pump-day.csv) and prints the output
 * changes and the power budget.
 */
final class DefaultRun {
    /** Cycles of the headless run: the stimulus's last change, then a few passes more. */
    static final String CYCLES = "450";

    private DefaultRun() {
    }

    static int run(PrintWriter out, PrintWriter err) {
        Path machine = BundledExample.machine();
        Path program = BundledExample.program("pump.asm");
        if (UiCommand.whyNoTerminal() == null) {
            Session s = UiCommand.open(machine, program, null, "zero", DecodeLamp.DEFAULT_NAME, err);
            if (s == null) {
                return ExitCodes.INTERNAL;
            }
            try {
                return UiCommand.show(s, program.getFileName().toString(), null);
            } catch (IOException e) {
                err.println("error: the terminal failed: " + e.getMessage());
                err.flush();
                return ExitCodes.INTERNAL;
            }
        }
        return headless(machine, program, BundledExample.program("pump-day.csv"), out, err);
    }

    static int headless(Path machine, Path program, Path stimulus, PrintWriter out, PrintWriter err) {
        out.println("No terminal here, so no screen: running the bundled example instead. On a terminal,");
        out.println("thermion without arguments opens the UI on it (or: thermion ui MACHINE PROGRAM).");
        out.println();
        out.println("Machine " + machine + ", program " + program + ", switches from " + stimulus.getFileName()
                + ", " + CYCLES + " cycles.");
        out.println();
        out.flush();
        int run = Main.commandLine().setOut(out).setErr(err).execute("run", machine.toString(), program.toString(),
                "--inputs", stimulus.toString(), "--cycles", CYCLES);
        out.println();
        out.flush();
        int budget = Main.commandLine().setOut(out).setErr(err).execute("budget", machine.toString(),
                "--program", program.toString(), "--inputs", stimulus.toString(), "--cycles", CYCLES);
        out.flush();
        return Math.max(run, budget);
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
                    unpack("/examples/pumpstation/" + f, dir.resolve(f));
                }
                dir.toFile().deleteOnExit();
                return dir.resolve(FILES[0]);
            } catch (IOException e) {
                throw new IllegalStateException("cannot unpack the bundled example: " + e.getMessage(), e);
            }
        }

        /** A file of programs/, from the working tree when present, else unpacked from the jar. */
        static Path program(String name) {
            Path local = Path.of("programs", name);
            if (Files.isRegularFile(local)) {
                return local;
            }
            try {
                Path dir = Files.createTempDirectory("thermion-program");
                dir.toFile().deleteOnExit();
                return unpack("/programs/" + name, dir.resolve(name));
            } catch (IOException e) {
                throw new IllegalStateException("cannot unpack the bundled program: " + e.getMessage(), e);
            }
        }

        private static Path unpack(String resource, Path to) throws IOException {
            try (InputStream in = DefaultRun.class.getResourceAsStream(resource)) {
                if (in == null) {
                    throw new IllegalStateException("bundled example missing from the jar: " + resource);
                }
                Files.copy(in, to, StandardCopyOption.REPLACE_EXISTING);
            }
            to.toFile().deleteOnExit();
            return to;
        }
    }
}
