package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.thermion.plot.SvgPoints;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Every picture ({@code --svg FILE}) read back and compared, point by point, with the CSV of the same run. */
class PlotFilesTest {
    static final String PUMP = "examples/pumpstation/pumpstation.machine";
    static final String BOARD = "examples/decoder-board/decoder-board.machine";
    /** The decoder board without its soft start, for sizing one. */
    static final String BARE_BOARD = "src/test/resources/org/thermion/power/decoder-board-bare.machine";

    @Test
    @Timeout(120)
    void powerUpCurvesMatchTheTimeSeries(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("series.csv"), svg = dir.resolve("curves.svg");
        ReportChecks.Result r = ReportChecks.run("powerup", PUMP, "--time", "5s", "--no-plot", "--csv", csv.toString(),
                "--svg", svg.toString());
        assertThat(r.err()).isEmpty();
        List<String[]> rows = records(Files.readString(csv));
        List<String> head = List.of(rows.get(0));
        Map<String, SvgPoints.Curve> curves = SvgPoints.read(Files.readString(svg));
        for (String rail : List.of("bplus", "heat", "relay")) {
            SvgPoints.Curve c = curves.get(rail + " current");
            assertThat(c).as(rail).isNotNull();
            int col = head.indexOf(rail + "_amps");
            assertThat(c.points()).hasSize(rows.size() - 1);
            for (int i = 1; i < rows.size(); i++) {
                double[] p = c.points().get(i - 1);
                assertThat(p[0]).isCloseTo(Double.parseDouble(rows.get(i)[0]), within(1e-4 * c.xRange()));
                assertThat(p[1]).isCloseTo(Double.parseDouble(rows.get(i)[col]), within(1e-4 * c.yRange()));
            }
        }
        assertThat(String.join(" ", SvgPoints.texts(Files.readString(svg), "footnote"))).startsWith("caution:");
    }

    @Test
    @Timeout(120)
    void sizingCurvesMatchTheSizingTable(@TempDir Path dir) throws Exception {
        Path svg = dir.resolve("sizing.svg");
        ReportChecks.Result r = ReportChecks.run("powerup", BARE_BOARD, "--sweep", "0.2ohm..1ohm:0.2ohm", "--bypass", "2s..8s:2s",
                "--time", "10s", "--format", "csv", "--svg", svg.toString());
        assertThat(r.err()).isEmpty();
        Map<String, SvgPoints.Curve> curves = SvgPoints.read(Files.readString(svg));
        int checked = 0;
        for (String[] row : records(r.out())) {
            if (!row[0].equals("cells")) {
                continue;
            }
            // cells,resistor_ohms,bypass_seconds,switch_on_peak_amps,bypass_peak_amps,larger_peak_amps,...
            double ohms = Double.parseDouble(row[1]), secs = Double.parseDouble(row[2]), larger = Double.parseDouble(row[5]);
            SvgPoints.Curve c = curves.get("bypass at " + PowerUpArgs.fmt(secs) + " s");
            assertThat(c).isNotNull();
            double[] p = c.points().stream().filter(q -> Math.abs(q[0] - ohms) < 1e-4 * c.xRange()).findFirst().orElseThrow();
            assertThat(p[1]).isCloseTo(larger, within(1e-4 * c.yRange()));
            checked++;
        }
        assertThat(checked).isEqualTo(20);
    }

    @Test
    @Timeout(120)
    void watchedNetsMatchTheRunsWatchTable(@TempDir Path dir) throws Exception {
        Path svg = dir.resolve("watch.svg");
        ReportChecks.Result r = ReportChecks.run("run", PUMP, "programs/pump.asm", "--inputs", "programs/pump-day.csv",
                "--cycles", "400", "--watch", "acc,pump,pc", "--format", "csv", "--svg", svg.toString());
        assertThat(r.err()).isEmpty();
        Map<String, SvgPoints.Curve> curves = SvgPoints.read(Files.readString(svg));
        Map<String, List<double[]>> expected = new java.util.HashMap<>();
        for (String[] row : records(r.out())) {
            if (row[0].equals("watch")) {
                // watch,cycle,pc,net,value
                expected.computeIfAbsent(row[3], k -> new ArrayList<>())
                        .add(new double[] {Double.parseDouble(row[1]), RunFigures.value(row[4])});
            }
        }
        assertThat(expected.keySet()).containsExactlyInAnyOrder("acc", "pump", "pc");
        for (Map.Entry<String, List<double[]>> e : expected.entrySet()) {
            List<double[]> drawn = curves.get(e.getKey()).points();
            // A step curve draws (x_i, y_i-1) before each (x_i, y_i): the values are the even vertices.
            assertThat(drawn).hasSize(2 * e.getValue().size() - 1);
            for (int i = 0; i < e.getValue().size(); i++) {
                double[] want = e.getValue().get(i), got = drawn.get(2 * i);
                assertThat(got[0]).as(e.getKey()).isCloseTo(want[0], within(1e-3 * Math.max(1, curves.get(e.getKey()).xRange())));
                assertThat(got[1]).as(e.getKey()).isCloseTo(want[1], within(1e-3 * Math.max(1, curves.get(e.getKey()).yRange())));
            }
        }
    }

    @Test
    void svgWantsWatchedNets(@TempDir Path dir) {
        ReportChecks.Result r = ReportChecks.run("run", PUMP, "programs/pump.asm", "--cycles", "5", "--svg",
                dir.resolve("w.svg").toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--svg draws the watched nets");
        assertThat(dir.resolve("w.svg")).doesNotExist();
    }

    @Test
    void aPictureNeverOverwritesAnInput(@TempDir Path dir) throws Exception {
        Path copy = dir.resolve("m.machine");
        Files.copy(Path.of(PUMP), copy);
        String before = Files.readString(copy);
        ReportChecks.Result r = ReportChecks.run("powerup", copy.toString(), "--time", "1s", "--svg", copy.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readString(copy)).isEqualTo(before);
    }

    /** RFC 4180 records without quoted fields (what these CSVs hold). */
    private static List<String[]> records(String text) {
        List<String[]> out = new ArrayList<>();
        for (String line : text.split("\r?\n")) {
            if (!line.isEmpty()) {
                out.add(line.split(",", -1));
            }
        }
        return out;
    }
}
