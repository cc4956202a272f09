package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.thermion.testing.Golden;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

@Timeout(value = 60, unit = TimeUnit.SECONDS)
class PowerUpCommandTest {
    private static final Path DEMO = Path.of("examples", "pumpstation", "pumpstation.machine");

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter(), err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out, true)).setErr(new PrintWriter(err, true)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    /** 88 6AU6 inverters, heaters four to a string on 24 V behind a soft start bypassed after 10 s (our own scenario). */
    private Path inverters() throws IOException {
        StringBuilder chain = new StringBuilder();
        String text = """
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage 24 V; source 0.05 ohm; limit 40 A }
                heaters on heat { series 4 of 6AU6 across machine }
                softstart heat_soft on heat {
                  resistor 5 ohm rated 150 W
                  bypass after 10 s
                }
                realize { not pentode_inverter }
                module chain {
                  in a
                  out y
                  net n[87]
                  n[0] = !a
                  for k in 1..86 { n[k] = !n[k - 1] }
                  y = !n[86]
                }
                machine inverters {
                  clock { phases 1; period 100 us }
                  top chain
                  inputs a
                  outputs y
                }
                """;
        Path p = dir.resolve("inverters.machine");
        Files.writeString(p, text + chain);
        return p;
    }

    @Test
    void reportsEveryPartOfTheDemoWhichStartsCleanly() {
        Run r = run("powerup", DEMO.toString());
        // The demo's 0.3 ohm, 200 W resistor (chosen with --sweep) is bypassed when its thyratron fires.
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("rails (", "soft start heater_soft on heat", "heaters:", "relay driver: 2D21",
                "rail heat: current against time", "thyratron fired at", "within its rating", "caution:");
    }

    @Test
    void aTooSmallResistorDrivesTheHeaterSupplyIntoItsLimit() {
        // 0.1 ohm leaves the cold inrush (tens of amperes into heaters at a seventh of their hot
        // resistance) above the heater supply's 40 A limit: exit 1.
        Run r = run("powerup", DEMO.toString(), "--resistor", "0.1ohm", "--no-plot");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(r.out()).contains("LIMIT");
    }

    @Test
    void writesAnRfc4180TimeSeries() throws IOException {
        Path csv = dir.resolve("heat.csv");
        Run r = run("powerup", inverters().toString(), "--csv", csv.toString(), "--no-plot", "--time", "12s");
        // Bypassed at 10 s; the bypass peak (27 A: 22 strings of four 6AU6, hot 21 ohm each, still at about a
        // quarter of it) stays under the 40 A limit, and the 5 ohm resistor's mean (under 24^2 / 5 = 115 W)
        // is within its 150 W rating; no relay driver to check: every check passes.
        assertThat(r.code()).as(r.err() + r.out()).isEqualTo(ExitCodes.OK);
        String text = Files.readString(csv);
        String[] lines = text.split("\r\n", -1);
        assertThat(lines[0]).isEqualTo("time_seconds,bplus_amps,bias_amps,heat_amps,bplus_volts,bias_volts,heat_volts,"
                + "heater_1_kelvin,heater_2_kelvin,heater_3_kelvin,heater_4_kelvin");
        // the bias rail's load voltage keeps its declared sign, as in the JSON
        assertThat(lines[1].split(",")[5]).startsWith("-");
        assertThat(lines[1]).startsWith("0,");
        assertThat(text).doesNotContain("\n\n").endsWith("\r\n");
        int columns = lines[0].split(",").length;
        for (int i = 1; i < lines.length - 1; i++) {
            assertThat(lines[i].split(",")).hasSize(columns);
        }
        assertThat(lines.length).isGreaterThan(1000);
        assertThat(dir.toFile().list()).containsExactlyInAnyOrder("inverters.machine", "heat.csv");
    }

    @Test
    void neverWritesOverTheMachineFile() throws IOException {
        Path m = inverters();
        String before = Files.readString(m);
        Run r = run("powerup", m.toString(), "--csv", m.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("refusing to write");
        assertThat(Files.readString(m)).isEqualTo(before);
    }

    @Test
    void jsonSummaryCarriesPeaksAndTheCaution() throws IOException {
        Run r = run("powerup", inverters().toString(), "--format", "json");
        tools.jackson.databind.JsonNode top = ReportChecks.assertJson(r.out());
        assertThat(top.path("tables").path("soft_starts").path(0).path("bypass_seconds").asDouble()).isEqualTo(10.01);
        assertThat(top.path("tables").path("rails").findValuesAsString("rail")).containsExactly("bplus", "bias", "heat");
        assertThat(top.path("caution").asString()).isEqualTo(PowerUpReport.CAUTION);
        assertThat(r.out()).doesNotContain("NaN", "Infinity");
    }

    @Test
    void sweepRecommendsTheBalancingResistor() throws IOException {
        Run r = run("powerup", inverters().toString(), "--sweep", "1ohm..3ohm:0.25ohm");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("best", "recommended: 1.75 ohm");
    }

    @Test
    void resistorOverrideTakesUnitsInEitherSpelling() throws IOException {
        Path m = inverters();
        Run a = run("powerup", m.toString(), "--resistor", "2ohm", "--no-plot");
        Run b = run("powerup", m.toString(), "--resistor", "2 ohm", "--no-plot");
        assertThat(a.out()).contains("soft start heat_soft on heat: 2.00 ohm");
        assertThat(a.out()).isEqualTo(b.out());
    }

    @Test
    void aResistorWithoutUnitIsRefused() throws IOException {
        Run r = run("powerup", inverters().toString(), "--resistor", "2");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        Golden.assertMatches(Path.of("src/test/resources/org/thermion/cli/powerup-no-unit.txt"), r.err());
    }

    @Test
    void aBadMachineShowsWhereAndExitsTwo() throws IOException {
        Path bad = dir.resolve("bad.machine");
        Files.writeString(bad, "rail heat { voltage 24 V; source 0.05 ohm; limit 40 X }\n");
        Run r = run("powerup", bad.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("bad.machine:1:").doesNotContain("Exception");
    }

    @Test
    void extremeTimesAndResistorsAreRefusedInWords() throws IOException {
        Path m = inverters();
        for (String[] args : new String[][] {
                {"--time", "1e-300s"}, {"--time", "1e-9s"}, {"--time", "NaNs"}, {"--time", "2h"},
                {"--resistor", "1e400ohm"}, {"--resistor", "1e300ohm"}, {"--resistor", "NaNohm"},
                {"--sweep", "0ohm..1e300ohm:1e299ohm"}}) {
            Run r = run("powerup", m.toString(), args[0], args[1], "--no-plot");
            assertThat(r.code()).as(String.join(" ", args)).isEqualTo(2);
            assertThat(r.err()).as(String.join(" ", args)).startsWith("error: ").doesNotContain("Exception")
                    .doesNotContain("internal error");
        }
    }

    @Test
    void anInfiniteResistorInTheDescriptionIsNamedNotAnInternalError() throws IOException {
        // Whatever the reader lets through, the power-up model names the part it cannot solve.
        Path m = inverters();
        Files.writeString(m, Files.readString(m).replace("resistor 5 ohm", "resistor 1e400 ohm"));
        Run r = run("powerup", m.toString(), "--no-plot");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("error: ").contains("resistor").doesNotContain("internal error");
    }

    @Test
    void aHeaterRailOfAbsurdVoltageIsReportedAtTheHeater() throws IOException {
        Path m = inverters();
        Files.writeString(m, Files.readString(m).replace("voltage 24 V; source 0.05 ohm", "voltage 1e300 V; source 0.05 ohm").replace("limit 40 A", "limit 1e300 A"));
        Run r = run("powerup", m.toString(), "--no-plot");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("error: ").doesNotContain("internal error").containsAnyOf("heater of 6AU6", "rail heat");
    }

    @Test
    void aSweepOnAMachineWithoutASoftStartSizesOne() throws IOException {
        Path m = inverters();
        String text = Files.readString(m);
        int from = text.indexOf("softstart heat_soft");
        Files.writeString(m, text.substring(0, from) + text.substring(text.indexOf("}", from) + 1));
        Run r = run("powerup", m.toString(), "--sweep", "heat=1ohm..3ohm:0.5ohm", "--bypass", "4s..12s:4s");
        assertThat(r.err()).isEmpty();
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("sizing a soft start for rail heat").contains("balance: ").contains("*")
                .contains("preferred value");
        // Five resistors by three bypass times: grid rows hold a resistor and three peaks.
        assertThat(r.out().lines().filter(l -> l.matches("  \\d[.\\d]*( +\\d+\\.\\d\\d[*!]?){3}")).count()).isEqualTo(5);
        Run bad = run("powerup", m.toString(), "--sweep", "1ohm..3ohm:0.5ohm", "--bypass", "4s..2s:1s");
        assertThat(bad.code()).isEqualTo(2);
        assertThat(bad.err()).startsWith("error: --bypass");
    }

    @Test
    @org.junit.jupiter.api.Timeout(300)
    void aPredictionRunsOnTheFiguresABenchTraceFitted(@org.junit.jupiter.api.io.TempDir Path dir) throws IOException {
        // The demo trace was made at 12.2 V and 0.03 ohm (the machine declares 12.6 V and 0.02 ohm).
        Path svg = dir.resolve("fit.svg");
        Run fit = run("powerup", "examples/pumpstation/pumpstation.machine", "--fit", "examples/pumpstation/heat-trace.csv",
                "--format", "csv", "--svg", svg.toString());
        assertThat(fit.err()).isEmpty();
        assertThat(fit.code()).isZero();
        assertThat(fit.out()).contains("figures,supply_voltage,").contains("figures,cathode_heat_ratio,2.25,,2.25,ratio,not determined");
        assertThat(Files.readString(svg)).contains("data-name=\"measured\"").contains("data-name=\"fitted model\"");
        Run declared = run("powerup", "examples/pumpstation/pumpstation.machine", "--time", "15s", "--format", "csv");
        Run calibrated = run("powerup", "examples/pumpstation/pumpstation.machine", "--time", "15s", "--format", "csv",
                "--calibrate", "examples/pumpstation/heat-trace.csv");
        assertThat(calibrated.err()).isEmpty();
        // A lower supply voltage behind more source resistance: the heat rail ends the run drawing less.
        assertThat(steady(calibrated.out(), "heat")).isLessThan(steady(declared.out(), "heat"));
        Run both = run("powerup", "examples/pumpstation/pumpstation.machine", "--fit", "a.csv", "--calibrate", "b.csv");
        assertThat(both.code()).isEqualTo(2);
    }

    /** The current at the end of the run of {@code rail} from the rails table of powerup's CSV. */
    private static double steady(String csv, String rail) {
        String[] head = null;
        for (String line : csv.split("\r?\n")) {
            String[] f = line.split(",", -1);
            if (f[0].equals("table") && f.length > 1 && f[1].equals("rail")) {
                head = f;
            } else if (head != null && f[0].equals("rails") && f[1].equals(rail)) {
                return Double.parseDouble(f[java.util.Arrays.asList(head).indexOf("end_amps")]);
            }
        }
        throw new AssertionError("no rails row for " + rail + " in\n" + csv);
    }
}
