package org.thermion.cli;

import org.junit.jupiter.api.Test;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

class TimingCommandTest {
    static final Path RC = Path.of("src/test/resources/org/thermion/cli/timing-rc.machine");

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out, true)).setErr(new PrintWriter(err, true)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void textReportMatchesTheGoldenFile() throws Exception {
        // Golden values checked by hand: g1 rise = ln 9 x 10 k x 17 pF = 374 ns, g2 fall = ln 9 x 2 k x 5.5 pF
        // = 24.2 ns, period = 2 x (398 ns + 4 us set-up) = 8.80 us.
        Run r = run("timing", RC.toString(), "--stages");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        Path goldenFile = Path.of("src/test/resources/org/thermion/cli/timing-rc.txt");
        if (Boolean.getBoolean("golden.update")) {
            Files.writeString(goldenFile, r.out().replace("\r\n", "\n"));
        }
        String golden = Files.readString(goldenFile);
        assertThat(r.out().replace("\r\n", "\n")).isEqualTo(golden);
    }

    @Test
    void aTooShortPeriodFailsWithExitOne() {
        Run r = run("timing", RC.toString(), "--period", "8.7us");
        assertThat(r.code()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(r.out()).contains("FAILS").contains("a path does not settle in time");
        assertThat(run("timing", RC.toString(), "--period", "8.9 us").code()).isEqualTo(ExitCodes.OK);
    }

    @Test
    void aPeriodWithoutUnitIsBadInput() {
        Run r = run("timing", RC.toString(), "--period", "50");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--period '50' is not a time");
    }

    @Test
    void csvAndJsonCarryThePath() {
        Run csv = run("timing", RC.toString(), "--format", "csv");
        assertThat(csv.out().lines().findFirst().orElseThrow()).startsWith("phase,launch_phase,span,endpoint");
        assertThat(csv.out().lines().count()).isEqualTo(4); // header + x, g1, g2
        Run json = run("timing", RC.toString(), "--format", "json");
        assertThat(json.out()).startsWith("{\"machine\":\"rc\"").contains("\"net\":\"g2\"").contains("\"passes\":true");
    }

    @Test
    void romAccessTimeDelaysTheRomDataPath() {
        // The RC machine has no ROM: the option changes nothing there. The demo's phase-1 path
        // starts at the ROM data, so its arrival is the access time given.
        Run r = run("timing", "examples/pumpstation/pumpstation.machine", "--rom-access", "5us", "--format", "csv");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out().lines().filter(l -> l.startsWith("1,2,1,latch ir[")).findFirst().orElseThrow())
                .contains(",rom,").contains(",0.000005,");
        assertThat(run("timing", RC.toString(), "--rom-access", "soon").code()).isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void theDemoMachineMeetsItsClock() {
        Run r = run("timing", "examples/pumpstation/pumpstation.machine");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("highest safe clock rate");
    }
}
