package org.thermion.asm;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.Arrays;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Assembler output against words encoded by hand from the demo machine's header comment:
 * opcode in bits 11..8 (NOP 0, LD 1, LDN 2, ST 3, ... JMP D, JMPC E, JMPCN F, from the isa block),
 * bit address or jump target in the low bits; so word = opcode * 0x100 + operand.
 */
class AssemblerTest {
    static Machine m;

    @BeforeAll
    static void load() {
        m = DemoMachine.load();
    }

    static Assembly assemble(String text) {
        Diagnostics d = new Diagnostics();
        SourceSet src = new SourceSet();
        Assembly a = Assembler.assembleText(m, Path.of("t.asm"), text, src, d);
        if (a == null) {
            StringWriter w = new StringWriter();
            new DiagnosticPrinter(src).print(d, new PrintWriter(w));
            throw new AssertionError(w.toString());
        }
        return a;
    }

    static long[] head(Assembly a, int n) {
        return Arrays.copyOf(a.words(), n);
    }

    @Test
    void pumpProgramMatchesHandEncoding() {
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assemble(m, Path.of("programs", "pump.asm"), d);
        assertThat(d.hasErrors()).isFalse();
        // LDN low_sw, OR s0, ANDN high_sw, ST s0, OR manual, ST pump, LD high_sw, ANDN low_sw, ST alarm, JMP 0
        long[] expected = {0x200, 0x90C, 0x801, 0x30C, 0x902, 0x308, 0x101, 0x800, 0x309, 0xD00};
        assertThat(head(a, 10)).containsExactly(expected);
        assertThat(a.words()).hasSize(256);
        assertThat(Arrays.stream(a.words()).skip(10).allMatch(w -> w == 0)).isTrue();
    }

    @Test
    void numbersInEveryBaseNamesExpressionsAndCase() {
        Assembly a = assemble("""
                .const BASE = 0x0C
                        ld   BASE + 1          ; s1 = 13
                        St   0b1000            ; pump = 8
                        Or   (BASE + 6) / 2 - 0 ; 9
                        AND  -(-10)            ; 10
                        XOR  2 * 3 - 1         ; 5
                        jmp  end
                end:    JMPCN end
                """);
        assertThat(head(a, 7)).containsExactly(0x10D, 0x308, 0x909, 0x70A, 0xB05, 0xD06, 0xF06);
    }

    @Test
    void originsWordsAndForwardLabels() {
        Assembly a = assemble("""
                        JMP  main
                        .at  0x20
                main:   LD   in_a
                        JMPC main + 2
                        .word 0xABC
                table:  .word table
                """);
        assertThat(a.words()[0]).isEqualTo(0xD20);
        assertThat(Arrays.copyOfRange(a.words(), 0x20, 0x24)).containsExactly(0x104, 0xE22, 0xABC, 0x023);
        assertThat(Arrays.copyOfRange(a.words(), 1, 0x20)).containsOnly(0L);
    }

    @Test
    void listingHasOneLinePerSourceLineAndNoAddressWithoutAWord() {
        Assembly a = assemble("; comment\nstart:\n  NOP\n.const K = 1\n  LD K\n");
        assertThat(a.listing()).containsExactly(
                new ListingLine(-1, 0, false, 1, "; comment"),
                new ListingLine(-1, 0, false, 2, "start:"),
                new ListingLine(0, 0x000, true, 3, "  NOP"),
                new ListingLine(-1, 0, false, 4, ".const K = 1"),
                new ListingLine(1, 0x101, true, 5, "  LD K"));
        assertThat(Listing.render(a, 12, 8)).containsExactly(
                "addr  word   bits            line  source",
                "                                1  ; comment",
                "                                2  start:",
                "0x00  0x000  0000 0000 0000     3    NOP",
                "                                4  .const K = 1",
                "0x01  0x101  0001 0000 0001     5    LD K");
    }

    @Test
    void storeToAnInputWarnsButAssembles() {
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assembleText(m, Path.of("w.asm"), "ST low_sw\nST 7\n", new SourceSet(), d);
        assertThat(a).isNotNull();
        assertThat(d.warnings()).hasSize(2);
        assertThat(d.warnings().get(0).message()).contains("machine input");
        assertThat(d.warnings().get(1).message()).contains("no bit is mapped");
    }

    @Test
    void manyErrorsAreCountedPastTheLimit() {
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assembleText(m, Path.of("many.asm"), "LDX 1\n".repeat(25), new SourceSet(), d);
        assertThat(a).isNull();
        assertThat(d.errorCount()).isEqualTo(25);
        assertThat(d.all()).hasSize(Diagnostics.LIMIT);
        assertThat(d.dropped()).isEqualTo(25 - Diagnostics.LIMIT);
        assertThat(d.all().get(0).span().line()).isEqualTo(1);
    }

    @Test
    void everyOpUsesEveryOpcode() {
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assemble(m, Path.of("programs", "every-op.asm"), d);
        assertThat(d.hasErrors()).isFalse();
        boolean[] seen = new boolean[16];
        for (ListingLine l : a.listing()) {
            if (l.hasWord()) {
                seen[(int) (l.word() >>> 8)] = true;
            }
        }
        for (var ins : m.isa().instructions()) {
            assertThat(seen[(int) ins.opcode()]).as(ins.mnemonic()).isTrue();
        }
    }
}
