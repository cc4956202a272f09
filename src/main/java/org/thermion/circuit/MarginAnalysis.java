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
    private int sweeps;
    private final java.util.Map<ThresholdKey, Thresholds> thresholds = new java.util.HashMap<>();

    private final java.util.Map<MarginKey, NoiseMargins> marginCache = new java.util.HashMap<>();
    private final java.util.Map<MarginKey, NetAnalysis> netCache = new java.util.HashMap<>();
    private final java.util.Map<StateKey, Critical> criticalStates = new java.util.HashMap<>();

    private record ThresholdKey(StageCircuit receiver, Corner corner) {
    }

    private record MarginKey(StageCircuit driver, InputLevels levels, List<StageCircuit> receivers, Corner corner) {
    }

    /** Why a net feeding only stages without gain has no margins of its own. */
    public static final String PASSED_ON = "feeds only stages without gain (diode gates, followers), which pass its "
            + "level on: judged where their outputs reach a stage with gain";

    /**
     * True when the receiver is meant to restore levels: a tube stage with its output at the
     * plate, or a flip-flop. A net's margins are judged against such receivers (whatever gain
     * they reach at these rails: one that never reaches 1 gets its midpoint, and its own output
     * then shows the failure). A diode gate or a cathode follower passes the level on, so its
     * input's margin is judged at its output, where the next stage with gain reads it.
     */
    public static boolean restores(StageCircuit receiver) {
        if (receiver instanceof DiodeGate) {
            return false;
        }
        return !(receiver instanceof TubeStage t) || t.output() == TubeStage.Output.PLATE;
    }

    public MarginAnalysis(StageSolver solver) {
        this.solver = solver;
    }

    /** The receiver's thresholds at a corner, computed once per (receiver, corner); null without a solution. */
    public Thresholds thresholds(StageCircuit receiver, Corner corner) {
        // only the rails and the receiver's own parts move its curve: share the sweep across driver corners
        java.util.Map<String, Double> own = new java.util.TreeMap<>();
        corner.factors().forEach((label, f) -> {
            if (label.startsWith("rail.") || label.startsWith(StageSolver.RECEIVER + ".")) {
                own.put(label, f);
            }
        });
        Corner relevant = own.size() == corner.factors().size() ? corner : new Corner(own);
        ThresholdKey k = new ThresholdKey(receiver, relevant);
        if (!thresholds.containsKey(k)) {
            StageCircuit stage = swept(receiver);
            Thresholds t;
            if (relevant.factors().isEmpty()) {
                // the sweep brackets the thresholds; the search then places them as it will at every corner
                t = TransferCurve.thresholds(solver, stage, relevant);
                sweeps++;
                Thresholds exact = t == null ? null : ThresholdSearch.near(solver, stage, relevant, t);
                t = exact != null ? exact : t;
            } else {
                Thresholds nominal = thresholds(receiver, Corner.NOMINAL);
                t = nominal == null ? null : ThresholdSearch.near(solver, stage, relevant, nominal);
                if (t == null) {
                    t = TransferCurve.thresholds(solver, stage, relevant);
                    sweeps++;
                }
            }
            thresholds.put(k, t);
        }
        return thresholds.get(k);
    }

    /**
     * The stage whose curve stands for a receiver's input: the receiver itself, or for a
     * flip-flop (no DC input: it is steered) the flip-flop opened at the link the steering
     * drives ({@link SteeredHalf}): the half a steering level must cut off or turn on, with
     * the other half on their shared cathode return and on its plate.
     */
    static StageCircuit swept(StageCircuit receiver) {
        if (receiver instanceof FlipFlop f) {
            return new SteeredHalf(f);
        }
        return receiver;
    }

    /** Transfer curves swept so far (one per receiver and corner). */
    public int sweeps() {
        return sweeps;
    }

    public StageSolver solver() {
        return solver;
    }

    /**
     * A net driven by {@code driver} with {@code n} receivers: operating points in every input
     * state and the margins, at nominal values; computed once per distinct net.
     */
    public NetAnalysis net(StageCircuit driver, InputLevels levels, StageCircuit receiver, int n) {
        return net(driver, levels, Collections.nCopies(n, receiver));
    }

    /** As {@link #net(StageCircuit, InputLevels, StageCircuit, int)} for receivers of several kinds. */
    public NetAnalysis net(StageCircuit driver, InputLevels levels, List<StageCircuit> receivers) {
        List<StageCircuit> rs = canonical(receivers);
        MarginKey key = new MarginKey(driver, levels, rs, Corner.NOMINAL);
        NetAnalysis a = netCache.get(key);
        if (a == null) {
            List<Load> loads = loads(rs);
            List<DcResult> points = new ArrayList<>();
            for (boolean[] in : states(driver.inputs())) {
                points.add(solver.solve(driver, levels.volts(in), false, loads, Corner.NOMINAL));
            }
            a = new NetAnalysis(points, margins(driver, levels, rs, Corner.NOMINAL));
            netCache.put(key, a);
        }
        return a;
    }

    /** Levels and margins with {@code n} receivers at {@code corner}. */
    public NoiseMargins margins(StageCircuit driver, InputLevels levels, StageCircuit receiver, int n, Corner corner) {
        return margins(driver, levels, Collections.nCopies(n, receiver), corner);
    }

    /**
     * Levels and margins of a net with receivers of several kinds (one entry per input pin the
     * net feeds): the driver's levels under all their loads against the most demanding
     * thresholds among them (the highest V_IH, the lowest V_IL).
     */
    public NoiseMargins margins(StageCircuit driver, InputLevels levels, List<StageCircuit> receivers, Corner corner) {
        List<StageCircuit> rs = canonical(receivers);
        MarginKey key = new MarginKey(driver, levels, rs, corner);
        NoiseMargins m = marginCache.get(key);
        if (m == null) {
            m = compute(driver, levels, rs, corner);
            marginCache.put(key, m);
        }
        return m;
    }

    /** Receivers in a stable order (by name), so one net's loads make one cache key whatever their order. */
    static List<StageCircuit> canonical(List<StageCircuit> receivers) {
        List<StageCircuit> rs = new ArrayList<>(receivers);
        rs.sort(java.util.Comparator.comparing(StageCircuit::name));
        return List.copyOf(rs);
    }

    static List<Load> loads(List<StageCircuit> receivers) {
        List<Load> loads = new ArrayList<>(receivers.size());
        for (StageCircuit r : receivers) {
            loads.add(r.inputLoad());
        }
        return loads;
    }

    /** An input state of a driver: the stored state and the inputs. */
    private record State(boolean stored, boolean[] in) {
    }

    private record StateKey(StageCircuit driver, InputLevels levels) {
    }

    /** The input states that set a net's high and low level at nominal values. */
    private record Critical(State high, State low) {
    }

    private NoiseMargins compute(StageCircuit driver, InputLevels levels, List<StageCircuit> receivers, Corner corner) {
        List<Load> loads = loads(receivers);
        int n = receivers.size();
        double voh = Double.POSITIVE_INFINITY;
        double vol = Double.NEGATIVE_INFINITY;
        List<State> tried = new ArrayList<>();
        // Neither a tolerance corner nor the loads change which input state sets a level, only
        // the level: every state is solved once per driver and input levels, at nominal values
        // with the first loads asked for (the solves a net's own analysis makes anyway).
        StateKey stateKey = new StateKey(driver, levels);
        Critical critical = criticalStates.get(stateKey);
        boolean reference = critical == null && corner.factors().isEmpty();
        if (critical == null && !reference) {
            margins(driver, levels, receivers, Corner.NOMINAL);
            critical = criticalStates.get(stateKey);
        }
        if (critical != null) {
            if (critical.high() != null) {
                tried.add(critical.high());
            }
            if (critical.low() != null) {
                tried.add(critical.low());
            }
        } else {
            for (boolean stored : storedStates(driver)) {
                for (boolean[] in : states(driver.inputs())) {
                    tried.add(new State(stored, in));
                }
            }
        }
        State high = null;
        State low = null;
        for (State st : tried) {
            DcResult r = solver.solve(driver, levels.volts(st.in()), st.stored(), loads, corner);
            if (!r.solved()) {
                return new NoiseMargins(Double.NaN, Double.NaN, null, n, ((NoDcSolution) r).reason());
            }
            double v = r.point().outputVolts();
            if (driver.logic(st.in(), st.stored())) {
                if (v < voh) {
                    voh = v;
                    high = st;
                }
            } else if (v > vol) {
                vol = v;
                low = st;
            }
        }
        if (reference) {
            criticalStates.put(stateKey, new Critical(high, low));
        }
        if (receivers.isEmpty()) {
            return new NoiseMargins(voh, vol, null, 0, "no receivers");
        }
        double vil = Double.POSITIVE_INFINITY;
        double vih = Double.NEGATIVE_INFINITY;
        Thresholds.Method method = Thresholds.Method.UNITY_GAIN;
        StageCircuit last = null;
        for (StageCircuit receiver : receivers) {
            if (receiver == last) {
                continue;
            }
            last = receiver;
            if (!restores(receiver)) {
                continue; // judged at its output: no sweep (a diode gate carrying its loads is one per chain)
            }
            Thresholds t = thresholds(receiver, corner);
            if (t == null) {
                return new NoiseMargins(voh, vol, null, n, "receiver " + receiver.name() + " has no DC solution");
            }
            vil = Math.min(vil, t.vil());
            vih = Math.max(vih, t.vih());
            if (t.method() == Thresholds.Method.MIDPOINT) {
                method = Thresholds.Method.MIDPOINT;
            }
        }
        if (!(vih >= vil)) {
            return new NoiseMargins(voh, vol, null, n, PASSED_ON);
        }
        return new NoiseMargins(voh, vol, new Thresholds(vil, vih, method), n, null);
    }

    /**
     * The most receivers the driver can feed with both margins at least {@code minMargin} volts
     * (0 when no count does; {@link #MAX_FAN_OUT} when the search ends there). The high margin
     * only falls as loads are added, so the largest count that keeps it is found by bisection;
     * loads returned to the bias rail help the low level, so from there down the first count
     * with both margins is taken.
     */
    public int fanOut(StageCircuit driver, InputLevels levels, StageCircuit receiver, double minMargin, Corner corner) {
        int lo = 0;
        int hi = MAX_FAN_OUT + 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (margins(driver, levels, receiver, mid, corner).highMargin() >= minMargin) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        for (int n = lo; n >= 1; n--) {
            if (margins(driver, levels, receiver, n, corner).worst() >= minMargin) {
                return n;
            }
        }
        return 0;
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
