package org.thermion.cli;

import org.thermion.model.Machine;
import org.thermion.power.Budget;
import org.thermion.power.CurrentMeter;
import org.thermion.power.StageDraw;
import org.thermion.power.startup.SteadyHeaters;
import org.thermion.sim.InitMode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;

/**
 * {@code budget MACHINE}: tube count, heater strings, plate and bias current and the supply
 * check; with {@code --program} also the currents a simulated run draws. Exit 1 when a
 * check fails (a rail over its limit, a heater outside its band, mixed heater currents).
 */
@Command(name = "budget", mixinStandardHelpOptions = true,
        description = {"Tube and power budget of a machine: tubes per module and type, heater strings, "
                + "plate and bias current per module and rail, and each rail's peak against its limit.",
                "With --program the machine runs the program and the report adds the now, "
                        + "minimum, mean and peak current over every phase, and the cycle and phase of the peak.",
                "Exit code 1 when a check fails: a rail over its limit, a heater over its rating band, "
                        + "a string mixing heater currents without shunts."})
final class BudgetCommand extends ReportCommand {
    @Parameters(paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Option(names = "--program", paramLabel = "PROGRAM.asm", description = "Run this program and meter the currents.")
    Path program;

    @Option(names = "--inputs", paramLabel = "STIM.csv",
            description = "Input bits during the run: CSV with a header `cycle,INPUT,...`, rows of a cycle and 0/1 values "
                    + "holding from that cycle on.")
    Path inputs;

    @Option(names = "--cycles", paramLabel = "N", defaultValue = "1000",
            description = "Machine cycles to run (default: ${DEFAULT-VALUE}).")
    long cycles;

    @Option(names = "--init", paramLabel = "MODE", defaultValue = "zero",
            description = "Latches at power-up: zero, random:SEED or unknown (default: ${DEFAULT-VALUE}).")
    String init;

    @Override
    public Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        if (cycles < 1) {
            return badInput("--cycles must be at least 1, not " + cycles);
        }
        InitMode mode;
        try {
            mode = InitMode.parse(init);
        } catch (IllegalArgumentException e) {
            return badInput("--init: " + e.getMessage());
        }
        MachineLoader loader = new MachineLoader();
        Machine m = loader.load(machineFile, err, false);
        if (m == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        if (program == null && inputs == null) {
            var parsed = spec.commandLine().getParseResult();
            if (parsed.hasMatchedOption("--cycles") || parsed.hasMatchedOption("--init")) {
                err.println("note: --cycles and --init apply to a run; without --program or --inputs the budget is static");
            }
        }
        StageDraw draw = StageDraw.of(m);
        BudgetReport.Run run = null;
        CurrentMeter meter = null;
        if (program != null || inputs != null) {
            if (program == null && m.rom() != null) {
                return badInput("--inputs needs --program: machine " + m.name() + " runs from a ROM");
            }
            ProgramInput in = ProgramInput.read(m, program, inputs, loader, err);
            if (in == null) {
                err.flush();
                return ExitCodes.BAD_INPUT;
            }
            meter = CurrentMeter.ofRun(draw, in.rom(), in.stimulus(), cycles, mode);
            run = new BudgetReport.Run(program == null ? null : program.toString(),
                    inputs == null ? null : inputs.toString(), cycles, init);
        }
        Budget budget = new Budget(draw, meter, SteadyHeaters.of(m));
        BudgetReport report = new BudgetReport(budget, run);
        format.write(out, report.report());
        out.flush();
        err.flush();
        return budget.failed() ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
    }
}
