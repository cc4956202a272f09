package org.thermion.cli;

import org.thermion.cli.report.Format;
import org.thermion.faults.FaultCircuit;
import org.thermion.faults.Diagnosis;
import org.thermion.faults.Effort;
import org.thermion.faults.FaultList;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.Plan;
import org.thermion.faults.PlanGenerator;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code plan MACHINE}: the fault list and a bring-up test plan for the switch panel and lamps. */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = {"Bring-up test plan: the machine's faults (wires stuck at 0 or 1, dead tubes, open heaters "
                + "in series strings, relays that never pull in, burnt-out lamps), then numbered steps -- set these "
                + "switches, clock this many cycles, expect these lamps -- that show them, and what became of every "
                + "fault: detected at a step, proven undetectable (and why), or aborted when the effort ran out.",
                "Lamps are the machine's outputs, its ISA state bits and its lamp and relay stages; latches power "
                        + "up unknown. A machine with a ROM runs the --program given."})
final class PlanCommand implements Callable<Integer> {
    @Parameters(paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Option(names = "--program", paramLabel = "PROGRAM.asm", description = "The program in the ROM (machines with a ROM).")
    Path program;

    @Option(names = "--distinguish",
            description = "Add steps until no group of faults the plan cannot tell apart holds more than three.")
    boolean distinguish;

    @Option(names = "--threads", paramLabel = "N", defaultValue = "2",
            description = "Threads for fault simulation (default: ${DEFAULT-VALUE}).")
    int threads;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text, csv or json (default: ${DEFAULT-VALUE}).")
    Format format;

    @Mixin
    CommonOptions common;

    @Mixin
    ProgressOptions progressOptions = new ProgressOptions();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (threads < 1) {
            err.println("error: --threads must be at least 1, not " + threads);
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        MachineLoader loader = new MachineLoader();
        Machine m = loader.load(machineFile, err, false);
        if (m == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        if (m.rom() != null && program == null) {
            err.println("error: machine " + m.name() + " runs from a ROM: give the program it runs with --program");
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        long[] rom = null;
        if (program != null) {
            ProgramInput in = ProgramInput.read(m, program, null, loader, err);
            if (in == null) {
                err.flush();
                return ExitCodes.BAD_INPUT;
            }
            rom = in.rom();
        }
        FaultCircuit c = FaultCircuit.of(m);
        if (c.lamps().isEmpty()) {
            err.println("error: machine " + m.name() + " has nothing to watch: declare outputs in its machine block "
                    + "(outputs NAME ...) or give it lamp or relay stages");
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        FaultList faults = FaultList.of(c);
        try (FaultSimulator sim = new FaultSimulator(c, rom, threads);
             ProgressBar bar = ProgressBar.ticking(err, "plan", progressOptions.mode())) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            List<org.thermion.faults.Step> steps = plan.steps();
            int largest = -1;
            if (distinguish) {
                steps = Diagnosis.extend(sim, faults, plan.steps(), 3, Effort.DEFAULT);
                largest = new Diagnosis(sim, faults, steps).largestClass();
            }
            byte[][] expected = sim.expected(steps);
            bar.close();
            format.write(out, new PlanReport(m, c, faults, plan, steps, expected, program, largest).report());
        }
        out.flush();
        return ExitCodes.OK;
    }
}
