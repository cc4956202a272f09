package org.thermion.cli;

import org.thermion.faults.Diagnosis;
import org.thermion.faults.Separation;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.Plan;
import org.thermion.faults.Step;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

/** {@code plan MACHINE}: the fault list and a bring-up test plan for the switch panel and lamps. */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = {"Bring-up test plan: the machine's faults (wires stuck at 0 or 1, dead tubes, open heaters "
                + "in series strings, relays that never pull in, burnt-out lamps), then numbered steps -- set these "
                + "switches, clock this many cycles, expect these lamps -- that show them, and what became of every "
                + "fault: detected at a step, proven undetectable (and why), or aborted when the effort ran out.",
                "Lamps are the machine's outputs, its ISA state bits and its lamp and relay stages; latches power "
                        + "up unknown. A machine with a ROM runs the --program given."})
final class PlanCommand extends ReportCommand {
    @Parameters(paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Mixin
    PlanOptions options;

    @Mixin
    ProgressOptions progressOptions = new ProgressOptions();

    @Override
    public Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        if (!options.valid(err)) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        PlanInputs in = PlanInputs.read(machineFile, options.program, err);
        if (in == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        List<long[]> next = in.nextPrograms(options.nextPrograms, err);
        if (next == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        try (FaultSimulator first = in.simulator(options.threads, next);
             ProgressBar bar = ProgressBar.ticking(err, "plan", progressOptions.mode())) {
            Plan plan = in.plan(first);
            Separation sep = in.separation(first, plan, options.distinguish);
            List<Step> steps = sep.steps();
            try (FaultSimulator sim = first.withPrograms(sep.written())) {
                Diagnosis d = options.distinguish ? new Diagnosis(sim, in.faults(), steps) : null;
                int largest = d == null ? -1 : d.largestClass();
                int above = d == null ? 0 : d.classesAbove(PlanInputs.MOST_IN_GROUP);
                byte[][] expected = sim.expected(steps);
                bar.close();
                format.write(out, new PlanReport(in.machine(), in.circuit(), in.faults(), plan, steps, expected,
                        options.program, options.nextPrograms, largest, above, sep).report());
            }
        }
        out.flush();
        return ExitCodes.OK;
    }
}
