package org.thermion.sim.reference;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.thermion.asm.DemoMachine;
import org.thermion.model.Isa;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The interpreter on the demo ISA. Expected values come from the demo machine's header
 * comment (opcode in bits 11..8, bit address in 3..0, jump target in 7..0) and the usual
 * meaning of the IEC 61131-3 IL-style operators (LD, ST, S, R, AND, OR, XOR, ...);
 * words are encoded by hand as opcode * 256 + operand.
 */
class IsaInterpreterTest {
    static Machine m;
    static Isa isa;
    static int acc, carry, pump, alarm, s0;
    static int lowSw, highSw;

    @BeforeAll
    static void load() {
        m = DemoMachine.load();
        isa = m.isa();
        acc = isa.stateIndex("acc");
        carry = isa.stateIndex("carry");
        pump = isa.stateIndex("pump");
        alarm = isa.stateIndex("alarm");
        s0 = isa.stateIndex("s0");
        lowSw = inputIndex("low_sw");
        highSw = inputIndex("high_sw");
    }

    static int inputIndex(String name) {
        for (int i = 0; i < m.inputs().size(); i++) {
            if (m.inputs().get(i).name().equals(name)) {
                return i;
            }
        }
        throw new AssertionError(name);
    }

    static long w(int opcode, int operand) {
        return (long) opcode << 8 | operand;
    }

    /** Runs one word with acc, carry and the bit at address 12 (s0) set as given. */
    static IsaInterpreter.Outcome run(long word, boolean a, boolean c, boolean bit) {
        boolean[] st = new boolean[isa.state().size()];
        st[acc] = a;
        st[carry] = c;
        st[s0] = bit;
        return IsaInterpreter.execute(isa, word, st, new boolean[m.inputs().size()], 7, m.pc().width());
    }

    @Test
    void logicOperatorsOverAllOperandCombinations() {
        for (int k = 0; k < 8; k++) {
            boolean a = (k & 1) != 0, c = (k & 2) != 0, b = (k & 4) != 0;
            assertThat(run(w(0x1, 12), a, c, b).state()[acc]).as("LD").isEqualTo(b);
            assertThat(run(w(0x2, 12), a, c, b).state()[acc]).as("LDN").isEqualTo(!b);
            assertThat(run(w(0x7, 12), a, c, b).state()[acc]).as("AND").isEqualTo(a & b);
            assertThat(run(w(0x8, 12), a, c, b).state()[acc]).as("ANDN").isEqualTo(a & !b);
            assertThat(run(w(0x9, 12), a, c, b).state()[acc]).as("OR").isEqualTo(a | b);
            assertThat(run(w(0xA, 12), a, c, b).state()[acc]).as("ORN").isEqualTo(a | !b);
            assertThat(run(w(0xB, 12), a, c, b).state()[acc]).as("XOR").isEqualTo(a ^ b);
            // ADD is a full adder: sum and carry out of a + b + c, by integer arithmetic.
            int total = (a ? 1 : 0) + (b ? 1 : 0) + (c ? 1 : 0);
            IsaInterpreter.Outcome add = run(w(0xC, 12), a, c, b);
            assertThat(add.state()[acc]).as("ADD sum").isEqualTo((total & 1) == 1);
            assertThat(add.state()[carry]).as("ADD carry reads acc before the instruction").isEqualTo(total >= 2);
            assertThat(run(w(0x3, 12), a, c, b).state()[s0]).as("ST").isEqualTo(a);
            assertThat(run(w(0x4, 12), a, c, b).state()[s0]).as("STN").isEqualTo(!a);
            assertThat(run(w(0x5, 12), a, c, b).state()[s0]).as("S").isEqualTo(b | a);
            assertThat(run(w(0x6, 12), a, c, b).state()[s0]).as("R").isEqualTo(b & !a);
            assertThat(run(w(0x0, 12), a, c, b).state()).as("NOP").containsExactly(run(w(0x0, 0), a, c, b).state());
        }
    }

    @Test
    void writtenFlagsNameExactlyTheBitsAStoreOrSetTouches() {
        assertThat(run(w(0x3, 12), true, false, false).written()[s0]).isTrue();
        assertThat(run(w(0x5, 12), false, false, false).written()[s0]).as("S with acc 0 writes nothing").isFalse();
        assertThat(run(w(0x5, 12), true, false, false).written()[s0]).isTrue();
        assertThat(run(w(0x1, 12), true, false, false).written()[s0]).isFalse();
        assertThat(run(w(0x1, 12), true, false, false).written()[acc]).isTrue();
    }

    @Test
    void storesToInputsOrUnmappedAddressesChangeNothing() {
        boolean[] before = run(w(0x0, 0), true, true, true).state();
        assertThat(run(w(0x3, 0), true, true, true).state()).as("ST to input low_sw").containsExactly(before);
        assertThat(run(w(0x3, 6), true, true, true).state()).as("ST to unmapped 6").containsExactly(before);
        assertThat(run(w(0x1, 6), true, true, true).state()[acc]).as("unmapped reads 0").isFalse();
    }

    @Test
    void jumpsTakeTheOperandAndOtherwiseThePcCounts() {
        assertThat(run(w(0xD, 0x42), false, false, false).pc()).isEqualTo(0x42);
        assertThat(run(w(0xE, 0x42), true, false, false).pc()).isEqualTo(0x42);
        assertThat(run(w(0xE, 0x42), false, false, false).pc()).isEqualTo(8);
        assertThat(run(w(0xF, 0x42), false, false, false).pc()).isEqualTo(0x42);
        assertThat(run(w(0xF, 0x42), true, false, false).pc()).isEqualTo(8);
        assertThat(run(w(0x1, 0x42), true, false, false).pc()).isEqualTo(8);
    }

    @Test
    void programReadsInputsAndCountsCyclesWithPcWrapping() {
        IsaInterpreter in = new IsaInterpreter(m);
        // LD low_sw; ORN high_sw; ST alarm; JMP 0   (hand-encoded)
        in.loadRom(new long[] {w(0x1, 0), w(0xA, 1), w(0x3, 9), w(0xD, 0)});
        in.reset();
        in.setInput(lowSw, false);
        in.setInput(highSw, true);
        for (int i = 0; i < 4; i++) {
            in.step();
        }
        assertThat(in.state(alarm)).isFalse();
        assertThat(in.pc()).isZero();
        in.setInput(highSw, false);
        for (int i = 0; i < 4; i++) {
            in.step();
        }
        assertThat(in.state(alarm)).isTrue();
        assertThat(in.cycle()).isEqualTo(8);
        in.setPc(255);
        in.step(); // word 255 is 0 (NOP): the 8-bit PC wraps to 0
        assertThat(in.pc()).isZero();
        assertThat(in.state(pump)).isFalse();
    }
}
