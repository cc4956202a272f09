package org.thermion.sim;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.thermion.sim.SimMachines.word;

/** The demo machine running hand-encoded words (opcodes from its ISA block). */
class DemoProgramTest {
    static final int LD = 0x1, LDN = 0x2, ST = 0x3, JMP = 0xD, JMPC = 0xE;

    @Test
    void loadStoreCopiesAnInputToAnOutputPerLane() {
        Machine m = SimMachines.demo();
        Simulator sim = new Simulator(m);
        // 0: LD low_sw   1: ST pump   2: JMP 0
        sim.loadRom(new long[] {word(LD, 0), word(ST, 8), word(JMP, 0)});
        long odd = 0xAAAA_AAAA_AAAA_AAAAL;
        sim.setInput(sim.inputIndex("low_sw"), odd);
        sim.stepCycle();
        sim.stepCycle();
        int pump = SimMachines.net(m, "pump");
        assertThat(sim.value(pump)).isEqualTo(odd);
        assertThat(sim.pc(0)).isEqualTo(2);
        sim.stepCycle();
        assertThat(sim.pc(0)).isEqualTo(0);
        assertThat(sim.cycle()).isEqualTo(3);
    }

    @Test
    void conditionalJumpTakesTheTargetOnlyOnLanesWhereTheAccumulatorIsOne() {
        Machine m = SimMachines.demo();
        Simulator sim = new Simulator(m);
        // 0: LD manual   1: JMPC 0x40   2: LDN manual ... 0x40: JMP 0x40
        long[] rom = new long[256];
        rom[0] = word(LD, 2);
        rom[1] = word(JMPC, 0x40);
        rom[2] = word(LDN, 2);
        rom[0x40] = word(JMP, 0x40);
        sim.loadRom(rom);
        long lanes = 0x0000_FFFF_0000_0F0FL;
        sim.setInput("manual", false);
        sim.setInput(sim.inputIndex("manual"), lanes);
        sim.stepCycle();
        sim.stepCycle();
        for (int lane = 0; lane < 64; lane++) {
            boolean taken = (lanes >>> lane & 1) == 1;
            assertThat(sim.pc(lane)).as("lane %d", lane).isEqualTo(taken ? 0x40 : 2);
        }
        // The lanes now run different words; the ROM is read per lane.
        sim.stepCycle();
        int acc = SimMachines.net(m, "acc");
        for (int lane = 0; lane < 64; lane++) {
            boolean taken = (lanes >>> lane & 1) == 1;
            assertThat(sim.pc(lane)).isEqualTo(taken ? 0x40 : 3);
            // Taken lanes keep acc = 1 (JMP leaves it); the others loaded !manual = 1 as well.
            assertThat(sim.value(acc) >>> lane & 1).isEqualTo(1L);
        }
    }

    @Test
    void pcWrapsAroundItsWidth() {
        Machine m = SimMachines.demo();
        Simulator sim = new Simulator(m);
        sim.loadRom(new long[256]);
        sim.setPc(0, 255);
        sim.setPc(5, 254);
        sim.stepCycle();
        assertThat(sim.pc(0)).isZero();
        assertThat(sim.pc(5)).isEqualTo(255);
        assertThat(sim.pc(1)).isEqualTo(1);
    }

    @Test
    void aJumpOnAnUnsetAccumulatorMakesThePcUnknown() {
        Machine m = SimMachines.demo();
        Simulator sim = new Simulator(m);
        // 0: JMPC 0x10 with acc never loaded.
        sim.loadRom(new long[] {word(JMPC, 0x10)});
        sim.reset(new InitMode.Unknown());
        sim.stepCycle();
        assertThat(sim.unknown(m.pc().jumpNet())).isEqualTo(-1L);
        assertThat(sim.pcUnknown()).isEqualTo(-1L);
        sim.settle();
        for (int n : m.rom().dataNets()) {
            assertThat(sim.unknown(n)).isEqualTo(-1L);
        }
    }

    @Test
    void aStoreOfAKnownValueClearsTheUnknownOutput() {
        Machine m = SimMachines.demo();
        Simulator sim = new Simulator(m);
        // 0: LD high_sw (known input)   1: ST alarm
        sim.loadRom(new long[] {word(LD, 1), word(ST, 9)});
        sim.reset(new InitMode.Unknown());
        int alarm = SimMachines.net(m, "alarm");
        assertThat(sim.unknown(alarm)).isEqualTo(-1L);
        sim.setInput("high_sw", true);
        sim.stepCycle();
        sim.stepCycle();
        assertThat(sim.unknown(alarm)).isZero();
        assertThat(sim.value(alarm)).isEqualTo(-1L);
        assertThat(sim.pcUnknown()).isZero();
    }
}
