package org.thermion.cli;

import org.thermion.faults.Effort;
import org.thermion.faults.FaultCircuit;
import org.thermion.faults.FaultList;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.Plan;
import org.thermion.faults.PlanGenerator;
import org.thermion.faults.Separation;
import org.thermion.faults.SocketPins;
import org.thermion.faults.Step;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

/**
 * What {@code plan} and {@code diagnose} start from, read the same way for both: the machine,
 * its program's ROM words (machines with a ROM), the flat circuit with its lamps and the fault
 * list. Both commands make the plan the same way, so a builder's observations of one are read
 * against the steps the other printed.
 *
 * @param rom the program's words, null for a machine without a ROM
 */
record PlanInputs(Machine machine, Path program, long[] rom, FaultCircuit circuit, FaultList faults, MachineLoader loader) {
    /** The most faults one group may keep when the plan is extended to tell them apart. */
    static final int MOST_IN_GROUP = 3;

    /** Reads the machine and program; null, after printing what is wrong to {@code err}, for exit 2. */
    static PlanInputs read(Path machineFile, Path program, PrintWriter err) {
        MachineLoader loader = new MachineLoader();
        Machine m = loader.load(machineFile, err, false);
        if (m == null) {
            return null;
        }
        if (m.rom() != null && program == null) {
            err.println("error: machine " + m.name() + " runs from a ROM: give the program it runs with --program");
            return null;
        }
        long[] rom = null;
        if (program != null) {
            ProgramInput in = ProgramInput.read(m, program, null, loader, err);
            if (in == null) {
                return null;
            }
            rom = in.rom();
        }
        FaultCircuit c = FaultCircuit.of(m);
        if (c.lamps().isEmpty()) {
            err.println(machineFile + ": " + nothingToWatch(m));
            return null;
        }
        return new PlanInputs(m, program, rom, c, FaultList.of(c, SocketPins.of(m)), loader);
    }

    /** What a builder is told about a machine that shows nothing: what to declare so it does. */
    static String nothingToWatch(Machine m) {
        return "error: machine " + m.name() + " has no lamps: nothing it does can be seen, so no step can show a fault\n"
                + "  = declare its outputs in the machine block (outputs NAME ...), bind state bits in its isa\n"
                + "    (state NAME = LATCH), or drive a lamp with a lamp or relay stage (LAMP = lamp_driver(NET))";
    }

    /** The simulator for this machine and program on {@code threads} threads (close it). */
    FaultSimulator simulator(int threads) {
        return new FaultSimulator(circuit, rom, threads);
    }

    /** The simulator running this program first, then {@code next}'s words when a plan fits them (close it). */
    FaultSimulator simulator(int threads, List<long[]> next) {
        List<long[]> all = new java.util.ArrayList<>();
        all.add(rom);
        all.addAll(next);
        return FaultSimulator.running(circuit, all, threads);
    }

    /**
     * The words of each further program a distinguishing plan may fit, read as the first program
     * is; null, after printing every problem on {@code err}, for exit 2.
     */
    List<long[]> nextPrograms(List<Path> programs, PrintWriter err) {
        if (programs.isEmpty()) {
            return List.of();
        }
        if (machine.rom() == null) {
            err.println("error: machine " + machine.name() + " has no ROM to fit another program in: "
                    + "leave out --next-program (its switches are all a plan sets)");
            return null;
        }
        List<long[]> out = new java.util.ArrayList<>();
        boolean ok = true;
        for (Path p : programs) {
            ProgramInput in = ProgramInput.read(machine, p, null, loader, err);
            ok &= in != null;
            if (in != null) {
                out.add(in.rom());
            }
        }
        return ok ? out : null;
    }

    /** The plan as {@code plan} prints it. */
    Plan plan(FaultSimulator sim) {
        return new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
    }

    /** The plan extended with distinguishing steps when asked, with the groups that stay too large and why. */
    Separation separation(FaultSimulator sim, Plan plan, boolean distinguish) {
        return distinguish ? Separation.of(sim, faults, plan.steps(), MOST_IN_GROUP, Effort.DEFAULT)
                : Separation.none(plan.steps());
    }
}
