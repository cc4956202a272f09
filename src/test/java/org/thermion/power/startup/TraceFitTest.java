package org.thermion.power.startup;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.Machine;

import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Fitting the model to a measured switch-on trace. The traces are the model's own, made with
 * known figures and 2 % Gaussian noise from a seeded generator (the seed is in each message).
 */
class TraceFitTest {
    static final long SEED = 20261203L;

    /** Two strings of four 6AU6 on a 24 V rail declared with 3 ohm of source resistance, no soft start. */
    static Machine bench() {
        String text = StartupMachines.inverters(8, "1 ohm", "after 1 s", "100 A");
        int from = text.indexOf("softstart heat_soft");
        text = text.substring(0, from) + text.substring(text.indexOf("}", from) + 1);
        return StartupMachines.elaborate(text.replace("rail heat  { voltage 24 V; source 0.05 ohm;",
                "rail heat  { voltage 24 V; source 3 ohm;"));
    }

    /** The model's heat-rail current with {@code truth}, switched on at {@code offset}, sampled every 10 ms, with noise. */
    static double[][] trace(Machine m, ModelAdjustment truth, double offset, double noise, long seed) {
        int heat = m.railIndex("heat");
        PowerUpResult r = StartupNetwork.of(m, ThermalAssumptions.standard(), DrawMode.HIGHEST, truth)
                .solve(PowerUpOptions.defaults().withSeconds(12).withSampleSeconds(0.001));
        RailTransient rt = r.rail(heat);
        Random rnd = new Random(seed);
        int n = 1001;
        double[] t = new double[n], a = new double[n];
        int j = 0;
        for (int i = 0; i < n; i++) {
            t[i] = 0.01 * i;
            double x = t[i] - offset;
            double v = 0;
            if (x >= 0) {
                while (j + 1 < rt.t().length && rt.t()[j + 1] < x) {
                    j++;
                }
                double f = (x - rt.t()[j]) / (rt.t()[j + 1] - rt.t()[j]);
                v = rt.amps()[j] + f * (rt.amps()[j + 1] - rt.amps()[j]);
            }
            a[i] = v * (1 + noise * rnd.nextGaussian());
        }
        return new double[][] {t, a};
    }

    @Test
    @Timeout(300)
    void aNoisyTraceOfKnownFiguresFitsBackWithinFivePercent() {
        Machine m = bench();
        int heat = m.railIndex("heat");
        // Known figures away from the declared ones: ratio 6 (model 7.0), warm-up x1.3, 4 ohm (declared 3), 23 V (declared 24).
        ModelAdjustment truth = new ModelAdjustment(6.0, 1.3, heat, 23.0, 4.0);
        double[][] tr = trace(m, truth, 0.25, 0.02, SEED);
        TraceFit.Result f = TraceFit.fit(m, ThermalAssumptions.standard(), DrawMode.HIGHEST, heat, tr[0], tr[1]);
        String seed = "seed " + SEED;
        assertThat(f.value(TraceFit.Figure.COLD_RATIO).value()).as(seed).isCloseTo(6.0, within(0.05 * 6.0));
        assertThat(f.value(TraceFit.Figure.WARMUP_SCALE).value()).as(seed).isCloseTo(1.3, within(0.05 * 1.3));
        assertThat(f.value(TraceFit.Figure.SOURCE).value()).as(seed).isCloseTo(4.0, within(0.05 * 4.0));
        assertThat(f.value(TraceFit.Figure.VOLTS).value()).as(seed).isCloseTo(23.0, within(0.05 * 23.0));
        assertThat(f.value(TraceFit.Figure.OFFSET).value()).as(seed).isCloseTo(0.25, within(0.02));
        // 2 % noise: the relative residual is about 0.02.
        assertThat(f.rmsRelative()).as(seed).isBetween(0.015, 0.03);
        // Each uncertainty is honest: the known value lies within three standard deviations.
        double[] known = {6.0, 1.3, Double.NaN, 4.0, 23.0, 0.25};
        for (TraceFit.Figure fig : TraceFit.Figure.values()) {
            TraceFit.Value v = f.value(fig);
            if (fig != TraceFit.Figure.CATHODE_RATIO) {
                assertThat(v.determined()).as(fig + " " + seed).isTrue();
                assertThat(v.sigma()).as(fig + " " + seed).isPositive().isLessThan(0.15 * Math.max(v.value(), 0.1));
                assertThat(Math.abs(v.value() - known[fig.ordinal()])).as(fig + " " + seed).isLessThan(3 * v.sigma());
            }
        }
        // The heat rail carries heaters only: its current says nothing of the cathodes.
        assertThat(f.value(TraceFit.Figure.CATHODE_RATIO).determined()).isFalse();
        assertThat(f.warnings()).isEmpty();
    }

    @Test
    @Timeout(300)
    void aRatioFarFromTungstensIsWarnedOf() {
        Machine m = bench();
        int heat = m.railIndex("heat");
        double[][] tr = trace(m, new ModelAdjustment(3.0, 1.0, heat, 24.0, 3.0), 0.1, 0.02, SEED + 1);
        TraceFit.Result f = TraceFit.fit(m, ThermalAssumptions.standard(), DrawMode.HIGHEST, heat, tr[0], tr[1]);
        assertThat(f.value(TraceFit.Figure.COLD_RATIO).value()).isCloseTo(3.0, within(0.3));
        // Tungsten between room temperature and a 1300-1500 K wire: about 6.5 to 7.6 (REFERENCES.md table).
        assertThat(f.warnings()).singleElement().asString().contains("far from what tungsten allows");
    }
}
