package org.thermion.cli;

import org.thermion.testing.Golden;
import tools.jackson.databind.JsonNode;
import java.util.List;

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
        Golden.assertMatches(Path.of("src/test/resources/org/thermion/cli/timing-rc.txt"), r.out());
    }

    @Test
    void aDeclaredGainFarFromTheComputedOneIsWarnedAndMarked(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        // The pump station with its flip-flops made by a stage of its own: the library's circuit plus a
        // declared gain of 8, which the operating points put near 12.6 (StageDriveTest checks that
        // figure against A = mu R / (rp + R)): more than 25 % apart, so the report warns.
        Path demo = Path.of("examples/pumpstation");
        Files.copy(demo.resolve("decoder.machine"), dir.resolve("decoder.machine"));
        String text = Files.readString(demo.resolve("pumpstation.machine"))
                .replace("  latch triode_flipflop\n", "  latch my_flipflop\n")
                .replace("realize {", "stage my_flipflop : latch {\n  tube 12AU7\n  sections 2\n  fanin 1\n"
                        + "  load 100 k from bplus\n  grid divider 470 k 560 k to bias\n  setup 2 us\n  gain 8\n}\n\nrealize {");
        Path machine = dir.resolve("pumpstation.machine");
        Files.writeString(machine, text);
        Run r = run("timing", machine.toString(), "--format", "csv");
        List<String> row = ReportChecks.assertCsv(r.out()).stream()
                .filter(x -> x.get(0).equals("stage_figures") && x.get(1).equals("my_flipflop")).findFirst().orElseThrow();
        double gain = Double.parseDouble(row.get(6));
        assertThat(row.get(7)).isEqualTo("computed");
        assertThat(row.get(8)).isEqualTo("8");
        assertThat(Math.abs(8 - gain) / gain).isGreaterThan(0.25);
        assertThat(run("timing", machine.toString()).out())
                .containsPattern("warning: stage my_flipflop: declared gain 8.00 is -[0-9]+ % from the computed [0-9.]+");
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
    void aPeriodOrAccessTimeTooLargeToMeanAnythingIsBadInput() {
        // 1e400 s reads as infinity: before, timing ran with it and printed "shortest safe period Infinity s".
        Run r = run("timing", RC.toString(), "--rom-access", "1e400s");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--rom-access '1e400s' is out of range: at most 3600 s");
        Run p = run("timing", RC.toString(), "--period", "7200s");
        assertThat(p.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(p.err()).contains("--period '7200s' is out of range");
    }

    @Test
    void csvAndJsonCarryThePath() {
        Run csv = run("timing", RC.toString(), "--format", "csv");
        List<List<String>> records = ReportChecks.assertCsv(csv.out());
        assertThat(records).anySatisfy(r -> assertThat(r.subList(0, 5))
                .containsExactly("table", "phase", "launch_phase", "span", "endpoint"));
        assertThat(records.stream().filter(r -> r.get(0).equals("paths")).map(r -> r.get(8)))
                .containsExactly("x", "g1", "g2");
        JsonNode json = ReportChecks.assertJson(run("timing", RC.toString(), "--format", "json").out());
        assertThat(json.path("machine").asString()).isEqualTo("rc");
        assertThat(json.path("passes").asBoolean()).isTrue();
        assertThat(json.path("tables").path("paths").findValuesAsString("net")).containsExactly("x", "g1", "g2");
    }

    @Test
    void romAccessTimeDelaysTheRomDataPath() {
        // The RC machine has no ROM: the option changes nothing there. The demo's phase-1 path
        // starts at the ROM data, so its arrival is the access time given.
        Run r = run("timing", "examples/pumpstation/pumpstation.machine", "--rom-access", "5us", "--format", "csv");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("report,rom_access_seconds,0.000005");
        List<String> phase1 = ReportChecks.assertCsv(r.out()).stream().filter(x -> x.get(0).equals("phases")
                && x.get(1).equals("1")).findFirst().orElseThrow();
        assertThat(phase1.get(4)).startsWith("latch ir[");
        assertThat(phase1.get(6)).isEqualTo("0.000005"); // arrival: the ROM access time
        assertThat(ReportChecks.assertCsv(r.out())).anySatisfy(x -> assertThat(x.subList(0, 4))
                .containsExactly("paths", "1", "0", "rom"));
        assertThat(run("timing", RC.toString(), "--rom-access", "soon").code()).isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void theDemoMachineMeetsItsClockAtBothCornersAndHoldsItsSamePhaseLoop() {
        Run r = run("timing", "examples/pumpstation/pumpstation.machine", "--format", "csv");
        List<List<String>> rows = ReportChecks.assertCsv(r.out());
        assertThat(rows.stream().filter(x -> x.get(0).equals("phases")))
                .allSatisfy(x -> assertThat(List.of(x.get(9), x.get(12))).containsOnly("ok"));
        // acc (phase 2) is steered through diode gates by other phase-2 flip-flops (carry, acc
        // itself). A change of carry can reach acc_next through a diode AND and a diode OR; the AND
        // falls fast but rises through its 330 k pull-up, the OR the other way round, so every route
        // has one slow edge and arrives after acc's own conducting half has taken over.
        List<String> hold = rows.stream().filter(x -> x.subList(0, 4).equals(List.of("checks", "hold", "2",
                "latch acc"))).findFirst().orElseThrow();
        assertThat(Double.parseDouble(hold.get(4))).isGreaterThan(Double.parseDouble(hold.get(5)));
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        // No access time given: the report says so instead of silently counting 0.
        Run text = run("timing", "examples/pumpstation/pumpstation.machine");
        assertThat(text.out()).contains("warning: no ROM access time given").contains("highest safe clock rate");
    }
}
