package org.thermion.cli;

import java.io.PrintWriter;
import java.nio.file.Path;

import org.thermion.levels.LevelAnalysis;
import org.thermion.model.Machine;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code levels FILE}: every net's logic levels, noise margins, load and fan-out limit, worst first. */
@Command(name = "levels", mixinStandardHelpOptions = true,
        description = {"Logic levels and noise margins of every net, solved from the tube models at the machine's "
                + "rails under its heaviest static load (each rail's tolerance reaching up to its lightest load's voltage), under each net's real load (every grid divider, diode gate, lamp and coil it feeds, and what those diode gates feed in turn): "
                + "high and low level, the receivers' thresholds, both margins at nominal values and at the "
                + "tolerance corner that worsens each (named), and the most loads the driver could feed. Worst "
                + "net first. Lamp and coil drivers follow with their load currents.",
                "Tolerances come from the machine's `margins { ... }` block (defaults: rails and resistors 5 %%, "
                        + "worn tubes at 70 %% emission)."})
final class LevelsCommand extends ReportCommand {
    @Parameters(paramLabel = "FILE", description = "The .machine file.")
    Path file;

    @Override
    public Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        MachineLoader loader = new MachineLoader();
        Machine m = loader.load(file, err, false);
        if (m == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        LevelAnalysis a = LevelAnalysis.of(m, loader.sourceMap().margins());
        format.write(out, new LevelsReport(m, a).report());
        return ExitCodes.OK;
    }
}
