package org.thermion.verify;

import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Machines for verify tests: the demo, and the four-instruction tiny machine with hand-made faults. */
final class VerifyMachines {
    static final Path TINY = Path.of("src/test/resources/org/thermion/verify/tiny.machine");
    static final Path DEMO = Path.of("examples/pumpstation/pumpstation.machine");

    private VerifyMachines() {
    }

    static Machine demo() {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Machine m = new Elaborator(sources, diags).elaborate(DEMO);
        check(sources, diags);
        return m;
    }

    static String tinyText() {
        try {
            return Files.readString(TINY);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The tiny machine with {@code from} replaced by {@code to} (which must occur exactly once). */
    static Machine tiny(String from, String to) {
        String text = tinyText();
        if (!from.isEmpty()) {
            int at = text.indexOf(from);
            if (at < 0 || text.indexOf(from, at + 1) >= 0) {
                throw new AssertionError("'" + from + "' must occur once in tiny.machine");
            }
            text = text.replace(from, to);
        }
        return elaborate(text);
    }

    static final Path SKIP = Path.of("src/test/resources/org/thermion/verify/skip.machine");

    /** The skip machine with {@code from} replaced by {@code to} (which must occur exactly once). */
    static Machine skip(String from, String to) {
        return edited(SKIP, from, to);
    }

    /** The machine in {@code file} with {@code from} replaced by {@code to} (which must occur exactly once). */
    static Machine edited(Path file, String from, String to) {
        String text;
        try {
            text = Files.readString(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        if (!from.isEmpty()) {
            int at = text.indexOf(from);
            if (at < 0 || text.indexOf(from, at + 1) >= 0) {
                throw new AssertionError("'" + from + "' must occur once in " + file);
            }
            text = text.replace(from, to);
        }
        return elaborate(text);
    }

    static final Path PANEL = Path.of("examples/bringup-panel/bringup-panel.machine");

    /** The bring-up panel example (word from switches) with {@code from} replaced by {@code to}. */
    static Machine panel(String from, String to) {
        return edited(PANEL, from, to);
    }

    static Machine tiny() {
        return tiny("", "");
    }

    static Machine elaborate(String text) {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Machine m = new Elaborator(sources, diags).elaborateText(Path.of("tiny.machine"), text);
        check(sources, diags);
        return m;
    }

    private static void check(SourceSet sources, Diagnostics diags) {
        if (diags.hasErrors()) {
            StringWriter sw = new StringWriter();
            new DiagnosticPrinter(sources).print(diags, new PrintWriter(sw, true));
            throw new AssertionError("machine does not elaborate:\n" + sw);
        }
    }
}
