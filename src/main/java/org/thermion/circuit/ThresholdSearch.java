package org.thermion.circuit;

import java.util.List;

import org.thermion.model.Rail;

/**
 * Finds a receiver's thresholds near known ones, a few solves each instead of a whole sweep:
 * the unity-gain points by the secant method on the curve's slope (a central difference), the
 * midpoint on the output itself; where the secant fails, bisection in a bracket found near the
 * start. A tolerance corner moves a threshold by a fraction of a volt,
 * so the nominal thresholds are the starting points for every corner. Returns null when the
 * search leaves the neighbourhood or a point has no solution (the caller then sweeps).
 */
final class ThresholdSearch {
    /** Half the step of the slope's central difference (volts). */
    private static final double H = 0.02;
    /** How far a threshold may move from its start before the search gives up (volts). */
    private static final double REACH = 3;
    private static final int ITERATIONS = 8;
    private static final double DONE = 1e-3;
    /** The step of the scan for a bracket when the secant method fails (volts). */
    private static final double SCAN = 0.25;

    private final StageSolver solver;
    private final StageCircuit stage;
    private final Corner corner;
    private final double[] in;
    private final double lo;
    private final double hi;

    private ThresholdSearch(StageSolver solver, StageCircuit stage, Corner corner) {
        this.solver = solver;
        this.stage = stage;
        this.corner = corner;
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (Rail r : solver.rails().rails().values()) {
            low = Math.min(low, r.volts());
            high = Math.max(high, r.volts());
        }
        lo = low;
        hi = high;
        boolean[] others = TransferCurve.sensitizing(stage);
        in = new double[stage.inputs()];
        for (int i = 1; i < in.length; i++) {
            in[i] = others[i] ? hi : lo;
        }
        in[0] = lo;
    }

    /** The thresholds of {@code stage} at {@code corner}, searched from {@code start}; null when lost. */
    static Thresholds near(StageSolver solver, StageCircuit stage, Corner corner, Thresholds start) {
        ThresholdSearch s = new ThresholdSearch(solver, stage, corner);
        if (start.method() == Thresholds.Method.UNITY_GAIN) {
            double vil = s.root(start.vil(), true, 1);
            double vih = s.root(start.vih(), true, -1);
            return Double.isNaN(vil) || Double.isNaN(vih) || !(vih > vil) ? null
                    : new Thresholds(vil, vih, Thresholds.Method.UNITY_GAIN);
        }
        double m = s.root(start.vil(), false, 0);
        return Double.isNaN(m) ? null : new Thresholds(m, m, Thresholds.Method.MIDPOINT);
    }

    /**
     * Where the steepness is 1 ({@code unity}) or the output halfway between its ends, near {@code x0};
     * {@code sense} +1 where the steepness rises through 1 (V_IL), -1 where it falls through it (V_IH),
     * 0 for the midpoint. The secant method first; where it fails (V_IH often sits at the kink where
     * the next grid starts to draw current, and the slope jumps there), bisection in the nearest
     * bracket of the right sense.
     */
    private double root(double x0, boolean unity, int sense) {
        double half = Double.NaN;
        if (!unity) {
            half = 0.5 * (out(lo) + out(hi));
        }
        double secant = secant(x0, unity, half);
        return Double.isNaN(secant) ? bracketed(x0, unity, half, sense) : secant;
    }

    /** Bisection in the bracket nearest {@code x0} (scanned in {@value #SCAN} V steps up to the reach). */
    private double bracketed(double x0, boolean unity, double half, int sense) {
        java.util.Map<Integer, Double> seen = new java.util.HashMap<>();
        java.util.function.IntToDoubleFunction at = k -> seen.computeIfAbsent(k, j -> g(x0 + j * SCAN, unity, half));
        int rings = (int) Math.round(REACH / SCAN);
        for (int r = 1; r <= rings; r++) {
            for (int left : new int[] {-r, r - 1}) {
                double a = at.applyAsDouble(left);
                double b = at.applyAsDouble(left + 1);
                if (Double.isNaN(a) || Double.isNaN(b) || !(a * b <= 0) || a == b
                        || (sense > 0 && !(a < b)) || (sense < 0 && !(a > b))) {
                    continue;
                }
                double xa = x0 + left * SCAN;
                double xb = xa + SCAN;
                while (xb - xa > DONE) {
                    double xm = 0.5 * (xa + xb);
                    double m = g(xm, unity, half);
                    if (Double.isNaN(m)) {
                        return Double.NaN;
                    }
                    if ((m <= 0) == (a <= 0)) {
                        xa = xm;
                        a = m;
                    } else {
                        xb = xm;
                    }
                }
                return 0.5 * (xa + xb);
            }
        }
        return Double.NaN;
    }

    private double secant(double x0, boolean unity, double half) {
        double a = x0;
        double b = x0 + 0.1;
        double fa = g(a, unity, half);
        double fb = g(b, unity, half);
        for (int it = 0; it < ITERATIONS; it++) {
            if (Double.isNaN(fa) || Double.isNaN(fb) || fa == fb) {
                return Double.NaN;
            }
            double c = b - fb * (b - a) / (fb - fa);
            if (!(Math.abs(c - x0) <= REACH)) {
                return Double.NaN;
            }
            if (Math.abs(c - b) < DONE) {
                return c;
            }
            a = b;
            fa = fb;
            b = c;
            fb = g(b, unity, half);
        }
        return Double.NaN;
    }

    private double g(double x, boolean unity, double half) {
        if (!unity) {
            return out(x) - half;
        }
        double slope = (out(x + H) - out(x - H)) / (2 * H);
        return (stage.inverting() ? -slope : slope) - 1;
    }

    private double out(double x) {
        double[] v = in.clone();
        v[0] = x;
        DcResult r = solver.solveAs(StageSolver.RECEIVER, stage, v, false, List.of(), corner);
        return r.solved() ? r.point().outputVolts() : Double.NaN;
    }

}
