package org.thermion.asm;

import org.thermion.sim.SimMachines;
import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/** Loads the demo machine once per test class; fails loudly if it does not elaborate. */
public final class DemoMachine {
    public static final Path FILE = Path.of("examples", "pumpstation", "pumpstation.machine");

    private DemoMachine() {
    }

    public static Machine load() {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        return check(new Elaborator(src, d).elaborate(FILE), src, d);
    }

    /**
     * A second, deliberately different machine, so nothing is tied to the demo: 8-bit words,
     * a 3-bit opcode in 7..5, a 5-bit jump field in 4..0 overlapping a 3-bit select field in
     * 2..0, a 32-word ROM, instructions without operand (CLR, FLIP) and a jump with an else.
     * Its logic is minimal; only its isa block matters to the assembler and the interpreter.
     */
    public static Machine tiny() {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        return check(new Elaborator(src, d).elaborateText(Path.of("tiny.machine"), TINY), src, d);
    }

    static final String TINY = SimMachines.PRELUDE + """
            module tiny {
              in word[8]
              in b0, b1
              out q, jump, target[5]
              latch ir[8] on phase 1 = word
              latch acc on phase 2 = ir[0] & b0 | b1
              latch q on phase 2 = acc
              jump = ir[7]
              target = ir[4..0]
            }
            machine tiny {
              clock { phases 2; period 100 us }
              top tiny
              rom { words 32; width 8; data word; offboard }
              pc { width 5; phase 2; jump jump; target target; offboard }
              inputs b0 b1
              outputs q
            }
            isa tiny {
              word 8
              field op 7..5
              field addr 4..0
              field sel 2..0
              opcode op
              target addr
              select sel
              state acc = acc
              state q = q
              bit 0 = b0
              bit 1 = b1
              bit 4 = q
              op CLR 0 { acc <- 0 }
              op LD 1 { acc <- [sel] }
              op ST 2 { [sel] <- acc }
              op FLIP 3 { acc <- !acc; q <- acc }
              op GO 4 { pc <- addr }
              op SKIP 5 { if acc { pc <- addr } else { acc <- 1 } }
            }
            """;

    private static Machine check(Machine m, SourceSet src, Diagnostics d) {
        if (d.hasErrors() || m == null) {
            StringWriter w = new StringWriter();
            new DiagnosticPrinter(src).print(d, new PrintWriter(w));
            throw new AssertionError("machine does not elaborate:\n" + w);
        }
        return m;
    }
}
