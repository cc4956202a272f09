package org.thermion.cli;

import org.thermion.cli.report.Format;
import org.thermion.model.Machine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;

/** What every {@code sheets} selection takes: the machine file and the output format. */
final class SheetsOptions {
    @Parameters(index = "0", paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text, csv or json (default: ${DEFAULT-VALUE}).")
    Format format = Format.text;

    /** The loader of the last {@link #load}: its sources serve diagnostics of files read beside the machine. */
    MachineLoader loader;

    /**
     * The designators recorded beside the machine ({@code NAME.designators}; none when there is no
     * such file), or null after printing what is wrong with the file (exit 2). After {@link #load}.
     */
    org.thermion.build.Designations designations(PrintWriter err) {
        Path file = org.thermion.build.Designations.beside(machineFile);
        if (!java.nio.file.Files.isRegularFile(file)) {
            return org.thermion.build.Designations.NONE;
        }
        String text;
        try {
            text = java.nio.file.Files.readString(file, java.nio.charset.StandardCharsets.UTF_8);
        } catch (java.io.IOException | java.io.UncheckedIOException e) {
            err.println("error: cannot read " + file + ": " + e.getMessage());
            return null;
        }
        org.thermion.lang.Diagnostics diags = new org.thermion.lang.Diagnostics();
        org.thermion.build.Designations d = org.thermion.build.Designations.read(file, text, loader.sources(), diags);
        if (!diags.all().isEmpty()) {
            new org.thermion.lang.DiagnosticPrinter(loader.sources()).print(diags, err);
        }
        return diags.hasErrors() ? null : d;
    }

    /** The elaborated machine, or null after printing its errors (exit 2). */
    Machine load(PrintWriter err) {
        loader = new MachineLoader();
        Machine m = loader.load(machineFile, err, false);
        err.flush();
        return m;
    }
}
