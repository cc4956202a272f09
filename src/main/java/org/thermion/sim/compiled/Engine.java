package org.thermion.sim.compiled;

import org.thermion.model.Machine;
import org.thermion.sim.Simulator;

import java.util.Locale;
import java.util.function.Consumer;

/**
 * The simulation engines a user can choose. {@code array} walks the flat gate arrays;
 * {@code compiled} runs the logic as generated straight-line bytecode (needs a JDK, costs
 * a compile at start-up). Both give identical results; three-valued runs always use the
 * array engine.
 */
public enum Engine {
    ARRAY, COMPILED;

    /** "array" or "compiled"; IllegalArgumentException with the choices otherwise. */
    public static Engine parse(String text) {
        for (Engine e : values()) {
            if (e.word().equals(text.trim().toLowerCase(Locale.ROOT))) {
                return e;
            }
        }
        throw new IllegalArgumentException("unknown engine '" + text + "': choose array or compiled");
    }

    /** The word used on the command line. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * A simulator of {@code machine} on this engine. When the compiled engine cannot run here
     * the array engine is used and {@code notes} is told why.
     */
    public Simulator simulator(Machine machine, Consumer<String> notes) {
        if (this == COMPILED) {
            String why = StraightLineCompiler.unavailableReason();
            if (why == null) {
                return new Simulator(machine, StraightLineCompiler.compile(machine.netlist()));
            }
            notes.accept(why + "; using the array engine");
        }
        return new Simulator(machine);
    }
}
