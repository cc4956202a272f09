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

    /** The elaborated machine, or null after printing its errors (exit 2). */
    Machine load(PrintWriter err) {
        loader = new MachineLoader();
        Machine m = loader.load(machineFile, err, false);
        err.flush();
        return m;
    }
}
