package org.thermion.sim;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.thermion.sim.Machines.word;

/** Program runs on the demo's logic with hand-encoded words (opcodes from its isa block). */
class LogicRunTest {
    static final Machine DEMO = Machines.demo();
    static final int LDN = 0x2, ST = 0x3, ADD = 0xC, JMP = 0xD;

    @Test
    void anOutputThatWasKnownAndTurnsUnknownIsReported() {
        // 0: LDN 6 (acc = 1; address 6 reads 0)   1: ST alarm   2: ADD 6 (acc = 1 ^ 0 ^ carry: X)
        // 3: ST alarm   4: JMP 4
        long[] rom = {word(LDN, 6), word(ST, 9), word(ADD, 6), word(ST, 9), word(JMP, 4)};
        RunResult r = new LogicRun(DEMO, rom, new InitMode.Unknown(), null, List.of(), List.of(), null)
                .run(50, "", "");
        assertThat(r.changes()).extracting(OutputChange::output, OutputChange::value, OutputChange::cycle)
                .startsWith(org.assertj.core.groups.Tuple.tuple("alarm", '1', 1L),
                        org.assertj.core.groups.Tuple.tuple("alarm", 'x', 3L));
        assertThat(r.unknowns()).extracting(UnknownReport::net, UnknownReport::what, UnknownReport::cycle)
                .contains(org.assertj.core.groups.Tuple.tuple("alarm", "output becomes unknown", 3L));
        // pump, sum and ready are never written: still unknown at the end.
        assertThat(r.unknowns()).filteredOn(u -> u.what().startsWith("output still unknown"))
                .extracting(UnknownReport::net).containsExactlyInAnyOrder("pump", "sum", "ready");
        // Cycle 4 loads JMP 4 into the instruction register, cycle 5 repeats it: a fixed point after 6 cycles.
        assertThat(r.cycles()).isEqualTo(6);
        assertThat(r.stop()).startsWith("fixed point at address 4");
        assertThat(r.initialOutputs()).isEqualTo("xxxx");
    }

    @Test
    void watchedNetsAreTabledAtTheEndOfEachCycleWithTheAddressRun() {
        long[] rom = {word(LDN, 6), word(ST, 9), word(JMP, 0)};
        int acc = Machines.net(DEMO, "acc");
        int st = Machines.net(DEMO, "line[3]");
        RunResult r = new LogicRun(DEMO, rom, new InitMode.Zero(), null, List.of("acc", "line[3]"), List.of(acc, st),
                null).run(4, "", "");
        assertThat(r.watch()).extracting(WatchRow::pc).containsExactly(0, 1, 2, 0);
        // After LDN: acc 1, not a store. During ST: line[3] is up. JMP: neither changes acc.
        assertThat(r.watch()).extracting(WatchRow::values).containsExactly("10", "11", "10", "10");
        assertThat(r.stop()).isEqualTo("cycle limit of 4 reached");
    }
}
