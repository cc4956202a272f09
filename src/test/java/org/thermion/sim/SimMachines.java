package org.thermion.sim;

import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/** SimMachines for the simulator tests: the demo from disk, small ones from text. */
public final class SimMachines {
    public static final Path DEMO = Path.of("examples", "pumpstation", "pumpstation.machine");

    private SimMachines() {
    }

    public static Machine demo() {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(src, d).elaborate(DEMO);
        return check(m, src, d);
    }

    /** A realize block choosing the parts library's stage for every operator and for latches. */
    public static final String REALIZE_LIBRARY = """
            realize {
              not pentode_inverter
              nand pentode_nand2
              nor triode_nor2
              and diode_and
              or diode_or
              buffer cathode_follower
              latch triode_flipflop
            }
            """;

    /** Supplies and the operator-to-stage mapping every small test machine shares. */
    public static final String PRELUDE = """
            rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
            rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
            rail heat  { voltage 12.6 V; source 0.02 ohm; limit 40 A }
            heaters on heat {
              parallel 12AU7 at 12.6 V
              series 2 of 6AL5 6AU6 across machine
            }
            """ + REALIZE_LIBRARY;

    /** Elaborates a small machine written after {@link #PRELUDE}. */
    public static Machine fromText(String text) {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(src, d).elaborateText(Path.of("test.machine"), PRELUDE + text);
        return check(m, src, d);
    }

    private static Machine check(Machine m, SourceSet src, Diagnostics d) {
        if (m == null || d.hasErrors()) {
            StringWriter w = new StringWriter();
            new DiagnosticPrinter(src).print(d, new PrintWriter(w));
            throw new AssertionError("machine did not elaborate:\n" + w);
        }
        return m;
    }

    /** Index of the net with this name. */
    public static int net(Machine m, String name) {
        String[] names = m.netlist().netNames();
        for (int i = 0; i < names.length; i++) {
            if (names[i].equals(name)) {
                return i;
            }
        }
        throw new AssertionError("no net " + name);
    }

    /** The demo's instruction word: opcode in bits 11..8, operand in 7..0 (its header comment). */
    public static long word(int opcode, int operand) {
        return ((long) opcode << 8) | operand;
    }
}
