package org.thermion.timing;

import org.thermion.model.StageFunction;
import org.thermion.model.StageType;

import org.thermion.circuit.Corner;
import org.thermion.circuit.DcResult;
import org.thermion.circuit.FlipFlop;
import org.thermion.circuit.GridLoad;
import org.thermion.circuit.GridNetwork;
import org.thermion.circuit.Load;
import org.thermion.circuit.LoadResistor;
import org.thermion.circuit.OperatingPoint;
import org.thermion.circuit.Parameter;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageSolver;
import org.thermion.circuit.Tolerances;
import org.thermion.circuit.TubeStage;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A stage's switching figures from its operating points. The output node's capacitance C
 * charges at the current I(V) the stage (inputs already in their new state) and its loads feed
 * into the node when it is held at V, so a 10-90 % edge takes t = C ∫ dV / I(V) over that part of
 * the swing (Simpson's rule, 8 intervals). For a resistor to a final level Vf, I = (Vf - V)/R and
 * t = ln 9 RC: the effective output resistance reported is R = t / (ln 9 C). Where I(V) reverses
 * inside the swing (a regenerative stage such as a flip-flop, switched by its trigger), the
 * resistance is the small-signal one at the new level instead. Inputs sit at 0 V for 0 and at the
 * highest rail for 1; every input state is tried (the extreme ones beyond four inputs) and the
 * slowest kept. The grid's gains to plate and cathode (for the Miller effect) are taken at the
 * middle of the transfer curve ({@link #gridGains}).
 * Results are cached per stage, loads and corner. Not thread-safe.
 */
public final class StageDrive {
    private static final int STEPS = 8;
    private static final double PROBE_VOLTS = 0.01;

    private final StageSolver solver;
    private final double high;
    private final Map<Key, Edges> edges = new HashMap<>();
    private final Map<StageCircuit, GridGains> gains = new HashMap<>();
    private final Map<Key, double[]> slowestRise = new HashMap<>();
    private final Map<Key, double[]> slowestFall = new HashMap<>();

    private record Key(StageCircuit stage, List<Load> loads, Corner corner) {
    }

    /**
     * Effective output resistances in ohms for the rising and the falling edge; NaN with
     * {@code problem} saying why when the circuit gives none.
     */
    public record Edges(double riseOhms, double fallOhms, String problem) {
        public boolean solved() {
            return !Double.isNaN(riseOhms) && !Double.isNaN(fallOhms);
        }
    }

    /** The least difference between a stage's 0 and 1 output levels that counts as a logic swing. */
    public static final double MIN_SWING_VOLTS = 1.0;

    /** {@code highVolts}: the level a logic 1 input is held at. */
    public StageDrive(StageSolver solver, double highVolts) {
        this.solver = solver;
        this.high = highVolts;
    }

    public StageSolver solver() {
        return solver;
    }

    /** The effective output resistances of {@code stage} with {@code loads} at {@code corner}. */
    public Edges edges(StageCircuit stage, List<Load> loads, Corner corner) {
        Key k = new Key(stage, List.copyOf(loads), corner);
        Edges e = edges.get(k);
        if (e == null) {
            e = new Edges(ohms(stage, loads, corner, true), ohms(stage, loads, corner, false), problem(stage, loads,
                    corner));
            edges.put(k, e);
        }
        return e;
    }

    /**
     * The corner that makes one edge slowest: each toleranced parameter (rails, resistors, emission)
     * at the end of its tolerance that raises that edge's resistance (or stops the stage switching),
     * judged one parameter at a time.
     */
    public Corner slowCorner(StageCircuit stage, List<Load> loads, Tolerances tol, boolean rise) {
        edges(stage, loads, Corner.NOMINAL);
        Corner worst = Corner.NOMINAL;
        for (Parameter p : solver.parameters(StageSolver.DRIVER, stage, loads)) {
            double[] ends = ends(p, tol);
            double lo = pick(edges(stage, loads, Corner.NOMINAL.with(p.label(), ends[0])), rise);
            double hi = pick(edges(stage, loads, Corner.NOMINAL.with(p.label(), ends[1])), rise);
            // An end where the stage gives no edge at all is the worst of the two.
            double f = Double.isNaN(lo) ? ends[0] : Double.isNaN(hi) ? ends[1] : hi >= lo ? ends[1] : ends[0];
            if (f != 1) {
                worst = worst.with(p.label(), f);
            }
        }
        return worst;
    }

    /** The two ends of a parameter's tolerance as {@link Tolerances} states them: rails and resistors ±, emission down. */
    static double[] ends(Parameter p, Tolerances tol) {
        switch (p.kind()) {
            case RAIL:
                return new double[] {1 - tol.rail(), 1 + tol.rail()};
            case RESISTOR:
                return new double[] {1 - tol.resistor(), 1 + tol.resistor()};
            default:
                return new double[] {tol.endOfLife(), 1};
        }
    }

    private static double pick(Edges e, boolean rise) {
        return rise ? e.riseOhms() : e.fallOhms();
    }

    /** Why a stage gives no edge here: no DC solution, or no logic swing between its states. */
    private String problem(StageCircuit stage, List<Load> loads, Corner corner) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (boolean stored : stored(stage)) {
            for (boolean[] in : states(stage.inputs())) {
                DcResult r = solver.solve(stage, volts(in), stored, loads, corner);
                if (!r.solved()) {
                    return "no DC solution: " + ((org.thermion.circuit.NoDcSolution) r).reason();
                }
                double v = r.point().outputVolts();
                if (stage.logic(in, stored)) {
                    hi = Math.min(hi == Double.NEGATIVE_INFINITY ? v : hi, v);
                } else {
                    lo = Math.max(lo == Double.POSITIVE_INFINITY ? v : lo, v);
                }
            }
        }
        if (!(hi - lo >= MIN_SWING_VOLTS)) {
            return String.format(java.util.Locale.ROOT, "its 1 level (%.1f V) is not %.0f V above its 0 level (%.1f V) "
                    + "at these rails and loads", hi, MIN_SWING_VOLTS, lo);
        }
        return "";
    }

    private double ohms(StageCircuit stage, List<Load> loads, Corner corner, boolean rise) {
        List<double[]> lows = new ArrayList<>();
        List<double[]> highs = new ArrayList<>();
        for (boolean stored : stored(stage)) {
            for (boolean[] in : states(stage.inputs())) {
                DcResult r = solver.solve(stage, volts(in), stored, loads, corner);
                if (!r.solved()) {
                    return Double.NaN;
                }
                double[] entry = {r.point().outputVolts(), stored ? 1 : 0, encode(in)};
                (stage.logic(in, stored) ? highs : lows).add(entry);
            }
        }
        if (lows.isEmpty() || highs.isEmpty()) {
            return Double.NaN;
        }
        // The edge starts from the far level (lowest low for a rise, highest high for a fall).
        double from = rise ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
        for (double[] e : rise ? lows : highs) {
            from = rise ? Math.min(from, e[0]) : Math.max(from, e[0]);
        }
        // The slowest final state is found at nominal values and kept for the corners.
        Key nominal = new Key(stage, List.copyOf(loads), Corner.NOMINAL);
        Map<Key, double[]> slowest = rise ? slowestRise : slowestFall;
        double[] known = slowest.get(nominal);
        if (known != null && !corner.equals(Corner.NOMINAL)) {
            for (double[] fin : rise ? highs : lows) {
                if (fin[1] == known[1] && fin[2] == known[2]) {
                    return transition(stage, loads, corner, fin, from);
                }
            }
        }
        double worst = Double.NaN;
        double[] worstState = null;
        for (double[] fin : rise ? highs : lows) {
            double r = transition(stage, loads, corner, fin, from);
            if (!(r <= worst)) {
                worst = r;
                worstState = fin;
            }
        }
        if (corner.equals(Corner.NOMINAL) && worstState != null) {
            slowest.put(nominal, worstState);
        }
        return worst;
    }

    /** Effective resistance of the edge from {@code from} volts to the level of state {@code fin}. */
    private double transition(StageCircuit stage, List<Load> loads, Corner corner, double[] fin, double from) {
        double to = fin[0];
        double[] in = volts(decode(fin[2], stage.inputs()));
        boolean stored = fin[1] != 0;
        double swing = to - from;
        if (Math.abs(swing) < MIN_SWING_VOLTS) {
            return Double.NaN;
        }
        double a = from + 0.1 * swing;
        double h = 0.8 * swing / STEPS;
        double sum = 0;
        boolean regenerative = false;
        for (int i = 0; i <= STEPS; i++) {
            double amps = solver.heldOutputAmps(stage, in, stored, loads, corner, a + i * h);
            if (!(amps * Math.signum(swing) > 0)) {
                regenerative = true;
                break;
            }
            double w = i == 0 || i == STEPS ? 1 : i % 2 == 1 ? 4 : 2;
            sum += w / amps;
        }
        if (!regenerative) {
            return sum * h / 3 / Math.log(9);
        }
        // Small-signal resistance at the new level: the current a small step back from it draws.
        double step = PROBE_VOLTS * Math.signum(swing);
        double amps = solver.heldOutputAmps(stage, in, stored, loads, corner, to - step);
        return amps * Math.signum(swing) > 0 ? Math.abs(step / amps) : Double.NaN;
    }

    /**
     * Small-signal voltage gains from a triode's grid pin to its plate and to its cathode, signed
     * (a plate falls as its grid rises: negative; a cathode follows: positive; 0 where the node
     * sits on a rail). Each capacitance from the grid is multiplied by one less the gain across
     * it (J. M. Miller, NBS Scientific Papers 15, 1920): Cin = Cgp (1 - plate) + Cgk (1 - cathode).
     */
    public record GridGains(double plate, double cathode) {
        /** A declared gain: an inverting stage with its cathode on a rail. */
        public static GridGains declared(double gain) {
            return new GridGains(-Math.abs(gain), 0);
        }

        /**
         * A stage known by its declared figures alone: a buffer's declared gain is a cathode
         * follower's (its cathode follows the grid), any other's an inverting plate stage's; a
         * stage that declares none counts |A| = 1 inverting, the larger load of the two.
         */
        public static GridGains declared(StageType st) {
            if (Double.isNaN(st.gain())) {
                return declared(1);
            }
            return st.function() == StageFunction.BUFFER ? new GridGains(0, Math.abs(st.gain())) : declared(st.gain());
        }

        /** The gain's size to the node the stage takes its output from. */
        public double toOutput(boolean cathodeOutput) {
            return Math.abs(cathodeOutput ? cathode : plate);
        }
    }

    /**
     * |dVout/dVgrid| of a tube stage or flip-flop at the middle of its swing (see {@link #gridGains});
     * NaN for other stages.
     */
    public double millerGain(StageCircuit stage) {
        GridGains g = gridGains(stage);
        return g == null ? Double.NaN : g.toOutput(stage instanceof TubeStage t && t.output() == TubeStage.Output.CATHODE);
    }

    /**
     * The grid gains of a stage's first input at the middle of its transfer curve, the other inputs at
     * the level that leaves it in control: a plate stage (inverter, NOR's parallel sections on one
     * load, NAND's stacked ones) and a cathode follower alike, from the operating points either side.
     * A flip-flop's trigger reaches a grid of the pair: that half is swept between the two levels the
     * cross-coupling gives its grid, its plate loaded by its load and the divider to the other grid
     * (the half's own cathode return; exact for a grounded cathode). Null for diode and gas stages
     * or when a point has no solution.
     */
    public GridGains gridGains(StageCircuit stage) {
        if (!gains.containsKey(stage)) {
            gains.put(stage, gainsOf(stage));
        }
        return gains.get(stage);
    }

    private GridGains gainsOf(StageCircuit stage) {
        if (stage instanceof TubeStage t) {
            double rest = t.arrangement() == TubeStage.Arrangement.SERIES ? high : 0;
            return sweep(t, List.of(), 0, high, rest);
        }
        if (stage instanceof FlipFlop f) {
            OperatingPoint off = point(f, new double[0], true, List.of());
            OperatingPoint on = point(f, new double[0], false, List.of());
            String pin = f.cross().stopperOhms() > 0 ? "driver.gridA" : "driver.tapA";
            if (off == null || on == null || !off.nodeVolts().containsKey(pin)) {
                return null;
            }
            TubeStage half = TubeStage.inverter(f.name() + " (one half)", f.tube(), 1, new LoadResistor(f.loadOhms()),
                    f.plateRail(), f.cathode(), GridNetwork.direct(), null);
            Load otherGrid = new GridLoad(f.cross(), f.tube().grid(), f.cathode().rail());
            return sweep(half, List.of(otherGrid), off.nodeVolts().get(pin), on.nodeVolts().get(pin), 0);
        }
        return null;
    }

    /** Gains at the input between {@code from} and {@code to} where the output is halfway between its ends. */
    private GridGains sweep(TubeStage t, List<Load> loads, double from, double to, double rest) {
        double vFrom = out(t, loads, from, rest);
        double vTo = out(t, loads, to, rest);
        if (!(Math.abs(vTo - vFrom) >= MIN_SWING_VOLTS)) {
            return null; // no solution, or no logic swing: no transfer curve to take a gain from
        }
        double mid = (vFrom + vTo) / 2;
        double a = from;
        double b = to;
        for (int i = 0; i < 50; i++) {
            double m = (a + b) / 2;
            double v = out(t, loads, m, rest);
            if (Double.isNaN(v)) {
                return null;
            }
            if ((v > mid) == (vFrom > mid)) {
                a = m;
            } else {
                b = m;
            }
        }
        double at = (a + b) / 2;
        OperatingPoint lo = point(t, inputs(t, at - PROBE_VOLTS, rest), false, loads);
        OperatingPoint hi = point(t, inputs(t, at + PROBE_VOLTS, rest), false, loads);
        if (lo == null || hi == null) {
            return null;
        }
        String pin = gridPin(t.grid(), hi);
        double dg = hi.nodeVolts().get(pin) - lo.nodeVolts().get(pin);
        if (!(Math.abs(dg) > 0)) {
            return null;
        }
        String plate = t.arrangement() == TubeStage.Arrangement.SERIES && t.inputs() > 1 ? "driver.stack0" : "driver.plate";
        return new GridGains(change(lo, hi, plate) / dg, change(lo, hi, "driver.cathode") / dg);
    }

    /** The first input's grid pin: after the stopper, else the divider's tap, else the input itself. */
    private static String gridPin(GridNetwork g, OperatingPoint p) {
        if (g.stopperOhms() > 0) {
            return "driver.grid0";
        }
        return g.seriesOhms() > 0 ? "driver.tap0" : "driver.in0";
    }

    /** A node's change between two points; 0 for a node that is not there (it sits on a rail). */
    private static double change(OperatingPoint lo, OperatingPoint hi, String node) {
        Double a = lo.nodeVolts().get(node);
        Double b = hi.nodeVolts().get(node);
        return a == null || b == null ? 0 : b - a;
    }

    private static double[] inputs(TubeStage t, double first, double rest) {
        double[] in = new double[t.inputs()];
        java.util.Arrays.fill(in, rest);
        in[0] = first;
        return in;
    }

    private double out(TubeStage t, List<Load> loads, double first, double rest) {
        OperatingPoint p = point(t, inputs(t, first, rest), false, loads);
        return p == null ? Double.NaN : p.outputVolts();
    }

    private OperatingPoint point(StageCircuit s, double[] in, boolean stored, List<Load> loads) {
        DcResult r = solver.solve(s, in, stored, loads, Corner.NOMINAL);
        return r.solved() ? r.point() : null;
    }

    private double[] volts(boolean[] in) {
        double[] v = new double[in.length];
        for (int i = 0; i < in.length; i++) {
            v[i] = in[i] ? high : 0;
        }
        return v;
    }

    private static boolean[] stored(StageCircuit s) {
        return s instanceof FlipFlop ? new boolean[] {false, true} : new boolean[] {false};
    }

    private static double encode(boolean[] in) {
        long m = 0;
        for (int i = 0; i < in.length; i++) {
            m |= in[i] ? 1L << i : 0;
        }
        return m;
    }

    private static boolean[] decode(double code, int n) {
        long m = (long) code;
        boolean[] in = new boolean[n];
        for (int i = 0; i < n; i++) {
            in[i] = (m >> i & 1) != 0;
        }
        return in;
    }

    /** Input states tried: all for up to four inputs; none, one, all but one and all beyond (inputs are alike). */
    static List<boolean[]> states(int n) {
        List<boolean[]> out = new ArrayList<>();
        if (n <= 4) {
            for (int mask = 0; mask < (1 << n); mask++) {
                out.add(decode(mask, n));
            }
            return out;
        }
        boolean[] one = new boolean[n];
        one[0] = true;
        boolean[] allButOne = new boolean[n];
        java.util.Arrays.fill(allButOne, true);
        allButOne[0] = false;
        boolean[] all = new boolean[n];
        java.util.Arrays.fill(all, true);
        out.add(new boolean[n]);
        out.add(one);
        out.add(allButOne);
        out.add(all);
        return out;
    }
}
