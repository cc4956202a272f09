package org.thermion.power.startup;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class CurrentPlotTest {
    /** A soft-start shape: decaying from 9 A, a jump to 14 A at 10 s, settling to 6.4 A. */
    private static double[][] shape() {
        int n = 301;
        double[] t = new double[n + 1];
        double[] a = new double[n + 1];
        int k = 0;
        for (int i = 0; i < n; i++) {
            double x = i * 0.1;
            if (Math.abs(x - 10) < 1e-9) {
                t[k] = 10;
                a[k++] = 9 - 3 * (1 - Math.exp(-1));
            }
            t[k] = x;
            a[k++] = x < 10 ? 9 - 3 * (1 - Math.exp(-x / 10)) : 6.4 + 7.6 * Math.exp(-(x - 10) / 1.5);
        }
        return new double[][] {t, a};
    }

    @Test
    void fillsExactlyTheAskedSize() {
        double[][] s = shape();
        List<String> lines = CurrentPlot.render(s[0], s[1], 70, 18, "heat");
        assertThat(lines).hasSize(18);
        assertThat(lines).allSatisfy(l -> assertThat(l.length()).isLessThanOrEqualTo(70));
        assertThat(lines.get(0)).isEqualTo("heat");
    }

    @Test
    void axesCarryRoundTicksAndUnits() {
        double[][] s = shape();
        List<String> lines = CurrentPlot.render(s[0], s[1], 70, 18, "heat", List.of(new CurrentPlot.Marker(10, "bypass 10 s")),
                Double.NaN, CurrentPlot.Style.ASCII);
        String axis = lines.get(lines.size() - 3);
        String labels = lines.get(lines.size() - 2);
        assertThat(axis).startsWith(" 0 +").endsWith(" s");
        assertThat(labels.trim()).startsWith("0").endsWith("30");
        assertThat(labels).contains(" 10 ", " 20 ");
        assertThat(lines.get(1)).startsWith("15 +");   // 14 A peak rounds up to a 15 A top tick
        assertThat(lines.get(lines.size() - 1)).contains("^ bypass 10 s");
        assertThat(axis).contains("^");
    }

    @Test
    void theSpikeAtBypassStandsTallerThanItsNeighbours() {
        double[][] s = shape();
        List<String> lines = CurrentPlot.render(s[0], s[1], 70, 18, "heat", List.of(), Double.NaN, CurrentPlot.Style.ASCII);
        int spikeCol = lines.get(5).indexOf('#');
        assertThat(spikeCol).isPositive();
        // Row 5 of 14 plot rows sits near 10 A: only the columns just after 10 s reach it.
        assertThat(lines.get(5).chars().filter(c -> c == '#').count()).isLessThan(8);
    }

    @Test
    void smallCurrentsReadInMilliamperes() {
        List<String> lines = CurrentPlot.render(new double[] {0, 1, 2}, new double[] {0, 0.12, 0.2}, 50, 10, "b+");
        assertThat(String.join("\n", lines)).contains("200 ┤");
    }

    @Test
    void matchesTheGoldenPicture() throws IOException {
        double[][] s = shape();
        List<String> lines = CurrentPlot.render(s[0], s[1], 72, 16, "rail heat: current against time",
                List.of(new CurrentPlot.Marker(10, "bypass 10.0 s")), 16, CurrentPlot.Style.BLOCKS);
        String golden;
        try (InputStream in = getClass().getResourceAsStream("plot-golden.txt")) {
            golden = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        assertThat(String.join("\n", lines) + "\n").isEqualTo(golden);
    }
}
