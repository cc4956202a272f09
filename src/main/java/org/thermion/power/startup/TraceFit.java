package org.thermion.power.startup;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;
import org.thermion.model.Machine;
import org.thermion.model.Rail;

import java.util.ArrayList;
import java.util.List;

/**
 * Fits the power-up model to a current measured on the bench at switch-on: every heater's
 * cold-to-hot resistance ratio, a factor on the heaters' warm-up (their thermal time constant),
 * the cathode sleeves' heat-capacity ratio (the second time constant), the rail's source
 * resistance and actual voltage, and the trace's time offset (switch-on in the trace's own time),
 * by Levenberg-Marquardt least squares on residuals relative to the measured current (a meter's
 * error grows with its reading). A figure the trace does not move (the cathodes, on a heater rail)
 * is held at its model value and said to be undetermined; the rest get their uncertainty from the
 * covariance at the optimum, scaled by the residual.
 */
public final class TraceFit {
    /** The figures in the order of the parameter vector. */
    public enum Figure {
        COLD_RATIO("cold_hot_ratio", "cold-to-hot resistance ratio", ""),
        WARMUP_SCALE("warmup_factor", "heater warm-up factor (thermal time constant)", "x"),
        CATHODE_RATIO("cathode_heat_ratio", "cathode-to-heater heat capacity ratio (second time constant)", ""),
        SOURCE("source_resistance", "rail source resistance", "ohm"),
        VOLTS("supply_voltage", "actual supply voltage", "V"),
        OFFSET("time_offset", "switch-on in the trace's time", "s");

        public final String key;
        public final String words;
        public final String unit;

        Figure(String key, String words, String unit) {
            this.key = key;
            this.words = words;
            this.unit = unit;
        }
    }

    /**
     * One fitted figure: its value (the model's, when not determined), one standard deviation, the
     * model's starting value, and whether the trace determines it (and if not, why).
     */
    public record Value(Figure figure, double value, double sigma, double start, boolean determined, String why) {
    }

    /** The fit: figures, residual, the fitted model's curve at the trace's times, warnings. */
    public record Result(String rail, List<Value> values, double rmsAmps, double rmsRelative, int points, int iterations,
                         ModelAdjustment adjustment, ThermalAssumptions assumptions, double[] t, double[] measured,
                         double[] fitted, List<String> warnings) {
        public Value value(Figure f) {
            return values.get(f.ordinal());
        }
    }

    /** Below this share of the largest column's norm a figure is taken as not moving the trace. */
    static final double UNSEEN = 1e-4;
    /** A relative uncertainty above this calls a figure poorly determined. */
    static final double POOR = 0.5;

    // Bounds of the parameter vector: ratio 1.5-30, warm-up x0.1-10, cathode ratio 0.1-20, source >= 0,
    // voltage 0.5-1.5 x declared, offset within the trace (set per trace).
    private static final double[] LOW = {Math.log(1.5), Math.log(0.1), Math.log(0.1), 0, 0.5, -1e9};
    private static final double[] HIGH = {Math.log(30), Math.log(10), Math.log(20), 1e6, 1.5, 1e9};

    private final Machine machine;
    private final ThermalAssumptions base;
    private final DrawMode mode;
    private final int rail;
    private final double[] t;
    private final double[] amps;
    private final double[] scale;
    private final double sourceRef;
    private final double[] start;
    private final java.util.concurrent.atomic.AtomicInteger runs = new java.util.concurrent.atomic.AtomicInteger();

    private TraceFit(Machine m, ThermalAssumptions a, DrawMode mode, int rail, double[] t, double[] amps) {
        this.machine = m;
        this.base = a;
        this.mode = mode;
        this.rail = rail;
        this.t = t.clone();
        this.amps = amps.clone();
        double max = 0;
        for (double v : amps) {
            max = Math.max(max, Math.abs(v));
        }
        if (!(max > 0)) {
            throw new IllegalArgumentException("the trace's current is zero throughout: nothing to fit");
        }
        scale = new double[amps.length];
        for (int i = 0; i < amps.length; i++) {
            scale[i] = Math.max(Math.abs(amps[i]), 0.05 * max);
        }
        Rail r = m.rails().get(rail);
        // The source resistance is fitted in units of a tenth of the rail's hot load (it may be declared 0).
        PowerUpResult first = StartupNetwork.of(m, a, mode).solve(PowerUpOptions.defaults().withSeconds(Math.max(1, t[t.length - 1] - t[0]))
                .withDrawMode(mode).withAssumptions(a).withSampleSeconds(0));
        double hot = first.rail(rail).finalAmps();
        sourceRef = hot > 0 ? 0.1 * Math.abs(r.volts()) / hot : 1;
        double edge = edge(t, amps, max);
        ThermalAssumptions st = a;
        start = new double[] {Math.log(TungstenResistivity.table().at(a.hotKelvin()) / TungstenResistivity.table().at(a.ambientKelvin())),
            0, Math.log(st.cathodeHeatRatio()), r.sourceOhms() / sourceRef, 1, edge};
        double declaredRatio = commonDeclaredRatio(m);
        if (!Double.isNaN(declaredRatio)) {
            start[0] = Math.log(declaredRatio);
        }
    }

