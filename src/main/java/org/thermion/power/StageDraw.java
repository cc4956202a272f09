package org.thermion.power;

import org.thermion.circuit.Corner;
import org.thermion.circuit.DcResult;
import org.thermion.circuit.FlipFlop;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.MarginAnalysis;
import org.thermion.circuit.NoDcSolution;
import org.thermion.circuit.OperatingPoint;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.ThyratronStage;
import org.thermion.circuit.TubeDissipation;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.RailDraw;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * What one stage instance draws from each rail with its output low and high, in amperes
 * (magnitudes: a negative rail's draw is a positive number), and its plate dissipation.
 * The figures come from the stage's circuit solved at the machine's own rails
 * ({@link MachineCircuits}); a stage that declares {@code draw} lines keeps its declared figures
 * (an override), and where it also has a circuit each declared figure is compared with the
 * computed one ({@link #mismatches()}). Every figure says where it came from ({@link #origin}).
 *
 * <p>How a state is solved: the inputs are ideal sources at ground (logic 0) and at B+ (logic 1),
 * the levels a plate swings between, the output unloaded; for each output value (the stage
 * function's: a lamp driver's output is high when its lamp is lit) the input and stored state of
 * that value that draws most is taken (a stage's own bound). The current an input source
 * feeds into the stage (a diode OR's pull-down, a grid divider) comes through the driving
 * stage's plate load, so it is counted on the machine's B+ (its most positive rail), as the
 * library's declared figures always did.
 */
public final class StageDraw {
    /** Declared and computed figures further apart than this fraction are reported. */
    public static final double MISMATCH_FRACTION = 0.25;
    /** Differences smaller than this (amperes) are not reported: below the budget's printed resolution. */
    public static final double MISMATCH_FLOOR_AMPS = 0.1e-3;

    /** Where a stage's figures come from. */
    public enum Origin {
        /** Solved from the stage's circuit at the machine's rails. */
        COMPUTED("computed"),
        /** Typed into the stage's {@code draw} lines. */
        DECLARED("declared"),
        /** Neither a circuit that solves nor declared lines: the stage counts as drawing nothing. */
        NONE("none");

        private final String word;

        Origin(String word) {
            this.word = word;
        }

        /** The word reports print. */
        public String word() {
            return word;
        }
    }

    /** A declared figure more than {@link #MISMATCH_FRACTION} from the computed one. */
    public record Mismatch(String stage, String rail, boolean outputHigh, double declaredAmps, double computedAmps) {
        /** (declared - computed) / computed; infinite when nothing is computed. */
        public double deviation() {
            return computedAmps == 0 ? Double.POSITIVE_INFINITY : (declaredAmps - computedAmps) / computedAmps;
        }
    }

    /** A stage whose circuit has no DC solution at the machine's rails, and why. */
    public record Unsolved(String stage, String reason, Origin usedInstead) {
    }

    /** One stage type's figures: amps per rail with the output low and high, plate watts low and high. */
    private record Figures(Origin origin, double[] low, double[] high, double plateLow, double plateHigh,
                           boolean[] uses) {
    }

    private final Machine machine;
    private final Figures[] byStage;
    private final Map<String, Integer> index = new HashMap<>();
    private final List<Mismatch> mismatches;
    private final List<Unsolved> unsolved;
    private final double levelLow;
    private final double levelHigh;

    private StageDraw(Machine m, MachineCircuits circuits) {
        this.machine = m;
        int n = m.stages().size();
        byStage = new Figures[n];
        List<Mismatch> mm = new ArrayList<>();
        List<Unsolved> un = new ArrayList<>();
        int feed = feedRail(m);
        // Ideal logic levels, ground and B+: a driving plate swings between them, less its load's drop.
        double[] lv = {0, feed < 0 ? 0 : m.rails().get(feed).volts()};
        levelLow = lv[0];
        levelHigh = lv[1];
        for (int s = 0; s < n; s++) {
            StageType st = m.stages().get(s);
            index.put(st.name(), s);
            Figures declared = declared(m, st);
            Figures computed = null;
            if (circuits != null) {
                StageCircuit c = circuits.circuit(st).orElse(null);
                if (c != null) {
                    computed = computed(m, circuits, st, c, feed, lv, un, declared.origin());
                }
            }
            if (declared.origin() == Origin.DECLARED) {
                byStage[s] = declared;
                if (computed != null) {
                    compare(m, st, declared, computed, mm);
                }
            } else {
                byStage[s] = computed != null ? computed : declared;
            }
        }
        mismatches = List.copyOf(mm);
        unsolved = List.copyOf(un);
    }

    /** Figures from the machine's circuits where a stage has one, declared lines where it declares them. */
    public static StageDraw of(Machine m) {
        return new StageDraw(m, MachineCircuits.of(m));
    }

    /** As {@link #of(Machine)} with circuits already built. */
    public static StageDraw of(Machine m, MachineCircuits circuits) {
        return new StageDraw(m, circuits);
    }

    /** Only the declared {@code draw} lines (a stage without them draws nothing). */
    public static StageDraw declaredOnly(Machine m) {
        return new StageDraw(m, null);
    }

    /** The machine these figures belong to. */
    public Machine machine() {
        return machine;
    }

    /** Amps an instance of {@code st} draws from {@code rail} with its output high or low. */
    public double amps(StageType st, int rail, boolean outputHigh) {
        Figures f = figures(st);
        return outputHigh ? f.high[rail] : f.low[rail];
    }

    /** The smaller of the two output states' draws on {@code rail}. */
    public double minAmps(StageType st, int rail) {
        return Math.min(amps(st, rail, false), amps(st, rail, true));
    }

    /** The larger of the two output states' draws on {@code rail}. */
    public double maxAmps(StageType st, int rail) {
        return Math.max(amps(st, rail, false), amps(st, rail, true));
    }

    /** True when the stage draws on {@code rail} (declares a line there, or its circuit uses it). */
    public boolean drawsOn(StageType st, int rail) {
        return figures(st).uses[rail];
    }

    /** Plate (and screen) dissipation of an instance in one output state, watts. */
    public double plateWatts(StageType st, boolean outputHigh) {
        Figures f = figures(st);
        return outputHigh ? f.plateHigh : f.plateLow;
    }

    /** Where the stage's figures come from. */
    public Origin origin(StageType st) {
        return figures(st).origin;
    }

    /**
     * True when the stage has neither a circuit nor draw lines (a circuit without a DC solution
     * is not this: it is reported as unsolved): it counts as drawing nothing from any rail.
     */
    public boolean drawsNothing(StageType st) {
        return origin(st) == Origin.NONE && unsolved.stream().noneMatch(u -> u.stage().equals(st.name()));
    }

    /** Declared figures more than 25 % from the computed ones, in stage order. */
    public List<Mismatch> mismatches() {
        return mismatches;
    }

    /** Stages whose circuit has no DC solution at the machine's rails. */
    public List<Unsolved> unsolved() {
        return unsolved;
    }

    /** The voltage that stands for logic 0 at the stages' inputs when the figures are solved (ground). */
    public double levelLow() {
        return levelLow;
    }

    /** The voltage that stands for logic 1 (B+, the most positive rail; 0 without one). */
    public double levelHigh() {
        return levelHigh;
    }

    private Figures figures(StageType st) {
        Integer s = index.get(st.name());
        if (s == null) {
            throw new IllegalArgumentException("stage " + st.name() + " is not one of machine " + machine.name() + "'s");
        }
        return byStage[s];
    }

    private static Figures declared(Machine m, StageType st) {
        int rails = m.rails().size();
        double[] low = new double[rails];
        double[] high = new double[rails];
        boolean[] uses = new boolean[rails];
        boolean any = false;
        for (int r = 0; r < rails; r++) {
            double always = sum(st.drawAlways(), r, uses);
            low[r] = always + sum(st.drawLow(), r, uses);
            high[r] = always + sum(st.drawHigh(), r, uses);
            any |= uses[r];
        }
        return new Figures(any ? Origin.DECLARED : Origin.NONE, low, high, PlateDissipation.watts(m, st, low),
                PlateDissipation.watts(m, st, high), uses);
    }

    private static double sum(List<RailDraw> draws, int rail, boolean[] uses) {
        double a = 0;
        for (RailDraw d : draws) {
            if (d.rail() == rail) {
                a += Math.abs(d.amps());
                uses[rail] = true;
            }
        }
        return a;
    }

    /** The figures solved from the circuit; null (and an {@link Unsolved}) when some state has no solution. */
    private static Figures computed(Machine m, MachineCircuits mc, StageType st, StageCircuit c, int feed,
                                    double[] levels, List<Unsolved> unsolved, Origin fallback) {
        int rails = m.rails().size();
        double[] low = new double[rails];
        double[] high = new double[rails];
        boolean[] uses = new boolean[rails];
        double[] plate = new double[2];
        for (boolean stored : storedStates(c)) {
            for (boolean[] in : MarginAnalysis.states(c.inputs())) {
                double[] volts = new double[in.length];
                for (int i = 0; i < in.length; i++) {
                    volts[i] = in[i] ? levels[1] : levels[0];
                }
                DcResult r = mc.solver().solve(c, volts, stored, List.of(), Corner.NOMINAL);
                if (r instanceof NoDcSolution no) {
                    unsolved.add(new Unsolved(c.name(), no.reason(), fallback));
                    return null;
                }
                OperatingPoint p = r.point();
                boolean out = output(st, c, in, stored);
                double[] into = out ? high : low;
                double[] a = railAmps(m, p, feed, uses);
                for (int k = 0; k < rails; k++) {
                    into[k] = Math.max(into[k], a[k]);
                }
                int o = out ? 1 : 0;
                plate[o] = Math.max(plate[o], ownWatts(c, p));
            }
        }
        return new Figures(Origin.COMPUTED, low, high, plate[0], plate[1], uses);
    }

    /** Rail currents of a solve (magnitudes), with what the inputs feed counted on the feed rail. */
    private static double[] railAmps(Machine m, OperatingPoint p, int feed, boolean[] uses) {
        double[] a = new double[m.rails().size()];
        for (int r = 0; r < a.length; r++) {
            String name = m.rails().get(r).name();
            if (p.railAmps().containsKey(name)) {
                a[r] = Math.abs(p.railAmps(name));
                uses[r] = true;
            }
        }
        if (feed >= 0) {
            for (double in : p.inputAmps().values()) {
                if (in > 0) {
                    a[feed] += in;
                    uses[feed] = true;
                }
            }
        }
        return a;
    }

    /** Plate and screen watts of the stage's own tubes; a thyratron's arc drop times its current. */
    private static double ownWatts(StageCircuit c, OperatingPoint p) {
        double w = 0;
        for (TubeDissipation t : p.tubes()) {
            if (t.label().startsWith("driver.")) {
                w += t.sections() * (t.plateWatts() + (Double.isNaN(t.screenWatts()) ? 0 : t.screenWatts()));
            }
        }
        if (c instanceof ThyratronStage) {
            for (var part : p.parts()) {
                if (part.label().equals("driver.tube")) {
                    w += Math.abs(part.amps() * part.volts());
                }
            }
        }
        return w;
    }

    /** The machine's most positive rail (B+), which feeds every driving plate; -1 without one. */
    static int feedRail(Machine m) {
        int best = -1;
        for (int r = 0; r < m.rails().size(); r++) {
            Rail rail = m.rails().get(r);
            if (rail.volts() > 0 && (best < 0 || rail.volts() > m.rails().get(best).volts())) {
                best = r;
            }
        }
        return best;
    }

    /** The output value as the machine sees it: the stage function's, a latch's stored state. */
    static boolean output(StageType st, StageCircuit c, boolean[] in, boolean stored) {
        if (st.function().role() == StageFunction.Role.STORAGE || in.length == 0) {
            return stored;
        }
        boolean all = StageCircuit.all(in);
        boolean any = StageCircuit.any(in);
        switch (st.function().gate(in.length)) {
            case AND:
                return all;
            case OR:
                return any;
            case NAND:
                return !all;
            case NOR:
                return !any;
            case NOT:
                return !in[0];
            case XOR: {
                boolean x = false;
                for (boolean b : in) {
                    x ^= b;
                }
                return x;
            }
            default:
                return c instanceof ThyratronStage ? stored || in[0] : in[0];
        }
    }

    private static boolean[] storedStates(StageCircuit c) {
        return c instanceof FlipFlop || c instanceof ThyratronStage ? new boolean[] {false, true} : new boolean[] {false};
    }

    private static void compare(Machine m, StageType st, Figures declared, Figures computed, List<Mismatch> out) {
        for (int r = 0; r < m.rails().size(); r++) {
            for (boolean high : new boolean[] {false, true}) {
                double d = high ? declared.high[r] : declared.low[r];
                double c = high ? computed.high[r] : computed.low[r];
                double diff = Math.abs(d - c);
                if (diff >= MISMATCH_FLOOR_AMPS && diff > MISMATCH_FRACTION * c) {
                    out.add(new Mismatch(st.name(), m.rails().get(r).name(), high, d, c));
                }
            }
        }
    }
}
