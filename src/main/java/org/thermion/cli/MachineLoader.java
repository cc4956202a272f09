package org.thermion.cli;

import org.thermion.elab.Elaborator;
import org.thermion.elab.SourceMap;
import org.thermion.elab.ModuleCheck;
import org.thermion.elab.ModulesAlone;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.circuit.TubeLibrary;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

/** Loads a machine for a command, printing diagnostics; a null machine means exit 2. */
public final class MachineLoader {
    private final SourceSet sources = new SourceSet();
    private final Diagnostics diags = new Diagnostics();
    private List<ModuleCheck> modulesAlone = List.of();
    private ModulesAlone modulesAloneChecked;
    private SourceMap sourceMap = SourceMap.NONE;
    private boolean pointers;

    /** Errors printed from now on also name the section of the language reference that explains them. */
    public MachineLoader withLanguagePointers() {
        pointers = true;
        return this;
    }

    /** Elaborates {@code file}; prints errors and warnings to {@code err} unless quiet about warnings. */
    public Machine load(Path file, PrintWriter err, boolean showWarnings) {
        Machine m = loadOrModules(file, err, showWarnings);
        if (m == null && !diags.hasErrors()) {
            err.println(file + ": error: no machine block: the file holds modules only (`check` checks them);"
                    + " this command needs `machine NAME { top MODULE ... }`");
        }
        return m;
    }

    /** As {@link #load}, keeping modules marked {@code notbuilt} in the logic (flagged): the whole description. */
    public Machine loadAsDescribed(Path file, PrintWriter err) {
        Machine m = new Elaborator(sources, diags).asDescribed().withTubeModelCheck(TubeLibrary::problem).elaborate(file);
        if (diags.hasErrors()) {
            new DiagnosticPrinter(sources).print(diags, err);
        }
        return diags.hasErrors() ? null : m;
    }

    /**
     * As {@link #load}, but a file of modules without a machine block (meant for {@code include})
     * is no error: the machine is null and {@link #modulesAlone()} lists its modules, checked alone.
     */
    public Machine loadOrModules(Path file, PrintWriter err, boolean showWarnings) {
        Elaborator elaborator = new Elaborator(sources, diags).withTubeModelCheck(TubeLibrary::problem);
        Machine m = elaborator.elaborate(file);
        modulesAlone = elaborator.modulesAlone();
        modulesAloneChecked = elaborator.modulesAloneChecked();
        sourceMap = elaborator.sourceMap();
        if (diags.hasErrors() || showWarnings) {
            new DiagnosticPrinter(sources, pointers).print(diags, err);
        }
        return diags.hasErrors() ? null : m;
    }

    /** The modules checked on their own when the last file loaded had no machine block. */
    public List<ModuleCheck> modulesAlone() {
        return modulesAlone;
    }

    /** The last file's modules checked alone, with the library stages and rails assumed for them (null if it had a machine). */
    public ModulesAlone modulesAloneChecked() {
        return modulesAloneChecked;
    }

    /** Where the last machine loaded was written, and its margin rules. */
    public SourceMap sourceMap() {
        return sourceMap;
    }

    public Diagnostics diagnostics() {
        return diags;
    }

    public SourceSet sources() {
        return sources;
    }
}
