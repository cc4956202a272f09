package org.thermion.asm;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.lang.Diagnostics;
import org.thermion.model.Machine;
import org.thermion.model.StateBit;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** programs/every-op.asm: its documented results, and every state bit equal on both levels. */
class EveryOpProgramTest {
    /** Instructions run per pass: 30 words, less the NOP that JMPCN jumps over (listing of the program). */
    static final int PASS = 29;
    static final int SKIPPED_NOP = 0x1C;
    static Machine m;
    static long[] rom;

    @BeforeAll
    static void assemble() {
        m = DemoMachine.load();
        rom = Assembler.assemble(m, Path.of("programs", "every-op.asm"), new Diagnostics()).words();
    }

    @Test
    void computesWhatItsHeaderSays() {
        RunLevel l = new RunLevel.Isa(m, rom);
        boolean carry = false;
        int[][] inputs = {{0, 0}, {1, 1}, {1, 0}, {0, 1}, {1, 1}, {1, 1}, {0, 0}};
        for (int[] in : inputs) {
            boolean a = in[0] == 1, b = in[1] == 1;
            l.input("in_a", a);
            l.input("in_b", b);
            for (int i = 0; i < PASS; i++) {
                assertThat(l.pc()).isNotEqualTo(SKIPPED_NOP);
                l.step();
            }
            assertThat(l.pc()).as("one pass ends back at start").isZero();
            int total = in[0] + in[1] + (carry ? 1 : 0);
            assertThat(l.output("pump")).isEqualTo(a & b);
            assertThat(l.output("alarm")).isEqualTo(a ^ b);
            assertThat(l.output("sum")).isEqualTo((total & 1) == 1);
            assertThat(l.output("ready")).isTrue();
            assertThat(l.stateBit("s0")).isEqualTo(a & !b);
            assertThat(l.stateBit("s1")).isEqualTo(!(a | !b));
            assertThat(l.stateBit("s2")).isEqualTo(!(a & !b));
            assertThat(l.stateBit("s3")).isEqualTo(!a);
            carry = total >= 2;
            assertThat(l.stateBit("carry")).isEqualTo(carry);
        }
    }

    @Test
    @Timeout(10)
    void logicLevelHoldsTheSameStateAfterEveryInstruction() {
        RunLevel isa = new RunLevel.Isa(m, rom);
        RunLevel logic = new RunLevel.Logic(m, rom);
        for (int k = 0; k < 12 * PASS; k++) {
            boolean a = (k / 7) % 2 == 1, b = (k / 11) % 3 == 1;
            for (RunLevel l : new RunLevel[] {isa, logic}) {
                l.input("in_a", a);
                l.input("in_b", b);
                l.step();
            }
            for (StateBit s : m.isa().state()) {
                assertThat(logic.stateBit(s.name())).as("%s after cycle %d", s.name(), k + 1).isEqualTo(isa.stateBit(s.name()));
            }
            assertThat(logic.pc()).isEqualTo(isa.pc());
        }
        assertThat(logic.changes).containsExactlyElementsOf(isa.changes);
    }
}
