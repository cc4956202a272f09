package org.thermion.sim;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.thermion.sim.Machines.word;

/** The demo machine running hand-encoded words (opcodes from its ISA block). */
class DemoProgramTest {
    static final int LD = 0x1, LDN = 0x2, ST = 0x3, JMP = 0xD, JMPC = 0xE;

    @Test
    void loadStoreCopiesAnInputToAnOutputPerLane() {
        Machine m = Machines.demo();
        Simulator sim = new Simulator(m);
        // 0: LD low_sw   1: ST pump   2: JMP 0
        sim.loadRom(new long[] {word(LD, 0), word(ST, 8), word(JMP, 0)});
        long odd = 0xAAAA_AAAA_AAAA_AAAAL;
        sim.setInput(sim.inputIndex("low_sw"), odd);
        sim.stepCycle();
        sim.stepCycle();
        int pump = Machines.net(m, "pump");
        assertThat(sim.value(pump)).isEqualTo(odd);
        assertThat(sim.pc(0)).isEqualTo(2);
        sim.stepCycle();
        assertThat(sim.pc(0)).isEqualTo(0);
        assertThat(sim.cycle()).isEqualTo(3);
    }
}
