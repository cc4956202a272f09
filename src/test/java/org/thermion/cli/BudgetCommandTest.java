package org.thermion.cli;

import org.junit.jupiter.api.Test;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.thermion.testing.Golden;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The budget command end to end, on small machines kept beside the golden files. */
class BudgetCommandTest {
    static final Path GOLDEN = Path.of("src/test/resources/org/thermion/cli/budget");
    static final String DIR = GOLDEN.toString();
    static final String TINY = DIR + "/tiny.machine";
    static final String TINY_ASM = DIR + "/tiny.asm";
    static final String TINY_INPUTS = DIR + "/tiny-inputs.csv";
    static final String LONE = DIR + "/lone-thyratron.machine";

    record Result(int code, String out, String err) {
    }

    static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out, true)).setErr(new PrintWriter(err, true)).execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    @Test
    void staticReportOfAPassingMachine() throws Exception {
        Result r = run("budget", TINY);
        assertThat(r.err()).isEmpty();
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        Golden.assertMatches(GOLDEN.resolve("tiny-static.txt"), r.out());
    }

    @Test
    void simulatedReportWithProgramAndInputs() throws Exception {
        Result r = run("budget", TINY, "--program", TINY_ASM, "--inputs", TINY_INPUTS, "--cycles", "16");
        assertThat(r.err()).isEmpty();
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        Golden.assertMatches(GOLDEN.resolve("tiny-run.txt"), r.out());
    }

    @Test
    void aLoneThyratronAndAnOverloadedRailFailTheCheck() throws Exception {
        Result r = run("budget", LONE);
        assertThat(r.code()).isEqualTo(ExitCodes.CHECK_FAILED);
        Golden.assertMatches(GOLDEN.resolve("lone-thyratron.txt"), r.out());
        // the caution closes the text report
        assertThat(r.out().replaceAll("\\s+", " ").strip()).endsWith(BudgetReport.CAUTION);
    }

    @Test
    void jsonFollowsItsSchemaStaticAndSimulated() throws Exception {
        for (String[] args : List.of(new String[] {"budget", TINY, "--format", "json"},
                new String[] {"budget", LONE, "--format", "json"},
                new String[] {"budget", TINY, "--format", "json", "--program", TINY_ASM, "--inputs", TINY_INPUTS, "--cycles", "16"})) {
            Result r = run(args);
            Map<?, ?> top = (Map<?, ?>) ReportChecks.parse(r.out());
            ReportChecks.assertJson(r.out());
            assertThat(top.get("caution")).isEqualTo(BudgetReport.CAUTION);
            boolean simulated = top.get("simulation") != null;
            assertThat(top.get("simulated")).isEqualTo(simulated);
            Map<?, ?> tables = (Map<?, ?>) top.get("tables");
            for (Object row : (List<?>) tables.get("rails")) {
                assertThat(((Map<?, ?>) row).containsKey("peak_amps")).isEqualTo(simulated);
            }
            assertThat(top.get("check")).isEqualTo(r.code() == ExitCodes.CHECK_FAILED ? "failed" : "ok");
        }
    }

    @Test
    void jsonCarriesTheSameFiguresAsTheText() {
        Map<?, ?> top = (Map<?, ?>) ReportChecks.parse(run("budget", LONE, "--format", "json").out());
        Map<?, ?> tables = (Map<?, ?>) top.get("tables");
        Map<?, ?> bplus = ((List<?>) tables.get("supply")).stream().map(x -> (Map<?, ?>) x)
                .filter(x -> x.get("rail").equals("bplus")).findFirst().orElseThrow();
        // two lamp drivers at 25 mA, four inverters at 2.4 mA (typed-in draws, counted-stages.machine): 59.6 mA at 48 V,
        // and the soft start's thyratron (library, computed) at its highest: its grid divider, 100 k + 100 k from
        // B+ to -24 V, carries 72 V / 200 k (Ohm's law). A conductance; through the 4 ohm source the rail sits
        // at 48 / (1 + 4 x load / 48 V) (Ohm's law)
        double load = 0.0596 + 72 / 200e3;
        double volts = 48 / (1 + 4 * load / 48);
        assertThat(((Number) bplus.get("peak_amps")).doubleValue()).isCloseTo(load * volts / 48, within(1e-6));
        assertThat(bplus.get("status")).isEqualTo("OVER");
        List<?> findings = (List<?>) tables.get("findings");
        // the heater string and the rail are errors
        assertThat(findings.stream().map(x -> (Map<?, ?>) x).filter(x -> x.get("severity").equals("error"))).hasSize(2);
        Map<?, ?> heat = ((List<?>) tables.get("supply")).stream().map(x -> (Map<?, ?>) x)
                .filter(x -> x.get("rail").equals("heat")).findFirst().orElseThrow();
        double heatVolts = ((Number) heat.get("at_peak_volts")).doubleValue();
        Map<?, ?> lone = ((List<?>) tables.get("heater_strings")).stream().map(x -> (Map<?, ?>) x)
                .filter(x -> x.get("heaters").equals("2D21")).findFirst().orElseThrow();
        // the dropper takes what the loaded rail leaves over the 2D21's 6.3 V at its 0.6 A
        assertThat(((Number) lone.get("suggested_dropper_ohms")).doubleValue())
                .isCloseTo((heatVolts - 6.3) / 0.6, within(1e-4));
        assertThat(((Number) lone.get("suggested_dropper_watts")).doubleValue())
                .isCloseTo((heatVolts - 6.3) * 0.6, within(1e-4));
    }

    /**
     * Hand count for tiny.asm (LD a; ST lamp; JMP loop) with a = 1 from cycle 4 to 9. Typed-in draws
     * (counted-stages.machine) on bplus: counted_flipflop 3.2 mA always (six: ir[4], acc, lamp), counted_and
     * 1.0 mA while its output is low, counted_or 0.6 mA while high, counted_lamp 25 mA while high. The instruction register loads at the
     * end of phase 1, so phase 1 still decodes the previous word. Cycle 10 phase 1: ir = LD a, acc = 1,
     * lamp = 1 (stored at cycle 7), a = 0: the ANDs st, jump, (sel==0 & a), (sel==1 & lamp) and wl are
     * low, ld is high, src is low: 19.2 + 5 x 1.0 + 25 = 49.2 mA, above 47.8 (cycle 8.1), 48.8 (8.2, 9.1,
     * 9.2). At the end (cycle 15 phase 2, LD a with a = 0, lamp off): 19.2 + 5 x 1.0 = 24.2 mA.
     */
    @Test
    void simulatedCurrentsMatchAHandCount() {
        Map<?, ?> top = (Map<?, ?>) ReportChecks.parse(run("budget", TINY, "--format", "json", "--program", TINY_ASM,
                "--inputs", TINY_INPUTS, "--cycles", "16").out());
        Map<?, ?> bplus = ((List<?>) ((Map<?, ?>) top.get("tables")).get("rails")).stream().map(x -> (Map<?, ?>) x)
                .filter(x -> x.get("rail").equals("bplus")).findFirst().orElseThrow();
        assertThat(((Number) bplus.get("peak_amps")).doubleValue()).isCloseTo(0.0492, within(1e-12));
        assertThat(bplus.get("peak_cycle")).isEqualTo(10L);
        assertThat(bplus.get("peak_phase")).isEqualTo(1L);
        assertThat(((Number) bplus.get("now_amps")).doubleValue()).isCloseTo(0.0242, within(1e-12));
        // lowest and highest: all six ANDs high and the OR low, or the reverse, with the lamp off or on
        assertThat(((Number) bplus.get("lowest_amps")).doubleValue()).isCloseTo(0.0192, within(1e-12));
        assertThat(((Number) bplus.get("highest_amps")).doubleValue()).isCloseTo(0.0192 + 0.006 + 0.0006 + 0.025, within(1e-12));
    }

    /**
     * A machine without a ROM runs on its stimulus alone. lone-thyratron.machine: two 6AU6 inverters
     * na = !a, nb = !b, two more ya = !na, yb = !nb (counted_inverter: 2.4 mA conducting, 0.05 mA cut off)
     * and two lamp drivers on a and b (counted_lamp: 25 mA lit). The soft start's thyratron (the library's,
     * solved from its circuit) draws on bplus through its grid network: its 100 k + 100 k divider to the bias
     * rail carries (48 V + 24 V) / 200 k from a B+ input (Ohm's law). a = b = 0: 2 x 0.05 + 2 x 2.4 = 4.9 mA;
     * a = b = 1 from cycle 2: 2 x 2.4 + 2 x 0.05 + 2 x 25 = 54.9 mA, over the 40 mA limit.
     */
    @Test
    void aStimulusAloneDrivesAMachineWithoutRom() throws Exception {
        Path stim = Files.createTempFile("stim", ".csv");
        try {
            Files.writeString(stim, "cycle,a,b\n0,0,0\n2,1,1\n");
            Result r = run("budget", LONE, "--inputs", stim.toString(), "--cycles", "4", "--format", "json");
            assertThat(r.code()).isEqualTo(ExitCodes.CHECK_FAILED);
            Map<?, ?> tables = (Map<?, ?>) ((Map<?, ?>) ReportChecks.parse(r.out())).get("tables");
            Map<?, ?> bplus = ((List<?>) tables.get("rails")).stream().map(x -> (Map<?, ?>) x)
                    .filter(x -> x.get("rail").equals("bplus")).findFirst().orElseThrow();
            // the thyratron is not simulated (a soft start's): a run takes it at its highest, 72 V / 200 k
            double thyratron = 72 / 200e3;
            assertThat(((Number) bplus.get("min_amps")).doubleValue()).isCloseTo(0.0049 + thyratron, within(1e-7));
            assertThat(((Number) bplus.get("peak_amps")).doubleValue()).isCloseTo(0.0549 + thyratron, within(1e-7));
            assertThat(((Number) bplus.get("mean_amps")).doubleValue()).isCloseTo(0.0049 + thyratron + 0.025, within(1e-7)); // JSON keeps 5 digits;
            assertThat(bplus.get("peak_cycle")).isEqualTo(2L);
            assertThat(bplus.get("peak_phase")).isEqualTo(1L);
            Map<?, ?> supply = ((List<?>) tables.get("supply")).stream().map(x -> (Map<?, ?>) x)
                    .filter(x -> x.get("rail").equals("bplus")).findFirst().orElseThrow();
            assertThat(supply.get("basis")).isEqualTo("simulation");
            assertThat(supply.get("status")).isEqualTo("OVER");
        } finally {
            Files.delete(stim);
        }
    }

    @Test
    void csvRecordsAllHaveTheSameFieldCount() {
        Result r = run("budget", TINY, "--format", "csv", "--program", TINY_ASM, "--cycles", "8");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("\r\n");
        List<List<String>> records = ReportChecks.assertCsv(r.out());
        int width = records.get(0).size();
        assertThat(records).allSatisfy(rec -> assertThat(rec).hasSize(width));
        assertThat(records).anySatisfy(rec -> assertThat(rec.subList(0, 3)).containsExactly("report", "caution", BudgetReport.CAUTION));
        List<String> header = records.stream().filter(x -> x.get(0).equals("table") && x.get(1).equals("rail")
                && x.get(2).equals("nominal_volts") && x.get(3).equals("lowest_amps")).findFirst().orElseThrow();
        List<String> bplus = records.stream().filter(x -> x.get(0).equals("rails") && x.get(1).equals("bplus"))
                .findFirst().orElseThrow();
        int peak = header.indexOf("peak_amps");
        assertThat(peak).isPositive();
        assertThat(Double.parseDouble(bplus.get(peak))).isPositive();
    }

    @Test
    void aBadStimulusIsBadInputWithItsPlace() throws Exception {
        // the stimulus reader (sim package) words the message; the command shows it with file:line:col and a caret
        Path bad = Files.createTempFile("stim", ".csv");
        try {
            Files.writeString(bad, "cycle,a,flood\n0,1,0\n");
            Result r = run("budget", TINY, "--program", TINY_ASM, "--inputs", bad.toString());
            assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(r.out()).isEmpty();
            assertThat(r.err()).startsWith(bad + ":1:9: error: ").contains("'flood'")
                    .contains("\n  cycle,a,flood\n          ^~~~~\n");
        } finally {
            Files.delete(bad);
        }
    }

    @Test
    void usageProblemsAreBadInput() {
        assertThat(run("budget", TINY, "--cycles", "0", "--program", TINY_ASM).code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("budget", TINY, "--init", "sideways", "--program", TINY_ASM).code()).isEqualTo(ExitCodes.BAD_INPUT);
        Result r = run("budget", TINY, "--inputs", TINY_INPUTS);
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--inputs needs --program");
        assertThat(run("budget", DIR + "/no-such.machine").code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("budget", TINY, "--format", "yaml").code()).isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void helpDescribesTheOptions() {
        Result r = run("budget", "--help");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("--program").contains("--inputs").contains("--cycles").contains("--format");
    }
}
