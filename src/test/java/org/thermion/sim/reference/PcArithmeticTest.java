package org.thermion.sim.reference;

import org.junit.jupiter.api.Test;
import org.thermion.asm.Assembler;
import org.thermion.asm.Assembly;
import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Isa;
import org.thermion.model.Machine;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Meanings that compute the PC from the PC: a conditional skip ({@code pc <- pc + 2}), a forward
 * relative jump ({@code pc <- pc + operand + 1}) and a backward one ({@code pc <- pc - sel}), on
 * the verify tests' skip machine (6-bit word, opcode 5..4, operand 3..0, sel 1..0, 4-bit PC). Expected
 * addresses worked by hand, modulo 16.
 */
class PcArithmeticTest {

    static Machine machine() throws IOException {
        String text = Files.readString(Path.of("src/test/resources/org/thermion/verify/skip.machine"))
                .replace("op ST 0x2 { [sel] <- acc }", "op BACK 0x2 { pc <- pc - sel }")
                .replace("op JMPC 0x3 { if acc { pc <- operand } }", "op BR 0x3 { if acc { pc <- pc + operand + 1 } }");
        SourceSet s = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(s, d).elaborateText(Path.of("skip.machine"), text);
        assertThat(d.hasErrors()).as(() -> printed(s, d)).isFalse();
        return m;
    }

    static String printed(SourceSet s, Diagnostics d) {
        StringWriter w = new StringWriter();
        new DiagnosticPrinter(s).print(d, new PrintWriter(w, true));
        return w.toString();
    }

    static int pcAfter(Isa isa, long word, boolean acc, int pc) {
        boolean[] state = new boolean[isa.state().size()];
        state[isa.stateIndex("acc")] = acc;
        return IsaInterpreter.execute(isa, word, state, new boolean[2], pc, 4).pc();
    }

    @Test
    void aSkipAddsTwoOnlyWhenItsConditionHolds() throws IOException {
        Isa isa = machine().isa();
        long skz = 1L << 4;
        assertThat(pcAfter(isa, skz, false, 5)).isEqualTo(7);
        assertThat(pcAfter(isa, skz, true, 5)).isEqualTo(6);
        assertThat(pcAfter(isa, skz, false, 15)).as("15 + 2 wraps to 1").isEqualTo(1);
    }

    @Test
    void relativeJumpsCountFromTheInstructionsOwnAddress() throws IOException {
        Isa isa = machine().isa();
        long br3 = 3L << 4 | 3;
        assertThat(pcAfter(isa, br3, true, 4)).as("4 + 3 + 1").isEqualTo(8);
        assertThat(pcAfter(isa, br3, false, 4)).as("not taken").isEqualTo(5);
        assertThat(pcAfter(isa, br3, true, 14)).as("14 + 4 wraps to 2").isEqualTo(2);
        long back2 = 2L << 4 | 2;
        assertThat(pcAfter(isa, back2, false, 1)).as("1 - 2 wraps to 15").isEqualTo(15);
        assertThat(pcAfter(isa, back2 | 0xC, false, 9)).as("only sel (bits 1..0) counts: 9 - 2").isEqualTo(7);
    }

    @Test
    void theAssemblerWritesTheDistanceAndRefusesATargetOutOfReach() throws IOException {
        Machine m = machine();
        SourceSet s = new SourceSet();
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assembleText(m, Path.of("t.asm"), """
                      LD a
                      SKZ
                top:  BR far
                      LD b
                far:  BACK top
                """, s, d);
        assertThat(d.hasErrors()).as(() -> printed(s, d)).isFalse();
        // BR at 2 reaches 4 with operand 4 - 2 - 1 = 1; BACK at 4 reaches 2 with sel 4 - 2 = 2.
        assertThat(a.words()[2]).isEqualTo(3L << 4 | 1);
        assertThat(a.words()[4]).isEqualTo(2L << 4 | 2);
        assertThat(a.words()[1]).as("a skip takes no operand").isEqualTo(1L << 4);

        Diagnostics d2 = new Diagnostics();
        SourceSet s2 = new SourceSet();
        // BACK at 0 to 3: 0 - 3 = -3, 13 modulo 16, beyond the 2-bit field's 3.
        assertThat(Assembler.assembleText(m, Path.of("t.asm"), "BACK there\nLD a\nLD a\nthere: LD a\n", s2, d2)).isNull();
        assertThat(printed(s2, d2)).contains("jump target 3 is out of reach of BACK at address 0")
                .contains("would need 13");
    }

    @Test
    void theIsaLevelRunSkipsAndJumpsAsTheMeaningsSay() throws IOException {
        Machine m = machine();
        IsaInterpreter run = new IsaInterpreter(m);
        // 0: LD a (a = 0) ; 1: SKZ -> 3 ; 2: (skipped) ; 3: BACK 3 -> 0
        run.loadRom(new long[] {0, 1L << 4, 3L << 4 | 15, 2L << 4 | 3});
        int[] seen = new int[5];
        for (int k = 0; k < 5; k++) {
            seen[k] = run.pc();
            run.step();
        }
        assertThat(seen).containsExactly(0, 1, 3, 0, 1);
    }
}
