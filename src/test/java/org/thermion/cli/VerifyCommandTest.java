package org.thermion.cli;

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
                .contains("ANDN      0x1     line[1]  ok")
                .contains("every instruction does what the ISA says");
    }

    @Test
    void aFaultyMachineGivesTheGoldenCounterexampleAndExitOne() throws Exception {
        TimingCommandTest.Run r = run("verify", FAULTY.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.CHECK_FAILED);
        Path goldenFile = Path.of("src/test/resources/org/thermion/cli/verify-tiny-inverted.txt");
        if (Boolean.getBoolean("golden.update")) {
            Files.writeString(goldenFile, r.out().replace("\r\n", "\n"));
        }
        String golden = Files.readString(goldenFile);
        assertThat(r.out().replace("\r\n", "\n")).isEqualTo(golden);
    }

    @Test
    void csvAndJsonCarryTheCounterexample() {
        TimingCommandTest.Run csv = run("verify", FAULTY.toString(), "--format", "csv");
        assertThat(csv.out().lines().toList()).hasSize(2);
        assertThat(csv.out().lines().skip(1).findFirst().orElseThrow()).startsWith("ANDN,0x1,0x18,sel 0 (a),acc,wrong value,64,");
        TimingCommandTest.Run json = run("verify", FAULTY.toString(), "--format", "json");
        assertThat(json.out()).contains("\"passes\":false").contains("\"mnemonic\":\"ANDN\"").contains("\"trace\":[");
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
