package org.thermion.cli;

import org.thermion.cli.report.Format;
import picocli.CommandLine.Option;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.levels.ElectricalCheck;
import org.thermion.levels.Finding;
import org.thermion.levels.LevelAnalysis;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code check FILE}: parse, elaborate and lint; print a summary. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Parse, elaborate and lint a machine description; print its summary.")
final class CheckCommand implements Callable<Integer> {
    @Parameters(paramLabel = "FILE", description = "The .machine file.")
    Path file;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text, csv or json (default: ${DEFAULT-VALUE}).")
    Format format;

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        MachineLoader loader = new MachineLoader();
        Machine m = loader.loadOrModules(file, err, true);
        if (m == null && !loader.diagnostics().hasErrors() && !loader.modulesAlone().isEmpty()) {
            format.write(out, new ModuleCheckSummary(file, loader.modulesAlone()).report());
            return ExitCodes.OK;
        }
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        format.write(out, new MachineSummary(m).report());
        List<Finding> findings = ElectricalCheck.findings(m, LevelAnalysis.of(m, loader.sourceMap().margins()));
        Diagnostics electrical = ElectricalDiagnostics.of(findings, loader.sourceMap());
        new DiagnosticPrinter(loader.sources()).print(electrical, err);
        err.flush();
        return electrical.hasErrors() ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
    }
}
