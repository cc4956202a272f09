package org.thermion.circuit;

import java.nio.file.Path;
import java.util.Map;

import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.sim.SimMachines;

/**
 * The parts library's tubes and stages as the solver sees them, read from the library's own
 * text through a small machine that uses every one of them at the library's design rails
 * (48 V B+, -12 V bias, 24 V relay rail).
 */
final class LibraryParts {
    static final String MACHINE = """
            rail bplus { voltage 48 V }
            rail bias  { voltage -12 V }
            rail relay { voltage 24 V }
            rail heat  { voltage 6.3 V }
            heaters on heat { parallel 6AU6 6AK5 12AU7 12AT7 12AX7 6SN7 6J6 5965 5670 6AL5 2D21 at 6.3 V }
            """ + SimMachines.REALIZE_LIBRARY + """
            module top {
              in a, b
              out y1, y2, y3, y4, y5, y6, l, r, t
              y1 = !a
              y2 = !(a & b)
              y3 = !(a | b)
              y4 = a & b
              y5 = a | b
              y6 = cathode_follower(a)
              l = lamp_driver(a)
              r = triode_relay(a)
              t = thyratron_relay(a)
              latch q on phase 1 = a
            }
            machine lib { top top; inputs a b; outputs y1 y2 y3 y4 y5 y6 l r t }
            """;

    private static Machine machine;
    private static MachineCircuits circuits;

    private LibraryParts() {
    }

    /** The elaborated library machine (errors fail the caller's test). */
    static synchronized Machine machine() {
        if (machine == null) {
            Diagnostics d = new Diagnostics();
            Machine m = new Elaborator(new SourceSet(), d).elaborateText(Path.of("library-parts.machine"), MACHINE);
            if (d.hasErrors()) {
                throw new AssertionError("library machine: " + d.all());
            }
            machine = m;
        }
        return machine;
    }

    /** The library's circuits at its design rails. */
    static synchronized MachineCircuits circuits() {
        if (circuits == null) {
            circuits = MachineCircuits.of(machine());
        }
        return circuits;
    }

    /** Every library tube's model. */
    static TubeLibrary tubes() {
        return circuits().tubes();
    }

    /** The library's stage circuits by name. */
    static Map<String, StageCircuit> stages() {
        return circuits().circuitsByName();
    }
}
