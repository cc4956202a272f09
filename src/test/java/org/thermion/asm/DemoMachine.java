package org.thermion.asm;

import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/** Loads the demo machine once per test class; fails loudly if it does not elaborate. */
public final class DemoMachine {
    public static final Path FILE = Path.of("examples", "pumpstation", "pumpstation.machine");

    private DemoMachine() {
    }

    public static Machine load() {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(src, d).elaborate(FILE);
        if (d.hasErrors() || m == null) {
            StringWriter w = new StringWriter();
            new DiagnosticPrinter(src).print(d, new PrintWriter(w));
            throw new AssertionError("demo machine does not elaborate:\n" + w);
        }
        return m;
    }
}
