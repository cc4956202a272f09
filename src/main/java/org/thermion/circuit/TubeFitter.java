package org.thermion.circuit;

import java.util.List;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;

/**
 * Fits Koren parameters to published points by Levenberg–Marquardt (Hipparchus), minimising
 * the points' relative errors. Parameters are fitted as logarithms so they stay positive; the
 * ones not named free keep their starting values (a few points cannot fix all of them).
 */
public final class TubeFitter {
    /** Parameter names of a triode, in vector order. */
    public static final List<String> TRIODE = List.of("mu", "ex", "kg1", "kp", "kvb");
    /** Parameter names of a pentode, in vector order. */
    public static final List<String> PENTODE = List.of("mu", "ex", "kg1", "kg2", "kp", "kvb");

    private TubeFitter() {
    }

    /** Fits the {@code free} parameters of {@code start} to {@code points}. */
    public static FittedModel<KorenTriode> fitTriode(KorenTriode start, List<String> free, List<FitPoint> points) {
        double[] all = {start.mu(), start.ex(), start.kg1(), start.kp(), start.kvb()};
        Fit r = fit(all, index(TRIODE, free), TRIODE, points,
                p -> start.with(p[0], p[1], p[2], p[3], p[4], start.source()));
        double[] p = r.params;
        KorenTriode m = start.with(p[0], p[1], p[2], p[3], p[4], start.source());
        return new FittedModel<>(m, points, rms(m, points), r.iterations);
    }

    /** Fits the {@code free} parameters of {@code start} to {@code points}. */
    public static FittedModel<KorenPentode> fitPentode(KorenPentode start, List<String> free, List<FitPoint> points) {
        double[] all = {start.mu(), start.ex(), start.kg1(), start.kg2(), start.kp(), start.kvb()};
        Fit r = fit(all, index(PENTODE, free), PENTODE, points,
                p -> start.with(p[0], p[1], p[2], p[3], p[4], p[5], start.source()));
        double[] p = r.params;
        KorenPentode m = start.with(p[0], p[1], p[2], p[3], p[4], p[5], start.source());
        return new FittedModel<>(m, points, rms(m, points), r.iterations);
    }

    /** Root mean square of the points' relative errors under {@code model}. */
    public static double rms(TubeModel model, List<FitPoint> points) {
        double s = 0;
        for (FitPoint p : points) {
            double e = p.relativeError(model);
            s += e * e;
        }
        return Math.sqrt(s / points.size());
    }

    private interface Maker {
        TubeModel make(double[] params);
    }

    private record Fit(double[] params, int iterations) {
    }

    private static int[] index(List<String> names, List<String> free) {
        int[] idx = new int[free.size()];
        for (int i = 0; i < idx.length; i++) {
            idx[i] = names.indexOf(free.get(i));
            if (idx[i] < 0) {
                throw new IllegalArgumentException("no parameter " + free.get(i) + " among " + names);
            }
        }
        return idx;
    }

    /**
     * The fit; an {@link IllegalArgumentException} saying why when it does not converge or a
     * parameter runs away to zero or infinity (points that no curve of the law passes through).
     */
    private static Fit fit(double[] all, int[] free, List<String> names, List<FitPoint> points, Maker maker) {
        double[] start = new double[free.length];
        for (int i = 0; i < free.length; i++) {
            start[i] = Math.log(all[free[i]]);
        }
        LeastSquaresOptimizer.Optimum opt;
        try {
            opt = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .start(start)
                    .target(new double[points.size()])
                    .maxEvaluations(10_000)
                    .maxIterations(1_000)
                    .model(x -> valueAndJacobian(x, all, free, points, maker))
                    .build());
        } catch (org.hipparchus.exception.MathIllegalStateException e) {
            throw new IllegalArgumentException("the fit to its points did not converge (" + e.getMessage() + ")");
        }
        double[] p = params(opt.getPoint().toArray(), all, free);
        for (int i : free) {
            if (!(p[i] > Double.MIN_NORMAL) || !(p[i] < 1e12)) {
                throw new IllegalArgumentException("the fit to its points ran away: " + names.get(i) + " went to "
                        + (p[i] >= 1e12 ? "infinity" : "zero") + ", so no curve of the law passes near the points");
            }
        }
        return new Fit(p, opt.getIterations());
    }

    private static double[] params(double[] logs, double[] all, int[] free) {
        double[] p = all.clone();
        for (int i = 0; i < free.length; i++) {
            p[free[i]] = Math.exp(logs[i]);
        }
        return p;
    }

    private static double[] residuals(double[] logs, double[] all, int[] free, List<FitPoint> points, Maker maker) {
        TubeModel m;
        try {
            m = maker.make(params(logs, all, free));
        } catch (IllegalArgumentException e) {
            double[] big = new double[points.size()];
            java.util.Arrays.fill(big, 1e6);
            return big;
        }
        double[] r = new double[points.size()];
        for (int i = 0; i < r.length; i++) {
            double e = points.get(i).relativeError(m);
            r[i] = Double.isFinite(e) ? e : 1e6;
        }
        return r;
    }

    private static Pair<RealVector, org.hipparchus.linear.RealMatrix> valueAndJacobian(
            RealVector x, double[] all, int[] free, List<FitPoint> points, Maker maker) {
        double[] logs = x.toArray();
        double[] r0 = residuals(logs, all, free, points, maker);
        double[][] j = new double[r0.length][logs.length];
        double h = 1e-6;
        for (int c = 0; c < logs.length; c++) {
            double[] y = logs.clone();
            y[c] += h;
            double[] r1 = residuals(y, all, free, points, maker);
            for (int r = 0; r < r0.length; r++) {
                j[r][c] = (r1[r] - r0[r]) / h;
            }
        }
        return new Pair<>(new ArrayRealVector(r0, false), new Array2DRowRealMatrix(j, false));
    }
}
