package org.thermion.build;

import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/** Machines for the build tests: the examples, and text elaborated against the parts library. */
final class BuildMachines {
    static final Path DECODER = Path.of("examples/decoder-board/decoder-board.machine");
    static final Path PUMPSTATION = Path.of("examples/pumpstation/pumpstation.machine");
    static final Path BRINGUP = Path.of("examples/bringup-panel/bringup-panel.machine");
    /** Every bundled example machine. */
    static final Path[] EXAMPLES = {DECODER, PUMPSTATION, BRINGUP};

    private BuildMachines() {
    }

    static Machine file(Path p) {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        return checked(new Elaborator(src, d).elaborate(p), src, d);
    }

    static Machine text(String text) {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        return checked(new Elaborator(src, d).elaborateText(Path.of("generated.machine"), text), src, d);
    }

    private static Machine checked(Machine m, SourceSet src, Diagnostics d) {
        if (m == null || d.hasErrors()) {
            StringWriter w = new StringWriter();
            new DiagnosticPrinter(src).print(d, new PrintWriter(w));
            throw new AssertionError("machine did not elaborate:\n" + w);
        }
        return m;
    }
}
