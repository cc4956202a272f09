package org.thermion.cli;

import picocli.CommandLine.Option;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.levels.ElectricalCheck;
import org.thermion.levels.Finding;
import org.thermion.levels.LevelAnalysis;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

/** {@code check FILE}: parse, elaborate and lint; print a summary. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Parse, elaborate and lint a machine description; print its summary.")
final class CheckCommand extends ReportCommand {
    @Parameters(paramLabel = "FILE", description = "The .machine file.")
    Path file;

    @Option(names = "--watch", description = "Check again whenever the file or one it includes is saved (Ctrl-C stops).")
    boolean watch;

    @Override
    public Integer call() {
        if (!watch) {
            return checkOnce(new MachineLoader());
        }
        int[] last = new int[1];
        new CheckWatch(out()).run(() -> {
            MachineLoader loader = new MachineLoader();
            last[0] = checkOnce(loader);
            err().flush();
            return loader.sources().files();
        }, 0);
        return last[0];
    }

    private int checkOnce(MachineLoader fresh) {
        PrintWriter out = out();
        PrintWriter err = err();
        MachineLoader loader = fresh.withLanguagePointers();
        Machine m = loader.loadOrModules(file, err, true);
        if (m == null && !loader.diagnostics().hasErrors() && !loader.modulesAlone().isEmpty()) {
            format.write(out, new ModuleCheckSummary(file, loader.modulesAloneChecked()).report());
            return ExitCodes.OK;
        }
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        format.write(out, new MachineSummary(m).report());
        out.flush();
        List<Finding> findings = ElectricalCheck.findings(m, LevelAnalysis.of(m, loader.sourceMap().margins()));
        Diagnostics electrical = ElectricalDiagnostics.of(findings, loader.sourceMap());
        new DiagnosticPrinter(loader.sources()).print(electrical, err);
        err.flush();
        return electrical.hasErrors() ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
    }
}
