package org.thermion.verify;

import org.junit.jupiter.api.Test;
import org.thermion.model.Isa;

import static org.assertj.core.api.Assertions.assertThat;

class OperandPlanTest {

    @Test
    void demoPlansCoverEverySelectValueAndTargetPatterns() {
        Isa isa = VerifyMachines.demo().isa();
        OperandPlan nop = OperandPlan.of(isa, isa.byMnemonic("NOP"), 4);
        assertThat(nop.words()).containsExactly(0x000L);
        assertThat(nop.freeMask()).isEqualTo(0x0FFL);

        OperandPlan ld = OperandPlan.of(isa, isa.byMnemonic("LD"), 4);
        assertThat(ld.words()).hasSize(16).contains(0x100L, 0x10FL);
        // Operand bits 7..4 do not matter to LD: they take random values per case.
        assertThat(ld.freeMask()).isEqualTo(0x0F0L);

        OperandPlan jmp = OperandPlan.of(isa, isa.byMnemonic("JMP"), 4);
        // 8 target bits: zeros, ones, 8 walking ones, 8 walking zeros.
        assertThat(jmp.words()).hasSize(18).contains(0xD00L, 0xDFFL, 0xD01L, 0xD80L, 0xDFEL, 0xD7FL);
        assertThat(jmp.freeMask()).isZero();

        OperandPlan all = OperandPlan.of(isa, isa.byMnemonic("JMPC"), 16);
        assertThat(all.words()).hasSize(256);
    }
}
