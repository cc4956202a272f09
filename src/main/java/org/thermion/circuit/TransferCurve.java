package org.thermion.circuit;

import java.util.List;

import org.thermion.model.Rail;

/**
 * Sweeps one input of a receiving stage across the rails (the other inputs held where the
 * swept one decides the output, at the extreme rails) and reads its thresholds off the curve.
 * The stage is solved unloaded, as role "receiver", so its parts share tolerance labels with
 * the grid networks it puts on its driver. Each point starts from the one before (receivers
 * have one solution per input level).
 */
public final class TransferCurve {
    /** Points of the sweep (the thresholds are interpolated between them). */
    static final int POINTS = 241;

    private TransferCurve() {
    }

    /** The thresholds of {@code stage} at {@code corner}; null when some point has no DC solution. */
    public static Thresholds thresholds(StageSolver solver, StageCircuit stage, Corner corner) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Rail r : solver.rails().rails().values()) {
            lo = Math.min(lo, r.volts());
            hi = Math.max(hi, r.volts());
        }
        boolean[] others = sensitizing(stage);
        double[] x = new double[POINTS];
        double[] y = new double[POINTS];
        double[] in = new double[stage.inputs()];
        for (int i = 1; i < in.length; i++) {
            in[i] = others[i] ? hi : lo;
        }
        OperatingPoint last = null;
        for (int k = 0; k < POINTS; k++) {
            x[k] = lo + (hi - lo) * k / (POINTS - 1);
            in[0] = x[k];
            DcResult r = solver.solveNear(StageSolver.RECEIVER, stage, in.clone(), false, List.of(), corner, last);
            if (!r.solved()) {
                return null;
            }
            last = r.point();
            y[k] = last.outputVolts();
        }
        return read(x, y, stage.inverting());
    }

    /** Thresholds from a sampled curve (x rising). */
    static Thresholds read(double[] x, double[] y, boolean inverting) {
        double target = inverting ? -1 : 1;
        double first = Double.NaN;
        double last = Double.NaN;
        double prevSlope = Double.NaN;
        double prevMid = Double.NaN;
        for (int k = 0; k + 1 < x.length; k++) {
            double slope = (y[k + 1] - y[k]) / (x[k + 1] - x[k]);
            double mid = 0.5 * (x[k] + x[k + 1]);
            double steep = inverting ? -slope : slope;
            double prevSteep = inverting ? -prevSlope : prevSlope;
            if (k > 0) {
                if (prevSteep < 1 && steep >= 1 && Double.isNaN(first)) {
                    first = prevMid + (mid - prevMid) * (1 - prevSteep) / (steep - prevSteep);
                }
                if (prevSteep >= 1 && steep < 1) {
                    last = prevMid + (mid - prevMid) * (prevSteep - 1) / (prevSteep - steep);
                }
            }
            prevSlope = slope;
            prevMid = mid;
        }
        if (!Double.isNaN(first) && !Double.isNaN(last) && last > first) {
            return new Thresholds(first, last, Thresholds.Method.UNITY_GAIN);
        }
        double ymin = Double.POSITIVE_INFINITY;
        double ymax = Double.NEGATIVE_INFINITY;
        for (double v : y) {
            ymin = Math.min(ymin, v);
            ymax = Math.max(ymax, v);
        }
        double half = 0.5 * (ymin + ymax);
        for (int k = 0; k + 1 < x.length; k++) {
            if ((y[k] - half) * (y[k + 1] - half) <= 0 && y[k] != y[k + 1]) {
                double m = x[k] + (x[k + 1] - x[k]) * (half - y[k]) / (y[k + 1] - y[k]);
                return new Thresholds(m, m, Thresholds.Method.MIDPOINT);
            }
        }
        return new Thresholds(x[0], x[0], Thresholds.Method.MIDPOINT);
    }

    /** Values of the other inputs under which input 0 decides the output. */
    static boolean[] sensitizing(StageCircuit stage) {
        int n = stage.inputs();
        for (int mask = 0; mask < (1 << Math.max(0, n - 1)); mask++) {
            boolean[] a = new boolean[n];
            for (int i = 1; i < n; i++) {
                a[i] = (mask >> (i - 1) & 1) != 0;
            }
            boolean[] b = a.clone();
            b[0] = true;
            if (stage.logic(a, false) != stage.logic(b, false)) {
                return a;
            }
        }
        return new boolean[n];
    }
}
