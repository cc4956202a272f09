package org.thermion.sim.run;

import org.assertj.core.groups.Tuple;
import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.SimMachines;
import org.thermion.sim.OutputChange;
import org.thermion.sim.RunResult;
import org.thermion.sim.Simulator;
import org.thermion.sim.UnknownReport;
import org.thermion.sim.WatchRow;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.thermion.sim.SimMachines.word;

/** Program runs on the demo's logic and ISA with hand-encoded words (opcodes from its isa block). */
class ProgramRunsTest {
    static final Machine DEMO = SimMachines.demo();
    static final int LDN = 0x2, ST = 0x3, ADD = 0xC, JMP = 0xD;

    private static RunResult logic(long[] rom, InitMode init, List<String> watch, long cycles) {
        return ProgramRuns.logic(new Simulator(DEMO), rom, init, null, Watches.logic(DEMO, watch), cycles, null, "", "");
    }

    @Test
    void anOutputThatWasKnownAndTurnsUnknownIsReported() {
        // 0: LDN 6 (acc = 1; address 6 reads 0)   1: ST alarm   2: ADD 6 (acc = 1 ^ 0 ^ carry: X)
        // 3: ST alarm   4: JMP 4
        long[] rom = {word(LDN, 6), word(ST, 9), word(ADD, 6), word(ST, 9), word(JMP, 4)};
        RunResult r = logic(rom, new InitMode.Unknown(), List.of(), 50);
        assertThat(r.changes()).extracting(OutputChange::output, OutputChange::value, OutputChange::cycle)
                .startsWith(Tuple.tuple("alarm", "1", 1L), Tuple.tuple("alarm", "x", 3L));
        assertThat(r.unknowns()).extracting(UnknownReport::net, UnknownReport::what, UnknownReport::cycle)
                .contains(Tuple.tuple("alarm", "output becomes unknown", 3L));
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
        RunResult r = logic(rom, new InitMode.Zero(), List.of("acc", "line[3]"), 4);
        assertThat(r.watch()).extracting(WatchRow::pc).containsExactly(0, 1, 2, 0);
        // After LDN: acc 1, not a store. During ST: line[3] is up. JMP: neither changes acc.
        assertThat(r.watch()).extracting(WatchRow::values)
                .containsExactly(List.of("1", "0"), List.of("1", "1"), List.of("1", "0"), List.of("1", "0"));
        assertThat(r.stop()).isEqualTo("cycle limit of 4 reached");
    }

    @Test
    void aBusIsWatchedAsOneHexNumberAndThePcByItsName() {
        // The words run in order 0, 1, 2, then JMP 0: the PC after each cycle is the next address.
        long[] rom = {word(LDN, 6), word(ST, 9), word(JMP, 0)};
        RunResult r = logic(rom, new InitMode.Zero(), List.of("pc", "line"), 4);
        assertThat(r.watchNames()).containsExactly("pc", "line");
        // The demo's PC is 8 bits wide: two hex digits.
        assertThat(r.watch()).extracting(w -> w.values().get(0)).containsExactly("0x01", "0x02", "0x00", "0x01");
        // line is the 16-line decode bus: during ST (cycle 1) only line[3] is up, 0x0008.
        String line = r.watch().get(1).values().get(1);
        assertThat(line).isEqualTo("0x0008");
        // Each cycle has exactly one decode line up (one-hot): a power of two.
        for (WatchRow w : r.watch()) {
            assertThat(Integer.bitCount(Integer.parseInt(w.values().get(1).substring(2), 16))).isEqualTo(1);
        }
    }

    @Test
    void theIsaLevelRunsTheSameProgramWithTheSameOutputChanges() {
        long[] rom = {word(LDN, 6), word(ST, 9), word(JMP, 1)};
        RunResult logic = logic(rom, new InitMode.Zero(), List.of("acc"), 20);
        RunResult isa = ProgramRuns.isa(DEMO, rom, new InitMode.Zero(), null, Watches.isa(DEMO, List.of("acc", "pc")), 20);
        assertThat(isa.changes()).isEqualTo(logic.changes());
        assertThat(isa.watch()).extracting(w -> w.values().get(0))
                .containsExactlyElementsOf(logic.watch().stream().map(w -> w.values().get(0)).toList().subList(0,
                        isa.watch().size()));
        assertThat(isa.watch().get(0).values().get(1)).isEqualTo("0x01");
    }

    @Test
    void anUnknownWatchNameSuggestsTheNearestOne() {
        assertThatThrownBy(() -> Watches.logic(DEMO, List.of("acc_nxt"))).hasMessageContaining("did you mean 'acc_next'");
        assertThatThrownBy(() -> Watches.isa(DEMO, List.of("acx"))).hasMessageContaining("at the ISA level");
    }
}
