package org.thermion.power;

import org.junit.jupiter.api.Test;
import org.thermion.model.BuiltBlock;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The program counter, ROM and clock are counted when their stages are stated, and left out with a reason otherwise. */
class BuiltBlockBudgetTest {
    private static String machine(String pc, String rom, String clock) {
        return MeteredRunTest.rommed("800 mA")
                .replace("rom { words 4; width 2; data w; offboard }", "rom { words 4; width 2; data w; " + rom + " }")
                .replace("pc { width 2; phase 2; jump jump; target target; offboard }",
                        "pc { width 2; phase 2; jump jump; target target; " + pc + " }")
                .replace("clock { phases 2; period 100 us }", "clock { phases 2; period 100 us; " + clock + " }");
    }

    @Test
    void statedStagesAreCountedInTubesHeatersAndBplus() {
        Machine plain = PowerMachines.of(machine("offboard", "offboard", "offboard"));
        Machine counted = PowerMachines.of(machine("uses 1 counted_flipflop per bit",
                "offboard because \"a diode matrix\"", "uses 1 counted_follower per phase"));
        BuiltBlock pc = counted.built().stream().filter(b -> b.block().equals("pc")).findFirst().orElseThrow();
        assertThat(pc.counted()).isTrue();
        // two bits, one flip-flop (both sections of a 12AU7) each: two envelopes in the pc module
        assertThat(pc.stages()).singleElement().satisfies(s -> assertThat(s.count()).isEqualTo(2));
        assertThat(counted.envelopes().stream().filter(e -> e.module() == pc.module())).hasSize(2);
        // two phase drivers, one 12AU7 section each: one envelope, both sections used
        BuiltBlock clock = counted.built().stream().filter(b -> b.block().equals("clock")).findFirst().orElseThrow();
        assertThat(counted.envelopes().stream().filter(e -> e.module() == clock.module())).singleElement()
                .satisfies(e -> assertThat(e.sectionsUsed()).isEqualTo(2));
        assertThat(counted.envelopes()).hasSize(plain.envelopes().size() + 3);
        // each new 12AU7 is on the parallel 12.6 V rule: three more heaters of 0.15 A (datasheet rating)
        assertThat(counted.heaterStrings()).hasSize(plain.heaterStrings().size() + 3);
        // typed-in draws (counted-stages.machine): counted_flipflop 3.2 mA always, counted_follower 3.0 mA always on bplus
        int bplus = counted.railIndex("bplus");
        Budget a = new Budget(plain);
        Budget b = new Budget(counted);
        assertThat(b.staticHighRail(bplus) - a.staticHighRail(bplus)).isCloseTo(2 * 3.2e-3 + 2 * 3.0e-3, within(1e-12));
        assertThat(b.staticLowRail(bplus) - a.staticLowRail(bplus)).isCloseTo(2 * 3.2e-3 + 2 * 3.0e-3, within(1e-12));
        assertThat(b.leftOut()).containsExactly("ROM: declared offboard (a diode matrix), not made of tubes");
    }

    @Test
    void aBlockThatStatesNothingIsLeftOutAndSaysWhy() {
        Machine m = PowerMachines.of(machine("", "", ""));
        Budget b = new Budget(m);
        assertThat(b.leftOut()).hasSize(3).allSatisfy(s -> assertThat(s).contains("its stages are not stated"));
    }
}
