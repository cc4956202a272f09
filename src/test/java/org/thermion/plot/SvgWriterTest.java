package org.thermion.plot;

import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class SvgWriterTest {
    @Test
    void aCurveReadsBackAsTheValuesItWasDrawnFrom() throws Exception {
        double[] t = {0, 0.5, 1, 1.5, 2, 2.5, 3};
        double[] amps = {0, 7.9, 6.2, 4.8, 3.9, 3.5, 3.4};
        Figure f = new Figure("a test", List.of(new Panel("rail heat", "time (s)", "current (A)",
                List.of(Series.line("heat current", t, amps)), List.of(new Marker("peak", 0.5, 7.9)))), "caution: a line");
        Map<String, SvgPoints.Curve> c = SvgPoints.read(SvgWriter.write(f));
        List<double[]> p = c.get("heat current").points();
        assertThat(p).hasSize(t.length);
        for (int i = 0; i < t.length; i++) {
            assertThat(p.get(i)[0]).isCloseTo(t[i], within(1e-4 * c.get("heat current").xRange()));
            assertThat(p.get(i)[1]).isCloseTo(amps[i], within(1e-4 * c.get("heat current").yRange()));
        }
    }

    @Test
    void axesLegendTitleAndFootnoteAreText() throws Exception {
        Figure f = new Figure("switch-on", List.of(new Panel("rail <b+> & bias", "time (s)", "current (A)",
                List.of(Series.line("b+ current", new double[] {0, 1}, new double[] {0, 1})))), "caution: mains can kill");
        String svg = SvgWriter.write(f);
        assertThat(SvgPoints.texts(svg, "x-title")).containsExactly("time (s)");
        assertThat(SvgPoints.texts(svg, "y-title")).containsExactly("current (A)");
        assertThat(SvgPoints.texts(svg, "legend")).containsExactly("b+ current");
        assertThat(SvgPoints.texts(svg, "panel-title")).containsExactly("rail <b+> & bias");
        assertThat(String.join(" ", SvgPoints.texts(svg, "footnote"))).isEqualTo("caution: mains can kill");
    }

    @Test
    void aGapSplitsTheCurveAndStepsHoldEachValue() throws Exception {
        double[] x = {0, 1, 2, 3};
        double[] y = {0, 5, Double.NaN, 2};
        String svg = SvgWriter.write(new Figure("w", List.of(new Panel("acc", "cycle", "value",
                List.of(new Series("acc", x, y, true)))), ""));
        assertThat(svg.split("class=\"series\"", -1)).hasSize(3); // two polylines
        List<double[]> p = SvgPoints.read(svg).get("acc").points();
        // (0,0) (1,0) (1,5) then, after the gap, (3,2)
        assertThat(p).hasSize(4);
        assertThat(p.get(1)[0]).isCloseTo(1, within(1e-3));
        assertThat(p.get(1)[1]).isCloseTo(0, within(1e-3));
        assertThat(p.get(2)[1]).isCloseTo(5, within(1e-3));
        assertThat(p.get(3)[0]).isCloseTo(3, within(1e-3));
    }

    @Test
    void ticksFallOnRoundValuesThatEncloseTheData() {
        Ticks t = Ticks.of(0.13, 9.7);
        assertThat(t.low()).isEqualTo(0.0);
        assertThat(t.high()).isEqualTo(10.0);
        assertThat(t.values()).contains(0.0, 2.0, 10.0);
        assertThat(Ticks.label(0.30000000000000004)).isEqualTo("0.3");
    }
}
