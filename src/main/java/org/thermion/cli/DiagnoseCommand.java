package org.thermion.cli;

import org.thermion.faults.Diagnosis;
import org.thermion.faults.Effort;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.Plan;
import org.thermion.faults.Separation;
import org.thermion.faults.Step;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

/** {@code diagnose MACHINE SEEN.csv}: which faults explain the lamps the builder saw while following the plan. */
@Command(name = "diagnose", mixinStandardHelpOptions = true,
        description = {"Reads the lamps you saw while following the bring-up plan and names the faults that explain "
                + "them, best first: the module, stage, net and tube of each. Faults the plan cannot tell apart form "
                + "one group and share a rank; groups that contradict no lamp come first, then the nearest, so two "
                + "faults at once or a fault the plan does not model still point somewhere. Then proposes one more "
                + "step that best tells the leading groups apart.",
                "SEEN.csv: a header 'step,LAMP,...' with lamps of the plan, then one row per step you looked at: "
                        + "1 lit, 0 dark, empty when you did not look. Give the same --program and --distinguish as "
                        + "to 'plan', so the steps are the ones you followed."})
final class DiagnoseCommand extends ReportCommand {
    @Parameters(index = "0", paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Parameters(index = "1", paramLabel = "SEEN.csv", description = "The lamps seen at each step.")
    Path seenFile;

    @Mixin
    PlanOptions options;

    @Option(names = "--top", paramLabel = "N", defaultValue = "8",
            description = "Show the N best groups of faults (default: ${DEFAULT-VALUE}).")
    int top;

    @Override
    public Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        if (!options.valid(err) || top < 1) {
            if (top < 1) {
                err.println("error: --top must be at least 1, not " + top);
            }
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        PlanInputs in = PlanInputs.read(machineFile, options.program, err);
        if (in == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        List<long[]> nextRoms = in.nextPrograms(options.nextPrograms, err);
        if (nextRoms == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        try (FaultSimulator first = in.simulator(options.threads, nextRoms)) {
            Plan plan = in.plan(first);
            Separation sep = in.separation(first, plan, options.distinguish);
            List<Step> steps = sep.steps();
            try (FaultSimulator sim = first.withPrograms(sep.written())) {
                return diagnose(in, sim, steps);
            }
        }
    }

    // Reads the observations of the plan's steps and ranks the classes against them; exit 0, 1 or 2.
    private int diagnose(PlanInputs in, FaultSimulator sim, List<Step> steps) {
        PrintWriter out = out();
        PrintWriter err = err();
        Diagnostics diags = new Diagnostics();
        String hint = options.distinguish ? null
                : "if you followed the plan made with --distinguish, give --distinguish here too";
        byte[][] seen = new DiagnoseObservations(in.circuit().lamps(), steps.size(), hint, diags)
                .read(seenFile, in.loader().sources());
        if (!diags.all().isEmpty()) {
            new DiagnosticPrinter(in.loader().sources()).print(diags, err);
        }
        if (seen == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        Diagnosis d = new Diagnosis(sim, in.faults(), steps);
        List<Diagnosis.Suspect> ranked = d.rank(seen, Diagnosis.stepsReached(seen));
        Diagnosis.Proposal proposal = d.propose(ranked, top, Effort.DEFAULT);
        Step next = proposal.step();
        List<Diagnosis.Reading> readings = next == null ? List.of() : d.readings(proposal.candidates(), next);
        DiagnoseReport report = new DiagnoseReport(in, seenFile, steps, seen, ranked, top, next, readings);
        format.write(out, report.report());
        out.flush();
        return report.looksGood() ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }
}
