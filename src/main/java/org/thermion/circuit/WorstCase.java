package org.thermion.circuit;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Worst-case noise margins. For each margin, each toleranced parameter (rails, the driver's
 * and receivers' resistors, each role's emission) is set to the end that lowers the margin,
 * judged by the sign of its sensitivity: the margin at each end of that parameter's tolerance,
 * the others nominal. The margin is then evaluated with every parameter at its chosen end,
 * and that corner is named. {@link #exhaustive} tries every corner, for checking.
 */
public final class WorstCase {
    /** A parameter that moves a figure by no more than this fraction of it has no effect on it. */
    public static final double NO_EFFECT = 1e-6;
    private final MarginAnalysis analysis;
    private final Tolerances tolerances;

    public WorstCase(MarginAnalysis analysis, Tolerances tolerances) {
        this.analysis = analysis;
        this.tolerances = tolerances;
    }

    /** The high and low margins at their worst corners, with {@code n} receivers. */
    public List<WorstMargin> margins(StageCircuit driver, InputLevels levels, StageCircuit receiver, int n) {
        return margins(driver, levels, java.util.Collections.nCopies(n, receiver));
    }

    /** The high and low margins at their worst corners, for a net feeding {@code receivers}. */
    public List<WorstMargin> margins(StageCircuit driver, InputLevels levels, List<StageCircuit> receivers) {
        List<Parameter> params = parameters(driver, receivers);
        NoiseMargins nominal = analysis.margins(driver, levels, receivers, Corner.NOMINAL);
        List<WorstMargin> out = new ArrayList<>();
        for (WorstMargin.Side side : WorstMargin.Side.values()) {
            Corner worst = worstCorner(params, tolerances, c -> margin(side, driver, levels, receivers, c));
            out.add(new WorstMargin(side, value(side, nominal), margin(side, driver, levels, receivers, worst),
                    worst));
        }
        return out;
    }

    /**
     * The corner that lowers {@code figure} most, judged one parameter at a time by the sign of
     * its sensitivity: the figure with that parameter at the low end of its tolerance against
     * the nominal figure (one solve each; the figures are monotonic over a tolerance this narrow).
     * The parameter goes to the low end when that lowers the figure, to the high end when it
     * raises it, and stays nominal (unnamed in the corner) when it moves the figure by no more
     * than {@link #NO_EFFECT} of itself: a part that does not matter is not named, and the
     * solver's last digits do not pick its end.
     */
    public static Corner worstCorner(List<Parameter> params, Tolerances tolerances,
                                     java.util.function.ToDoubleFunction<Corner> figure) {
        double nominal = figure.applyAsDouble(Corner.NOMINAL);
        double noise = NO_EFFECT * Math.abs(nominal);
        Corner worst = Corner.NOMINAL;
        for (Parameter p : params) {
            double[] ends = tolerances.ends(p);
            double moved = figure.applyAsDouble(Corner.NOMINAL.with(p.label(), ends[0]));
            double pick;
            if (!Double.isFinite(nominal) || !Double.isFinite(moved)) {
                pick = moved <= nominal ? ends[0] : ends[1];
            } else if (moved < nominal - noise) {
                pick = ends[0];
            } else if (moved > nominal + noise) {
                pick = ends[1]; // one-sided (emission: new or worn): ends[1] is 1, nominal
            } else {
                pick = 1;
            }
            if (pick != 1) {
                worst = worst.with(p.label(), pick);
            }
        }
        return worst;
    }

    /** The lowest margin over every corner (2^k solves of the margin: small circuits only). */
    public WorstMargin exhaustive(WorstMargin.Side side, StageCircuit driver, InputLevels levels,
                                  StageCircuit receiver, int n) {
        return exhaustive(side, driver, levels, java.util.Collections.nCopies(n, receiver));
    }

    /** As {@link #exhaustive(WorstMargin.Side, StageCircuit, InputLevels, StageCircuit, int)} for mixed receivers. */
    public WorstMargin exhaustive(WorstMargin.Side side, StageCircuit driver, InputLevels levels,
                                  List<StageCircuit> receivers) {
        List<Parameter> params = parameters(driver, receivers);
        if (params.size() > 16) {
            throw new IllegalArgumentException("too many parameters to enumerate: " + params.size());
        }
        double nominal = margin(side, driver, levels, receivers, Corner.NOMINAL);
        double best = Double.POSITIVE_INFINITY;
        Corner at = Corner.NOMINAL;
        for (int mask = 0; mask < (1 << params.size()); mask++) {
            Corner c = Corner.NOMINAL;
            for (int i = 0; i < params.size(); i++) {
                double f = tolerances.ends(params.get(i))[mask >> i & 1];
                if (f != 1) {
                    c = c.with(params.get(i).label(), f);
                }
            }
            double m = margin(side, driver, levels, receivers, c);
            if (m < best) {
                best = m;
                at = c;
            }
        }
        return new WorstMargin(side, nominal, best, at);
    }

    /** The parameters the net's margins depend on, in a stable order. */
    public List<Parameter> parameters(StageCircuit driver, StageCircuit receiver, int n) {
        return parameters(driver, java.util.Collections.nCopies(n, receiver));
    }

    /** The parameters a net's margins depend on (its driver, its loads, its receivers' curves), in a stable order. */
    public List<Parameter> parameters(StageCircuit driver, List<StageCircuit> receivers) {
        StageSolver s = analysis.solver();
        Set<Parameter> all = new HashSet<>(s.parameters(StageSolver.DRIVER, driver, MarginAnalysis.loads(receivers)));
        for (StageCircuit r : new java.util.LinkedHashSet<>(receivers)) {
            all.addAll(s.parameters(StageSolver.RECEIVER, r, List.of()));
        }
        List<Parameter> sorted = new ArrayList<>(all);
        sorted.sort(java.util.Comparator.comparing(Parameter::label));
        return sorted;
    }

    private double margin(WorstMargin.Side side, StageCircuit driver, InputLevels levels,
                          List<StageCircuit> receivers, Corner c) {
        return value(side, analysis.margins(driver, levels, receivers, c));
    }

    private static double value(WorstMargin.Side side, NoiseMargins m) {
        double v = side == WorstMargin.Side.HIGH ? m.highMargin() : m.lowMargin();
        return Double.isNaN(v) ? Double.NEGATIVE_INFINITY : v;
    }
}
