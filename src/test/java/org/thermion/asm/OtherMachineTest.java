package org.thermion.asm;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.sim.reference.IsaInterpreter;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.Arrays;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The assembler and the interpreter on {@link DemoMachine#tiny()}, whose layout differs from
 * the demo's in every respect. Words by hand: opcode * 32 + operand.
 */
class OtherMachineTest {
    static Machine m;

    @BeforeAll
    static void load() {
        m = DemoMachine.tiny();
    }

    static String errors(String text) {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Assembler.assembleText(m, Path.of("tiny.asm"), text, src, d);
        StringWriter w = new StringWriter();
        new DiagnosticPrinter(src).print(d, new PrintWriter(w));
        return w.toString();
    }

    @Test
    void operandFieldsFollowEachInstructionsMeaning() {
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assembleText(m, Path.of("tiny.asm"), """
                top:   CLR
                       LD   b1
                       ST   q
                       flip
                       SKIP top
                       GO   31
                """, new SourceSet(), d);
        assertThat(d.hasErrors()).isFalse();
        assertThat(a.words()).hasSize(32);
        assertThat(Arrays.copyOf(a.words(), 6)).containsExactly(0x00, 0x21, 0x44, 0x60, 0xA0, 0x9F);
    }

    @Test
    void fieldWidthsAndRomSizeComeFromTheMachine() {
        assertThat(errors("LD 8\nGO 32\nCLR 1\n"))
                .contains("operand 8 is too wide for the 3-bit field 'sel'")
                .contains("operand 32 is too wide for the 5-bit field 'addr'")
                .contains("CLR takes no operand");
        assertThat(errors(".at 31\nCLR\nCLR\n")).contains("the 32-word ROM ends at address 31");
        assertThat(errors("LD pump\n")).contains("undefined name 'pump'");
    }

    @Test
    void interpreterReadsTheStateBeforeTheInstructionAndTakesElseBranches() {
        IsaInterpreter in = new IsaInterpreter(m);
        // FLIP; SKIP 7 (acc = 1 after FLIP: taken) ... 7: SKIP 0 with acc = 1: taken
        long[] rom = new long[32];
        rom[0] = 0x60;
        rom[1] = 0xA7;
        rom[7] = 0xA0;
        in.loadRom(rom);
        in.reset();
        in.step();
        assertThat(in.state("acc")).isTrue();
        assertThat(in.state("q")).as("q <- acc reads acc before FLIP").isFalse();
        in.step();
        assertThat(in.pc()).isEqualTo(7);
        in.setState(m.isa().stateIndex("acc"), false);
        in.step();
        assertThat(in.pc()).as("else branch: no jump").isEqualTo(8);
        assertThat(in.state("acc")).as("else branch sets acc").isTrue();
        in.setPc(31);
        in.step();
        assertThat(in.pc()).as("5-bit PC wraps").isZero();
    }
}
