package org.thermion.power;

import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/** Elaborates small machine descriptions written inside tests. */
final class PowerMachines {
    /**
     * Stages known only by typed-in currents ({@code circuit none}): counted_inverter, counted_flipflop,
     * counted_follower, counted_and, counted_or, counted_lamp. Tests of the budget's arithmetic use them,
     * so a hand count stays a hand count; the library's stages are solved from their circuits.
     */
    static final String COUNTED_STAGES = read(Path.of("src/test/resources/org/thermion/power/counted-stages.machine"));

    private PowerMachines() {
    }

    private static String read(Path p) {
        try {
            return java.nio.file.Files.readString(p);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static Machine of(String text) {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Machine m = new Elaborator(sources, diags).elaborateText(Path.of("test.machine"), text);
        if (m == null || diags.hasErrors()) {
            StringWriter w = new StringWriter();
            new DiagnosticPrinter(sources).print(diags, new PrintWriter(w, true));
            throw new AssertionError("test machine does not elaborate:\n" + w);
        }
        return m;
    }

    static Machine file(Path path) {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Machine m = new Elaborator(sources, diags).elaborate(path);
        if (m == null || diags.hasErrors()) {
            throw new AssertionError("machine does not elaborate: " + path);
        }
        return m;
    }

    static int net(Machine m, String name) {
        String[] names = m.netlist().netNames();
        for (int i = 0; i < names.length; i++) {
            if (names[i].equals(name)) {
                return i;
            }
        }
        throw new AssertionError("no net " + name + " in " + String.join(", ", names));
    }
}
