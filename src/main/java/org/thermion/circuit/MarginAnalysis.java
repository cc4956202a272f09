package org.thermion.circuit;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Levels, noise margins and fan-out of a net: a driving stage (its inputs at given levels)
 * loaded by {@code n} identical receivers. Every input state is tried for stages of up to
 * {@link #ALL_STATES_UP_TO} inputs; wider ones are tried with no input, one input, and all
 * inputs active (the states that set the extreme levels of gates of one kind). Receivers'
 * thresholds are cached beside the solver's operating points. Not thread-safe.
 */
public final class MarginAnalysis {
    /** Fan-in up to which every input state is solved. */
    public static final int ALL_STATES_UP_TO = 4;
    /** Largest fan-out searched. */
    public static final int MAX_FAN_OUT = 64;

    private final StageSolver solver;
    private final java.util.Map<ThresholdKey, Thresholds> thresholds = new java.util.HashMap<>();

    private final java.util.Map<MarginKey, NoiseMargins> marginCache = new java.util.HashMap<>();
    private final java.util.Map<MarginKey, NetAnalysis> netCache = new java.util.HashMap<>();

    private record ThresholdKey(StageCircuit receiver, Corner corner) {
    }

    private record MarginKey(StageCircuit driver, InputLevels levels, StageCircuit receiver, int n, Corner corner) {
    }

    public MarginAnalysis(StageSolver solver) {
        this.solver = solver;
    }

    /** The receiver's thresholds at a corner, computed once per (receiver, corner); null without a solution. */
    public Thresholds thresholds(StageCircuit receiver, Corner corner) {
        ThresholdKey k = new ThresholdKey(receiver, corner);
        if (!thresholds.containsKey(k)) {
            thresholds.put(k, TransferCurve.thresholds(solver, receiver, corner));
        }
        return thresholds.get(k);
    }

    public StageSolver solver() {
        return solver;
    }

    /**
     * A net driven by {@code driver} with {@code n} receivers: operating points in every input
     * state and the margins, at nominal values; computed once per distinct net.
     */
    public NetAnalysis net(StageCircuit driver, InputLevels levels, StageCircuit receiver, int n) {
        MarginKey key = new MarginKey(driver, levels, receiver, n, Corner.NOMINAL);
        NetAnalysis a = netCache.get(key);
        if (a == null) {
            List<Load> loads = Collections.nCopies(n, receiver.inputLoad());
            List<DcResult> points = new ArrayList<>();
            for (boolean[] in : states(driver.inputs())) {
                points.add(solver.solve(driver, levels.volts(in), false, loads, Corner.NOMINAL));
            }
            a = new NetAnalysis(points, margins(driver, levels, receiver, n, Corner.NOMINAL));
            netCache.put(key, a);
        }
        return a;
    }

    /** Levels and margins with {@code n} receivers at {@code corner}. */
    public NoiseMargins margins(StageCircuit driver, InputLevels levels, StageCircuit receiver, int n, Corner corner) {
        MarginKey key = new MarginKey(driver, levels, receiver, n, corner);
        NoiseMargins m = marginCache.get(key);
        if (m == null) {
            m = compute(driver, levels, receiver, n, corner);
            marginCache.put(key, m);
        }
        return m;
    }

    private NoiseMargins compute(StageCircuit driver, InputLevels levels, StageCircuit receiver, int n, Corner corner) {
        List<Load> loads = Collections.nCopies(n, receiver.inputLoad());
        double voh = Double.POSITIVE_INFINITY;
        double vol = Double.NEGATIVE_INFINITY;
        for (boolean stored : storedStates(driver)) {
            for (boolean[] in : states(driver.inputs())) {
                DcResult r = solver.solve(driver, levels.volts(in), stored, loads, corner);
                if (!r.solved()) {
                    return new NoiseMargins(Double.NaN, Double.NaN, null, n, ((NoDcSolution) r).reason());
                }
                double v = r.point().outputVolts();
                if (driver.logic(in, stored)) {
                    voh = Math.min(voh, v);
                } else {
                    vol = Math.max(vol, v);
                }
            }
        }
        Thresholds t = thresholds(receiver, corner);
        if (t == null) {
            return new NoiseMargins(voh, vol, null, n, "receiver " + receiver.name() + " has no DC solution");
        }
        return new NoiseMargins(voh, vol, t, n, null);
    }

    /**
     * The most receivers the driver can feed with both margins at least {@code minMargin} volts
     * (0 when no count does; {@link #MAX_FAN_OUT} when the search ends there). Every count is
     * tried, since loads returned to the bias rail help the low level while they pull the high
     * level down; the search stops once the high margin, which only falls with more loads, fails.
     */
    public int fanOut(StageCircuit driver, InputLevels levels, StageCircuit receiver, double minMargin, Corner corner) {
        int ok = 0;
        for (int n = 1; n <= MAX_FAN_OUT; n++) {
            NoiseMargins m = margins(driver, levels, receiver, n, corner);
            if (m.worst() >= minMargin) {
                ok = n;
            } else if (!(m.highMargin() >= minMargin)) {
                break;
            }
        }
        return ok;
    }

    private static boolean[] storedStates(StageCircuit s) {
        return s instanceof FlipFlop ? new boolean[] {false, true} : new boolean[] {false};
    }

    /** Input states to solve: all of them for narrow stages, the extreme ones for wide ones. */
    public static List<boolean[]> states(int n) {
        List<boolean[]> out = new ArrayList<>();
        if (n <= ALL_STATES_UP_TO) {
            for (int mask = 0; mask < (1 << n); mask++) {
                boolean[] in = new boolean[n];
                for (int i = 0; i < n; i++) {
                    in[i] = (mask >> i & 1) != 0;
                }
                out.add(in);
            }
            return out;
        }
        out.add(new boolean[n]);
        for (int i = 0; i < n; i++) {
            boolean[] one = new boolean[n];
            one[i] = true;
            out.add(one);
            boolean[] allButOne = new boolean[n];
            java.util.Arrays.fill(allButOne, true);
            allButOne[i] = false;
            out.add(allButOne);
        }
        boolean[] all = new boolean[n];
        java.util.Arrays.fill(all, true);
        out.add(all);
        return out;
    }
}
