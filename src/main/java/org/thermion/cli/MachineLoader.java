package org.thermion.cli;

import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.nio.file.Path;

/** Loads a machine for a command, printing diagnostics; a null machine means exit 2. */
public final class MachineLoader {
    private final SourceSet sources = new SourceSet();
    private final Diagnostics diags = new Diagnostics();

    /** Elaborates {@code file}; prints errors and warnings to {@code err} unless quiet about warnings. */
    public Machine load(Path file, PrintWriter err, boolean showWarnings) {
        Machine m = new Elaborator(sources, diags).elaborate(file);
        if (diags.hasErrors() || showWarnings) {
            new DiagnosticPrinter(sources).print(diags, err);
        }
        return diags.hasErrors() ? null : m;
    }

    public Diagnostics diagnostics() {
        return diags;
    }

    public SourceSet sources() {
        return sources;
    }
}
