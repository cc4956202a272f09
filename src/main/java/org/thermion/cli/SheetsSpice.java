package org.thermion.cli;

import org.thermion.circuit.Load;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.StageCircuit;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.StageType;
import org.thermion.spice.MachineDeck;
import org.thermion.spice.SpiceDeck;
import org.thermion.spice.StageDeck;
import org.thermion.timing.DelayCalculator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.Callable;

/**
 * {@code sheets spice MACHINE}: the machine, one module or one stage as a SPICE3 deck (R, C, V and
 * B cards only, the tube laws as behavioural sources) on standard output, for a cross-check in an
 * analog simulator of the builder's choice.
 */
@Command(name = "spice", mixinStandardHelpOptions = true,
        description = {"A SPICE3 netlist (R, C, V and B sources with the published tube equations) of the whole "
                + "machine, one module (--module) or one stage (--stage), written to standard output.",
                "Nets are nodes n_NAME; rails and inputs are DC sources; a thyratron is written unfired."})
final class SheetsSpice implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Option(names = "--stage", paramLabel = "NAME", description = "One stage of this name, alone with its loads.")
    String stage;

    @Option(names = "--module", paramLabel = "PATH", description = "One module instance (and its submodules) by path.")
    String module;

    @Option(names = "--inputs", paramLabel = "BITS",
            description = "With --stage: each input's logic value, first input first (default: all 0).")
    String inputs;

    @Option(names = "--loads", paramLabel = "N", description = "With --stage: copies of its own input on its output "
            + "(default: ${DEFAULT-VALUE}).")
    int loads = 1;

    @Option(names = "--stored", description = "With --stage: the stored state 1 (a flip-flop's Q high, a thyratron fired).")
    boolean stored;

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (stage != null && module != null) {
            return bad(err, "--stage and --module select different things", "give one of them");
        }
        if (stage == null && (inputs != null || stored)) {
            return bad(err, "--inputs and --stored go with --stage", "name the stage with --stage NAME");
        }
        if (loads < 0 || loads > 64) {
            return bad(err, "--loads " + loads + " is out of range", "give 0 to 64");
        }
        Machine m = new MachineLoader().load(machineFile, err, false);
        err.flush();
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        MachineCircuits circuits = MachineCircuits.of(m);
        SpiceDeck deck;
        if (stage != null) {
            deck = stageDeck(m, circuits, err);
        } else {
            if (module != null && m.modules().stream().noneMatch(x -> x.path().equals(module))) {
                List<String> paths = new ArrayList<>();
                for (ModuleInstance x : m.modules()) {
                    if (!x.path().isEmpty()) {
                        paths.add(x.path());
                    }
                }
                return bad(err, "no module instance at path '" + module + "'",
                        paths.isEmpty() ? "the machine has only its top module" : "paths: " + String.join(", ", paths));
            }
            deck = new MachineDeck(m, circuits).write(module).deck();
        }
        if (deck == null) {
            return ExitCodes.BAD_INPUT;
        }
        out.print(deck.text());
        out.flush();
        return ExitCodes.OK;
    }

    private SpiceDeck stageDeck(Machine m, MachineCircuits circuits, PrintWriter err) {
        StageType st = m.stages().stream().filter(s -> s.name().equals(stage)).findFirst().orElse(null);
        StageCircuit c = st == null ? null : circuits.circuit(st).orElse(null);
        if (c == null) {
            List<String> with = new ArrayList<>();
            for (StageType s : m.stages()) {
                if (circuits.circuit(s).isPresent()) {
                    with.add(s.name());
                }
            }
            bad(err, st == null ? "no stage named '" + stage + "'" : "stage '" + stage + "' has no circuit (it declares "
                    + "its currents)", "stages with circuits: " + String.join(", ", with));
            return null;
        }
        String bits = inputs == null ? "0".repeat(c.inputs()) : inputs;
        if (bits.length() != c.inputs() || !bits.matches("[01]*")) {
            bad(err, "--inputs '" + bits + "' does not fit stage " + stage, "give " + c.inputs() + " digits 0 or 1");
            return null;
        }
        double high = DelayCalculator.highRail(m);
        double[] volts = new double[bits.length()];
        for (int i = 0; i < volts.length; i++) {
            volts[i] = bits.charAt(i) == '1' ? high : 0;
        }
        List<Load> on = Collections.nCopies(loads, c.inputLoad());
        return StageDeck.of(c, circuits.solver(), volts, stored, on,
                name -> m.tubes().stream().filter(t -> t.name().equalsIgnoreCase(name)).findFirst().orElse(null)).deck();
    }

    private static int bad(PrintWriter err, String message, String hint) {
        err.println("error: " + message);
        err.println("  = " + hint);
        err.flush();
        return ExitCodes.BAD_INPUT;
    }
}
