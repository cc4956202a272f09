package org.thermion.circuit;

/**
 * Newton's method on the free node voltages (Kirchhoff's current law at every free node),
 * with a finite-difference Jacobian, a step limit and a backtracking line search; when that
 * fails, conductance stepping (a shunt from every free node to ground, lowered a decade at a
 * time to none, each solve starting from the last), then source stepping (the fixed voltages
 * raised from zero in steps). The Jacobian is sparse ({@link NodalJacobian}): a stage with its
 * loads' chains runs to a few hundred nodes, nearly a tree.
 */
final class DcSolver {
    /** Converged when every free node's current sum is below this (amperes). */
    static final double TOLERANCE_AMPS = 1e-12;
    private static final int MAX_ITERATIONS = 200;
    /** Largest step a node takes in one iteration, at least; circuits spanning more volts take a 50th of their span. */
    private static final double MAX_STEP_VOLTS = 20;

    /** The node voltages, or null with {@link #failure} set and the change that would cure it. */
    record Solution(double[] volts, int iterations, String failure, String fix) {
        Solution(double[] volts, int iterations) {
            this(volts, iterations, null, null);
        }
    }

    private DcSolver() {
    }

    static Solution solve(Circuit c) {
        int floating = c.floatingNode();
        if (floating >= 0) {
            return new Solution(null, 0, "node '" + c.names.get(floating)
                    + "' has no DC path to a rail (a floating grid or an open load)",
                    "give every grid a resistor to a rail (`grid divider 100 k 47 k to bias`) and every plate a load");
        }
        int[] free = freeNodes(c);
        NodalJacobian j = new NodalJacobian(c, free);
        double[] v = c.guess.clone();
        int it = newton(c, free, j, v, 1.0, 0);
        if (it >= 0) {
            return new Solution(v, it);
        }
        v = c.guess.clone();
        int total = 0;
        boolean ok = true;
        for (int decade = -1; decade <= 13 && ok; decade++) {
            int n = newton(c, free, j, v, 1.0, decade == 13 ? 0 : Math.pow(10, -decade));
            ok = n >= 0;
            total += Math.max(n, 0);
        }
        if (ok) {
            return new Solution(v, total);
        }
        v = c.guess.clone();
        for (int step = 1; step <= 20; step++) {
            int n = newton(c, free, j, v, step / 20.0, 0);
            if (n < 0) {
                return new Solution(null, total, "Newton's method did not converge, not even by conductance or "
                        + "source stepping", "look for a part value far from its neighbours (a load or divider off by "
                        + "a factor of 1000, a tube model with extreme parameters), or state the stage's currents with "
                        + "draw lines");
            }
            total += n;
        }
        return new Solution(v, total);
    }

    private static int[] freeNodes(Circuit c) {
        int count = 0;
        for (int i = 0; i < c.size(); i++) {
            if (!c.isFixed(i)) {
                count++;
            }
        }
        int[] free = new int[count];
        int j = 0;
        for (int i = 0; i < c.size(); i++) {
            if (!c.isFixed(i)) {
                free[j++] = i;
            }
        }
        return free;
    }

    /**
     * Solves in place with fixed nodes at {@code scale}·their volts and a shunt of {@code shunt}
     * siemens from every free node to ground; iterations used, or -1.
     */
    private static int newton(Circuit c, int[] free, NodalJacobian j, double[] v, double scale, double shunt) {
        for (int i = 0; i < v.length; i++) {
            if (c.isFixed(i)) {
                v[i] = c.fixed[i] * scale;
            }
        }
        int n = free.length;
        double maxStep = maxStep(c);
        double[] f = residual(c, free, v, shunt);
        double norm = norm2(f);
        double[] dx = new double[n];
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            if (maxAbs(f) < TOLERANCE_AMPS) {
                return it;
            }
            System.arraycopy(f, 0, dx, 0, n);
            if (!j.step(v, dx, shunt)) {
                return -1;
            }
            double biggest = maxAbs(dx);

            double lambda = biggest > maxStep ? maxStep / biggest : 1.0;
            double[] trial = v.clone();
            double[] ft = null;
            double nt = Double.POSITIVE_INFINITY;
            for (int back = 0; back < 30; back++) {
                for (int r = 0; r < n; r++) {
                    trial[free[r]] = v[free[r]] + lambda * dx[r];
                }
                ft = residual(c, free, trial, shunt);
                nt = norm2(ft);
                if (nt < norm || maxAbs(ft) < TOLERANCE_AMPS) {
                    break;
                }
                lambda *= 0.5;
            }
            if (!(nt < norm) && !(maxAbs(ft) < TOLERANCE_AMPS)) {
                // No descent left: accept only a point already within the property test's bound.
                return maxAbs(f) < 1e-8 ? it : -1;
            }
            System.arraycopy(trial, 0, v, 0, v.length);
            f = ft;
            norm = nt;
        }
        return -1;
    }

    /**
     * The step limit: {@link #MAX_STEP_VOLTS}, or a 50th of the span of the fixed voltages where that is more, so
     * that a node a few kilovolts from its guess is reached within the iteration limit.
     */
    private static double maxStep(Circuit c) {
        double lo = 0;
        double hi = 0;
        for (int i = 0; i < c.size(); i++) {
            if (c.isFixed(i)) {
                lo = Math.min(lo, c.fixed[i]);
                hi = Math.max(hi, c.fixed[i]);
            }
        }
        return Math.max(MAX_STEP_VOLTS, (hi - lo) / 50);
    }

    private static double[] residual(Circuit c, int[] free, double[] v, double shunt) {
        double[] all = c.nodeCurrents(v);
        double[] f = new double[free.length];
        for (int r = 0; r < free.length; r++) {
            f[r] = all[free[r]] + shunt * v[free[r]];
        }
        return f;
    }

    private static double norm2(double[] x) {
        double s = 0;
        for (double d : x) {
            s += d * d;
        }
        return Double.isNaN(s) ? Double.POSITIVE_INFINITY : Math.sqrt(s);
    }

    private static double maxAbs(double[] x) {
        double m = 0;
        for (double d : x) {
            m = Math.max(m, Math.abs(d));
        }
        return Double.isNaN(m) ? Double.POSITIVE_INFINITY : m;
    }
}
