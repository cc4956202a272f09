package org.thermion.cli;

import org.thermion.asm.Assembler;
import org.thermion.asm.Assembly;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.model.Machine;
import org.thermion.sim.Stimulus;
import org.thermion.sim.StimulusReader;

import java.io.PrintWriter;
import java.nio.file.Path;

/**
 * The program and the stimulus a command runs a loaded machine with, read the one way every
 * command reads them: the program assembled first, the stimulus read only when the program
 * assembled, then every diagnostic (errors and warnings, source order per file) printed.
 *
 * @param assembly the assembled program, null when the command named none
 * @param stimulus the stimulus, null when the command named none
 */
record ProgramInput(Assembly assembly, Stimulus stimulus) {

    /**
     * Reads {@code program} and {@code inputs} (each may be null) for {@code m}, keeping their
     * text in the loader's sources for diagnostics. Null, after printing the errors to
     * {@code err}, when either has errors.
     */
    static ProgramInput read(Machine m, Path program, Path inputs, MachineLoader loader, PrintWriter err) {
        Diagnostics diags = new Diagnostics();
        Assembly asm = program == null ? null : Assembler.assemble(m, program, loader.sources(), diags);
        boolean assembled = program == null || asm != null;
        Stimulus stim = null;
        if (assembled && inputs != null) {
            stim = new StimulusReader(m, loader.sources(), diags).read(inputs);
        }
        if (!diags.all().isEmpty()) {
            new DiagnosticPrinter(loader.sources()).print(diags, err);
        }
        if (!assembled || diags.hasErrors()) {
            return null;
        }
        return new ProgramInput(asm, stim);
    }

    /** The ROM words, or null without a program. */
    long[] rom() {
        return assembly == null ? null : assembly.words();
    }
}
