package org.thermion.cli;

import org.thermion.testing.Golden;
import tools.jackson.databind.JsonNode;
import java.util.List;
import org.junit.jupiter.api.Test;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.thermion.cli.TimingCommandTest.run;

class VerifyCommandTest {
    static final Path TINY = Path.of("src/test/resources/org/thermion/verify/tiny.machine");
    static final Path FAULTY = Path.of("src/test/resources/org/thermion/cli/tiny-inverted.machine");

    @Test
    void aCorrectMachinePassesWithExitZero() {
        TimingCommandTest.Run r = run("verify", TINY.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("896 cases checked, every one of the plan")
                .containsPattern("\n  ANDN +1 +line\\[1\\] +yes")
                .contains("every instruction does what the ISA says");
    }

    @Test
    void aFaultyMachineGivesTheGoldenCounterexampleAndExitOne() throws Exception {
        TimingCommandTest.Run r = run("verify", FAULTY.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.CHECK_FAILED);
        Golden.assertMatches(Path.of("src/test/resources/org/thermion/cli/verify-tiny-inverted.txt"), r.out());
    }

    @Test
    void csvAndJsonCarryTheCounterexample() {
        TimingCommandTest.Run csv = run("verify", FAULTY.toString(), "--format", "csv");
        List<List<String>> rows = ReportChecks.assertCsv(csv.out()).stream().filter(x -> x.get(0).equals("counterexamples")).toList();
        assertThat(rows).hasSize(1);
        // opcode 0x1 and word 0x18 of the text, as numbers
        assertThat(rows.get(0).subList(1, 9)).containsExactly("1", "ANDN", "1", "24", "sel 0 (a)", "acc", "wrong value", "64");
        JsonNode json = ReportChecks.assertJson(run("verify", FAULTY.toString(), "--format", "json").out());
        assertThat(json.path("passes").asBoolean(true)).isFalse();
        assertThat(json.path("tables").path("counterexamples").path(0).path("mnemonic").asString()).isEqualTo("ANDN");
        assertThat(json.path("tables").path("counterexample_trace").size()).isPositive();
    }

    @Test
    void faultSeedingReportsTheCatchRate() {
        TimingCommandTest.Run r = run("verify", TINY.toString(), "--mutate", "6", "--seed", "4");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("fault seeding (seed 4): 6 mutants").contains("catch rate:");
    }

    @Test
    void aMachineWithoutAnIsaIsBadInput() {
        TimingCommandTest.Run r = run("verify", "src/test/resources/org/thermion/cli/timing-rc.machine");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("has no isa block");
    }

    @Test
    void aDecodeNameThatMatchesNothingIsNoted() {
        TimingCommandTest.Run r = run("verify", TINY.toString(), "--decode", "dl");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("no decode lines named 'dl[k]' found");
    }
}
