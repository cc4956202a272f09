package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;

class FaultListTest {

    @Test
    void c17HasThirtyFourStuckAtFaultsAndTwentyTwoAfterEquivalenceCollapsing() {
        // Brglez & Fujiwara 1985 (ISCAS-85 c17); counts as given in REFERENCES.md:
        // 17 lines (5 inputs, 6 gate outputs, 6 fan-out branches of nets 3, 11 and 16).
        FaultList faults = FaultList.of(FaultCircuit.of(Bench.c17()));
        assertThat(faults.stuckAtCount()).isEqualTo(34);
        assertThat(faults.stuckAtCollapsedCount()).isEqualTo(22);
        assertThat(faults.stuckAtTargetCount()).isLessThan(22);
    }

    @Test
    void c17ListsSixDeadTubesThreeOpenHeaterStringsAndTwoBurntLamps() {
        // Six 6AU6 pentodes in series pairs on the 12.6 V supply; lamps are the two outputs.
        FaultList faults = FaultList.of(FaultCircuit.of(Bench.c17()));
        assertThat(faults.all().stream().filter(f -> f.kind() == FaultKind.DEAD_ENVELOPE)).hasSize(6);
        assertThat(faults.all().stream().filter(f -> f.kind() == FaultKind.OPEN_HEATER)).hasSize(3);
        assertThat(faults.all().stream().filter(f -> f.kind() == FaultKind.LAMP_BURNT)).hasSize(2);
        // A dead nand pentode leaves its plate at B+: the output reads 1.
        Fault dead = faults.all().stream().filter(f -> f.kind() == FaultKind.DEAD_ENVELOPE).findFirst().orElseThrow();
        assertThat(dead.forces()).allMatch(Force::value);
        // An open heater darkens both tubes of its string.
        Fault open = faults.all().stream().filter(f -> f.kind() == FaultKind.OPEN_HEATER).findFirst().orElseThrow();
        assertThat(open.forces()).hasSize(2);
    }

    @Test
    void demoDeadFlipFlopHoldsBothOutputsHighAndTheRelayCanStayOpen() {
        Machine demo = Bench.demo();
        FaultList faults = FaultList.of(FaultCircuit.of(demo));
        assertThat(faults.all().stream().filter(f -> f.kind() == FaultKind.RELAY_OPEN)).hasSize(1);
        int acc = java.util.Arrays.asList(demo.netlist().netNames()).indexOf("acc");
        Fault deadAcc = faults.all().stream().filter(f -> f.kind() == FaultKind.DEAD_ENVELOPE)
                .filter(f -> f.forces().contains(new Force(acc, true))).findFirst().orElseThrow();
        // The accumulator's flip-flop has a free complement (used for STN and JMPCN): it goes high too.
        assertThat(deadAcc.forces()).hasSizeGreaterThanOrEqualTo(2).allMatch(Force::value);
        assertThat(faults.collapsed().size()).isLessThan(faults.all().size());
        assertThat(faults.stuckAtCollapsedCount()).isLessThan(faults.stuckAtCount());
    }
}
