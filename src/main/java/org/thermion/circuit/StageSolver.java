package org.thermion.circuit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Solves stages at one set of rails, caching each distinct (stage, inputs, loads, corner):
 * a machine of many identical stages costs one solve per kind of use. The stage's own parts
 * are labelled "driver.", its loads' parts "receiver." (see {@link Corner}). Not thread-safe.
 */
public final class StageSolver {
    /** The role label of the stage being solved. */
    public static final String DRIVER = "driver";
    /** The role label of the stages it drives (their inputs are its loads). */
    public static final String RECEIVER = "receiver";

    private final RailSet rails;
    private final Map<Key, DcResult> cache = new HashMap<>();
    private long solves;

    private record Key(String role, StageCircuit stage, List<Double> volts, boolean stored, List<Load> loads,
                       Corner corner) {
    }

    public StageSolver(RailSet rails) {
        this.rails = rails;
    }

    public RailSet rails() {
        return rails;
    }

    /** The stage as a driver, with {@code loads} on its output, at input volts and stored state. */
    public DcResult solve(StageCircuit stage, double[] inputVolts, boolean stored, List<Load> loads, Corner corner) {
        return solveAs(DRIVER, stage, inputVolts, stored, loads, corner);
    }

    /** As {@link #solve}, the stage's parts labelled with {@code role}. */
    public DcResult solveAs(String role, StageCircuit stage, double[] inputVolts, boolean stored, List<Load> loads,
                            Corner corner) {
        return solveNear(role, stage, inputVolts, stored, loads, corner, null);
    }

    /**
     * As {@link #solveAs}, Newton's method starting from {@code near}'s node voltages where it
     * has the node (a neighbouring point of a sweep: a few iterations instead of a cold start).
     * For stages with one solution only; a bistable stage settles where its own guess puts it.
     */
    DcResult solveNear(String role, StageCircuit stage, double[] inputVolts, boolean stored, List<Load> loads,
                       Corner corner, OperatingPoint near) {
        if (inputVolts.length != stage.inputs()) {
            throw new IllegalArgumentException("stage " + stage.name() + " has " + stage.inputs() + " inputs, got "
                    + inputVolts.length + " voltages");
        }
        List<Double> vs = new ArrayList<>(inputVolts.length);
        for (double d : inputVolts) {
            vs.add(d);
        }
        Key key = new Key(role, stage, vs, stored, List.copyOf(loads), corner);
        DcResult r = cache.get(key);
        if (r == null) {
            r = compute(role, stage, inputVolts, stored, loads, corner, near);
            cache.put(key, r);
        }
        return r;
    }

    /** The toleranced parameters a solve of this stage with these loads depends on. */
    public Set<Parameter> parameters(String role, StageCircuit stage, List<Load> loads) {
        CircuitBuilder b = builder(role, stage, new double[stage.inputs()], false, loads, Corner.NOMINAL, true);
        return b.parameters();
    }

    /**
     * The parts and nodes a solve of this stage would use (for netlist writers): the same
     * circuit {@link #solve} builds, not solved, with each load drawn apart (the solve joins equal ones).
     */
    public StageNetlist netlist(String role, StageCircuit stage, double[] inputVolts, boolean stored, List<Load> loads,
                                Corner corner) {
        Circuit c = builder(role, stage, inputVolts, stored, loads, corner, false).build();
        List<Double> fixed = new ArrayList<>(c.size());
        for (double f : c.fixed) {
            fixed.add(f);
        }
        return new StageNetlist(c.names, fixed, List.of(c.elements), c.output);
    }

    /**
     * The current an ideal source holding the stage's output at {@code volts} must feed into
     * the output node (positive into the node: the stage pulls the node up), the rest of the
     * circuit solved around it; NaN when there is no solution. For transition times: the node's
     * capacitance charges at this current.
     */
    public double heldOutputAmps(StageCircuit stage, double[] inputVolts, boolean stored, List<Load> loads,
                                 Corner corner, double volts) {
        CircuitBuilder b = builder(DRIVER, stage, inputVolts, stored, loads, corner, true);
        if (b.missingRail() != null || !Double.isFinite(volts)) {
            return Double.NaN;
        }
        Circuit c = b.build();
        double[] fixed = c.fixed.clone();
        double[] guess = c.guess.clone();
        fixed[c.output] = volts;
        guess[c.output] = volts;
        Circuit held = new Circuit(c.names, fixed, guess, List.of(c.elements), c.output);
        DcSolver.Solution s = DcSolver.solve(held);
        if (s.volts() == null) {
            return Double.NaN;
        }
        return -held.nodeCurrents(s.volts())[c.output];
    }

    /** Distinct solves computed so far (cache misses). */
    public long solves() {
        return solves;
    }

    /** Entries in the cache. */
    public int cacheSize() {
        return cache.size();
    }

    private CircuitBuilder builder(String role, StageCircuit stage, double[] inputVolts, boolean stored,
                                   List<Load> loads, Corner corner, boolean joinIdentical) {
        CircuitBuilder b = new CircuitBuilder(rails, corner, joinIdentical);
        b.role(role);
        int out = stage.build(b, inputVolts, stored);
        b.role(RECEIVER.equals(role) ? "load" : RECEIVER);
        b.attachAll(loads, out, "#");
        b.role(role);
        b.output(out);
        return b;
    }

    private DcResult compute(String role, StageCircuit stage, double[] inputVolts, boolean stored, List<Load> loads,
                             Corner corner, OperatingPoint near) {
        solves++;
        for (double v : inputVolts) {
            if (!Double.isFinite(v)) {
                return new NoDcSolution(stage.name(), "input voltage is not a number: " + v,
                        "give the stage's driving net a level (its driver has no DC solution either)");
            }
        }
        CircuitBuilder b = builder(role, stage, inputVolts, stored, loads, corner, true);
        if (b.missingRail() != null) {
            return new NoDcSolution(stage.name(), "no rail named " + b.missingRail(),
                    "declare `rail " + b.missingRail() + " { voltage ... }` or name another rail in the stage");
        }
        Circuit c = near == null ? b.build() : b.build().startingFrom(near.nodeVolts());
        DcSolver.Solution s = DcSolver.solve(c);
        if (s.volts() == null) {
            return new NoDcSolution(stage.name(), s.failure(), s.fix());
        }
        return PointReader.read(stage.name(), c, s, rails, role + ".");
    }
}
