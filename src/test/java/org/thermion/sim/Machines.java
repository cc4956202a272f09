package org.thermion.sim;

import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/** Machines for the simulator tests: the demo from disk, small ones from text. */
final class Machines {
    static final Path DEMO = Path.of("examples", "pumpstation", "pumpstation.machine");

    private Machines() {
    }

    static Machine demo() {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(src, d).elaborate(DEMO);
        return check(m, src, d);
    }

    static Machine fromText(String text) {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(src, d).elaborateText(Path.of("test.machine"), text);
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
    static int net(Machine m, String name) {
        String[] names = m.netlist().netNames();
        for (int i = 0; i < names.length; i++) {
            if (names[i].equals(name)) {
                return i;
            }
        }
        throw new AssertionError("no net " + name);
    }

    /** The demo's instruction word: opcode in bits 11..8, operand in 7..0 (its header comment). */
    static long word(int opcode, int operand) {
        return ((long) opcode << 8) | operand;
    }
}
