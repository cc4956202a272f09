package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Format;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.ReportUnit;
import org.thermion.asm.Assembly;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.run.ProgramRuns;
import org.thermion.sim.run.Watch;
import org.thermion.sim.run.Watches;
import org.thermion.sim.RunResult;
import org.thermion.sim.Stimulus;
import org.thermion.sim.VcdWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * {@code run MACHINE [PROGRAM]}: assemble a program and run it on the machine's logic or its ISA.
 * A machine without ROM and PC (a plain logic board) runs from its stimulus alone.
 */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = {"Run a program on a machine, cycle by cycle (a machine without a ROM runs from its stimulus "
                + "alone, without PROGRAM).",
                "Prints every output change with its cycle and phase, the watched nets per cycle, and the final "
                        + "state. The run ends at the cycle limit or at a fixed point (a cycle that changes nothing "
                        + "while no stimulus row is still to come). Exit 1 when an unknown value reaches an output or "
                        + "the jump (with --init unknown)."})
final class RunCommand extends ReportCommand {
    enum Level { logic, isa }

    @Parameters(index = "0", paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Parameters(index = "1", paramLabel = "PROGRAM", arity = "0..1",
            description = "The .asm program (not for a machine without a ROM).")
    Path program;

    @Option(names = "--inputs", paramLabel = "STIM.csv",
            description = "Stimulus (CSV): header 'cycle' then input names; each row holds from its cycle on.")
    Path inputs;

    @Option(names = "--cycles", paramLabel = "N", defaultValue = "10000",
            description = "Stop after N cycles at most (default ${DEFAULT-VALUE}).")
    long cycles;

    @Option(names = "--level", paramLabel = "LEVEL", defaultValue = "logic",
            description = "logic (gates and latches) or isa (the instruction meanings); default ${DEFAULT-VALUE}.")
    Level level;

    @Option(names = "--init", paramLabel = "MODE", defaultValue = "zero",
            description = "Power-up state of the latches: zero, random:SEED or unknown; default ${DEFAULT-VALUE}.")
    String init;

    @Option(names = "--watch", paramLabel = "NET", split = ",",
            description = "Nets to table per cycle, by name (acc, line[3], lu.inv; a bus by its name, shown in hex; pc).")
    List<String> watch = new ArrayList<>();

    @Option(names = "--vcd", paramLabel = "FILE", description = "Write a value change dump (IEEE 1364) here.")
    Path vcd;

    @Option(names = "--svg", paramLabel = "FILE", description = "Draw the watched nets against the cycle as a picture (SVG).")
    Path svg;

    @Option(names = OutputFiles.REPLACE, description = "Let --vcd or --svg replace an existing file that is not an "
            + "earlier output of the same kind.")
    boolean replace;

    @Option(names = "--vcd-all", description = "Dump every named net, not only inputs, outputs, state and watched nets.")
    boolean vcdAll;

    @Option(names = "--engine", paramLabel = "ENGINE", defaultValue = "auto", hidden = true, // for developers (DEVELOPERS.md)
            description = "compiled (the logic as generated straight-line bytecode), array (flat gate arrays) or auto "
                    + "(compiled for small machines, and for long runs on all but the largest, array otherwise); default ${DEFAULT-VALUE}. "
                    + "All give the same results; unknown-mode runs use the array engine.")
    String engine;

    /** The simulator on the chosen engine; the compiled one is not built for three-valued runs, which never use it. */
    private org.thermion.sim.Simulator simulator(Machine m, InitMode mode) {
        org.thermion.sim.compiled.Engine e = org.thermion.sim.compiled.Engine.parse(engine);
        if (mode instanceof InitMode.Unknown) {
            return new org.thermion.sim.Simulator(m);
        }
        return e.simulator(m, cycles);
    }

    @Override
    public Integer call() throws IOException {
        try {
            org.thermion.sim.compiled.Engine.parse(engine);
        } catch (IllegalArgumentException e) {
            return badInput("--engine: " + e.getMessage());
        }
        PrintWriter out = out();
        PrintWriter err = err();
        if (vcd != null && level == Level.isa) {
            return badInput("--vcd needs --level logic: the ISA level has no nets to dump");
        }
        if (vcdAll && vcd == null) {
            return badInput("--vcd-all needs --vcd FILE");
        }
        if (cycles < 1) {
            return badInput("--cycles must be at least 1, found " + cycles);
        }
        InitMode mode;
        try {
            mode = InitMode.parse(init);
        } catch (IllegalArgumentException e) {
            return badInput("--init: " + e.getMessage());
        }
        if (level == Level.isa && mode instanceof InitMode.Unknown) {
            return badInput("--init unknown needs --level logic: the ISA level has no unknown values");
        }
        MachineLoader loader = new MachineLoader();
        Machine m = loader.load(machineFile, err, false);
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        boolean programmable = m.isa() != null && m.rom() != null && m.pc() != null;
        if (program != null && !programmable) {
            return badInput(machineFile + ": machine " + m.name() + " needs an isa block, a rom and a pc to run programs",
                    "leave out PROGRAM to run its logic from the stimulus alone");
        }
        if (program == null && m.rom() != null) {
            return badInput("machine " + m.name() + " has a ROM: name the PROGRAM to run");
        }
        boolean switchFed = m.isa() != null && m.isa().wordFromSwitches();
        if (program == null && level == Level.isa && !switchFed) {
            return badInput("--level isa needs a machine with an isa block and a PROGRAM,"
                    + " or an isa whose word comes from switches");
        }
        ProgramInput in = ProgramInput.read(m, program, inputs, loader, err);
        if (in == null) {
            return ExitCodes.BAD_INPUT;
        }
        List<Path> named = new ArrayList<>(List.of(machineFile));
        if (program != null) {
            named.add(program);
        }
        if (inputs != null) {
            named.add(inputs);
        }
        if (svg != null && watch.isEmpty()) {
            return badInput("--svg draws the watched nets: name them with --watch", "e.g. --watch acc,pc");
        }
        if (vcd != null) {
            OutputFiles.Refusal no = OutputFiles.check(vcd, OutputFiles.Kind.VCD, replace, named, loader.sources());
            if (no != null) {
                return no.print(err);
            }
        }
        Assembly asm = program == null ? new Assembly(new long[0], List.of()) : in.assembly();
        Stimulus stim = in.stimulus();
        if (stim != null && stim.lastCycle() >= cycles) {
            long first = stim.rows().stream().filter(r -> r.cycle() >= cycles).findFirst().orElseThrow().cycle();
            err.println("warning: " + inputs + ": the rows from cycle " + first + " on come after the run's "
                    + Nouns.count(cycles, "cycle") + " and never apply");
            err.println("  = raise --cycles to reach them");
            err.flush();
        }
        RunResult result;
        String vcdNote = null;
        List<Watch> watches;
        try {
            watches = watch.isEmpty() ? List.of() : level == Level.isa ? Watches.isa(m, watch) : Watches.logic(m, watch);
        } catch (IllegalArgumentException e) {
            return badInput("--watch: " + e.getMessage(),
                    level == Level.isa ? null : "names are as 'check' lists them, e.g. acc, line[3], a bus by its name, pc");
        }
        long started = System.nanoTime();
        if (level == Level.isa) {
            result = ProgramRuns.isa(m, asm.words(), mode, stim, watches, cycles);
        } else if (vcd == null) {
            result = ProgramRuns.logic(simulator(m, mode), asm.words(), mode, stim, watches, cycles, null, "", "");
        } else {
            List<Integer> watchedNets = new ArrayList<>();
            watches.forEach(w -> Arrays.stream(w.nets()).forEach(watchedNets::add));
            List<Integer> dumped = vcdAll ? VcdWriter.allNamedNets(m) : defaultDump(m, watchedNets);
            try (OutputFiles.Pending file = new OutputFiles.Pending(vcd)) {
                VcdWriter writer = new VcdWriter(m, dumped, 0, file.writer());
                result = ProgramRuns.logic(simulator(m, mode), asm.words(), mode, stim, watches, cycles, writer,
                        ZonedDateTime.now().format(DateTimeFormatter.RFC_1123_DATE_TIME), spec.root().version()[0]);
                file.commit();
            } catch (IOException | java.io.UncheckedIOException e) {
                return badInput("cannot write the VCD to " + vcd + ": " + e.getMessage());
            }
            vcdNote = "value change dump written to " + vcd + " (" + dumped.stream().distinct().count()
                    + (m.pc() != null ? " nets and the pc)" : " nets)");
        }
        if (svg != null) {
            int code = PlotFile.write(svg, RunFigures.watched(m.name(), result), replace, named, loader.sources(), err);
            if (code != 0) {
                return code;
            }
        }
        RunReport report = new RunReport(m, program, level.name(), mode.toString(), result);
        format.write(out, report.report());
        double wall = (System.nanoTime() - started) / 1e9;
        if (wall >= 1.0) {
            // long runs only: a speed figure changes from run to run, so short (tested) runs stay quiet
            err.printf(Locale.ROOT, "simulated %s of machine time in %.1f s of wall time: %s x real time%n",
                    Numbers.si(report.machineSeconds(), ReportUnit.SECONDS), wall,
                    Numbers.plain(report.machineSeconds() / wall));
        }
        if (vcdNote != null && format == Format.text) {
            out.println();
            out.println(vcdNote);
        }
        out.flush();
        return result.unknowns().isEmpty() ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    /** Inputs, outputs, ISA state, the jump, the ROM word, then the watched nets. */
    private static List<Integer> defaultDump(Machine m, List<Integer> watched) {
        Set<Integer> s = new LinkedHashSet<>();
        m.inputs().forEach(p -> s.add(p.net()));
        m.outputs().forEach(p -> s.add(p.net()));
        if (m.isa() != null) {
            m.isa().state().forEach(b -> s.add(b.net()));
        } else {
            m.netlist().latches().forEach(l -> s.add(l.output()));
        }
        if (m.pc() != null) {
            s.add(m.pc().jumpNet());
        }
        if (m.rom() != null) {
            for (int n : m.rom().dataNets()) {
                s.add(n);
            }
        }
        s.addAll(watched);
        return new ArrayList<>(s);
    }
}