    /**
     * Fits rail {@code rail} of {@code m} to the measured {@code amps} at times {@code t} (seconds,
     * increasing). Throws {@link IllegalArgumentException} when the trace cannot be fitted at all.
     */
    public static Result fit(Machine m, ThermalAssumptions a, DrawMode mode, int rail, double[] t, double[] amps) {
        return new TraceFit(m, a, mode, rail, t, amps).run();
    }

    private Result run() {
        int n = start.length;
        double[] f0 = model(start);
        RealMatrix j0 = jacobian(start, f0);
        double maxNorm = 0;
        double[] norms = new double[n];
        for (int k = 0; k < n; k++) {
            norms[k] = j0.getColumnVector(k).getNorm();
            maxNorm = Math.max(maxNorm, norms[k]);
        }
        boolean[] free = new boolean[n];
        List<Integer> idx = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            free[k] = norms[k] > UNSEEN * maxNorm;
            if (free[k]) {
                idx.add(k);
            }
        }
        double[] target = new double[amps.length];
        for (int i = 0; i < amps.length; i++) {
            target[i] = amps[i] / scale[i];
        }
        double[] p0 = idx.stream().mapToDouble(k -> start[k]).toArray();
        LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                .start(p0).target(target).maxEvaluations(400).maxIterations(200).lazyEvaluation(false)
                .parameterValidator(q -> {
                    double[] v = q.toArray();
                    for (int c = 0; c < v.length; c++) {
                        int k = idx.get(c);
                        v[c] = Math.min(HIGH[k], Math.max(LOW[k], v[c]));
                    }
                    return new ArrayRealVector(v, false);
                })
                .model(q -> {
                    double[] p = full(q.toArray(), idx);
                    double[] f = model(p);
                    RealMatrix jf = jacobian(p, f);
                    RealMatrix jr = new Array2DRowRealMatrix(f.length, idx.size());
                    for (int c = 0; c < idx.size(); c++) {
                        jr.setColumnVector(c, jf.getColumnVector(idx.get(c)));
                    }
                    return new Pair<RealVector, RealMatrix>(new ArrayRealVector(f, false), jr);
                }).build());
        double[] p = full(opt.getPoint().toArray(), idx);
        double[] fitted = model(p);
        for (int i = 0; i < fitted.length; i++) {
            fitted[i] *= scale[i];
        }
        double rss = 0, rssAmps = 0;
        for (int i = 0; i < amps.length; i++) {
            double d = fitted[i] - amps[i];
            rssAmps += d * d;
            rss += (d / scale[i]) * (d / scale[i]);
        }
        int dof = Math.max(1, amps.length - idx.size());
        double[] sig;
        try {
            RealMatrix cov = opt.getCovariances(1e-12).scalarMultiply(rss / dof);
            sig = new double[idx.size()];
            for (int c = 0; c < sig.length; c++) {
                sig[c] = Math.sqrt(Math.max(0, cov.getEntry(c, c)));
            }
        } catch (RuntimeException singular) {
            sig = new double[idx.size()];
            java.util.Arrays.fill(sig, Double.POSITIVE_INFINITY);
        }
        List<Value> values = new ArrayList<>();
        for (Figure f : Figure.values()) {
            int k = f.ordinal();
            int c = idx.indexOf(k);
            double v = natural(k, p[k]);
            double s0 = natural(k, start[k]);
            if (c < 0) {
                values.add(new Value(f, v, Double.NaN, s0, false, "the trace does not depend on it (held at the model's value)"));
                continue;
            }
            double sigma = sigmaNatural(k, p[k], sig[c]);
            if (f == Figure.OFFSET) {
                // Switch-on is a step: between two samples it cannot be placed closer than a uniform spread over the interval.
                sigma = Math.max(sigma, (t[t.length - 1] - t[0]) / (t.length - 1) / Math.sqrt(12));
            }
            boolean poor = f == Figure.OFFSET ? !(sigma < 0.1 * (t[t.length - 1] - t[0])) : !(sigma < POOR * Math.abs(v));
            values.add(new Value(f, v, sigma, s0, !poor, poor ? "the trace leaves it uncertain (one standard deviation is "
                    + "more than half its value)" : ""));
        }
        ModelAdjustment adj = adjustment(p);
        List<String> warnings = new ArrayList<>();
        double ratio = values.get(0).value();
        double lo = TungstenResistivity.table().at(1300) / TungstenResistivity.table().at(base.ambientKelvin());
        double hi = TungstenResistivity.table().at(1500) / TungstenResistivity.table().at(base.ambientKelvin());
        if (ratio < 0.75 * lo || ratio > 1.25 * hi) {
            warnings.add(String.format(java.util.Locale.ROOT, "the fitted cold-to-hot ratio %.3g lies far from what "
                    + "tungsten allows (%.2f to %.2f between %.0f K and a wire at 1300-1500 K, REFERENCES.md): check the "
                    + "trace's current scale, its time base, or heaters that are not tungsten", ratio, lo, hi, base.ambientKelvin()));
        }
        return new Result(machine.rails().get(rail).name(), List.copyOf(values), Math.sqrt(rssAmps / amps.length),
                Math.sqrt(rss / amps.length), amps.length, opt.getIterations(), adj,
                base.withCathodeHeatRatio(Math.exp(p[2])), t.clone(), amps.clone(), fitted, List.copyOf(warnings));
    }

    /** A parameter in its natural unit. */
    private double natural(int k, double p) {
        return switch (k) {
            case 0, 1, 2 -> Math.exp(p);
            case 3 -> Math.abs(p) * sourceRef;
            case 4 -> p * Math.abs(machine.rails().get(rail).volts());
            default -> p;
        };
    }

    private double sigmaNatural(int k, double p, double s) {
        return switch (k) {
            case 0, 1, 2 -> Math.exp(p) * s;
            case 3 -> s * sourceRef;
            case 4 -> s * Math.abs(machine.rails().get(rail).volts());
            default -> s;
        };
    }

    /** The whole parameter vector: the fitted entries from {@code q}, the rest held at the start. */
    private double[] full(double[] q, List<Integer> idx) {
        double[] p = start.clone();
        for (int c = 0; c < idx.size(); c++) {
            p[idx.get(c)] = q[c];
        }
        return p;
    }

    private ModelAdjustment adjustment(double[] p) {
        return new ModelAdjustment(Math.exp(p[0]), Math.exp(p[1]), rail, natural(4, p[4]), natural(3, p[3]));
    }

    /** The model's rail current at each trace time, over the scale: one transient run. */
    private double[] model(double[] p) {
        runs.incrementAndGet();
        ThermalAssumptions a = base.withCathodeHeatRatio(Math.exp(p[2]));
        double offset = p[5];
        double end = t[t.length - 1] - offset;
        double span = t[t.length - 1] - t[0];
        double[] f = new double[t.length];
        if (end > 0) {
            StartupNetwork net = StartupNetwork.of(machine, a, mode, adjustment(p));
            PowerUpResult r = net.solve(PowerUpOptions.defaults().withDrawMode(mode).withAssumptions(a)
                    .withSeconds(Math.max(PowerUpOptions.MIN_SECONDS, end * 1.001))
                    .withSampleSeconds(Math.max(1e-4, span / (4.0 * t.length))));
            RailTransient rt = r.rail(rail);
            double[] mt = rt.t(), ma = rt.amps();
            int j = 0;
            for (int i = 0; i < t.length; i++) {
                double x = t[i] - offset;
                if (x < 0) {
                    f[i] = 0;
                    continue;
                }
                while (j + 1 < mt.length && mt[j + 1] < x) {
                    j++;
                }
                f[i] = j + 1 < mt.length ? ma[j] + (ma[j + 1] - ma[j]) * (x - mt[j]) / (mt[j + 1] - mt[j]) : ma[mt.length - 1];
            }
        }
        for (int i = 0; i < f.length; i++) {
            f[i] /= scale[i];
        }
        return f;
    }

    /**
     * Forward differences, the offset's step one sampling interval wide; the six extra runs are
     * independent, so they share the cores.
     */
    private RealMatrix jacobian(double[] p, double[] f) {
        RealMatrix j = new Array2DRowRealMatrix(f.length, p.length);
        double dt = Math.max(1e-4, (t[t.length - 1] - t[0]) / (2.0 * t.length));
        double[][] cols = java.util.stream.IntStream.range(0, p.length).parallel().mapToObj(k -> {
            double h = k == 5 ? dt : 1e-3 * Math.max(1, Math.abs(p[k]));
            double[] q = p.clone();
            q[k] += h;
            double[] g = model(q);
            for (int i = 0; i < g.length; i++) {
                g[i] = (g[i] - f[i]) / h;
            }
            return g;
        }).toArray(double[][]::new);
        for (int k = 0; k < p.length; k++) {
            j.setColumn(k, cols[k]);
        }
        return j;
    }

    /** The trace's time when the current first reaches half its largest value: switch-on, to a first guess. */
    private static double edge(double[] t, double[] a, double max) {
        for (int i = 0; i < a.length; i++) {
            if (Math.abs(a[i]) >= 0.5 * max) {
                return i == 0 ? t[0] : t[i - 1];
            }
        }
        return t[0];
    }

    /** The cold-to-hot ratio every tube declares alike (NaN: none, or they differ). */
    private static double commonDeclaredRatio(Machine m) {
        double r = Double.NaN;
        for (org.thermion.model.TubeType tt : m.tubes()) {
            double d = tt.coldHotRatio();
            if (!Double.isNaN(d)) {
                if (!Double.isNaN(r) && r != d) {
                    return Double.NaN;
                }
                r = d;
            }
        }
        return r;
    }

    /** Transient runs so far (the fit's cost). */
    int runs() {
        return runs.get();
    }
}
