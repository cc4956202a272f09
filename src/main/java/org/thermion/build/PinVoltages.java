package org.thermion.build;

import org.thermion.circuit.Corner;
import org.thermion.circuit.DcResult;
import org.thermion.circuit.Load;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.NoDcSolution;
import org.thermion.circuit.OperatingPoint;
import org.thermion.circuit.RailSet;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageSolver;
import org.thermion.levels.NetFanout;
import org.thermion.levels.Receivers;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.model.Rail;
import org.thermion.power.StateRails;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The DC voltage to ground a meter shows at every node of the wiring in one logic state of the
 * machine: each stage instance is solved at the voltages of the nets that drive it (latches first,
 * then gates in levelized order), with the inputs it drives as its load, at nominal values and at
 * the rails as that state loads them ({@link StateRails}: a rail behind a source resistance sits
 * lower, a bias rail taking current in nearer 0 V); a net takes its driver's output, a node inside a stage the stage's own operating
 * point, a heater link the sum of the heater voltages below it. Input voltages are rounded to
 * {@value #GRID} V so that stages alike share one solve (a meter reads no finer on a 300 V range).
 * Switches, the ROM and constants put 0 V or the highest rail on their lines.
 */
public final class PinVoltages {
    /** Input voltages are rounded to this step (volts) before a stage is solved. */
    public static final double GRID = 0.1;

    /** A logic state: per net, its value and whether the simulation knows it. */
    public record State(String name, String what, boolean[] high, boolean[] unknown) {
        public State {
            high = high.clone();
            unknown = unknown.clone();
        }

        boolean known(int net) {
            return !unknown[net];
        }
    }

    /**
     * Volts of every wiring node (index as {@link Wiring#nodes()}), NaN where none is known, {@code notes}
     * saying why; {@code warnings}: where the solved circuit contradicts the logic state;
     * {@code rails}: each rail's voltage in this state, in the machine's order.
     */
    public record Chart(State state, double[] volts, String[] notes, List<String> warnings, Map<String, Double> rails) {
        public Chart {
            volts = volts.clone();
            notes = notes.clone();
            warnings = List.copyOf(warnings);
            rails = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(rails));
        }

        public double volts(int node) {
            return volts[node];
        }

        public String note(int node) {
            return notes[node];
        }
    }

    private final BuildDocuments docs;
    private final Machine m;
    private final MachineCircuits circuits;
    private final StateRails stateRails;
    /** Solvers by the rail voltages they stand at (rounded to {@value #RAIL_STEP} V): states alike share one. */
    private final Map<List<Double>, StageSolver> solvers = new HashMap<>();
    private final NetFanout fanout;
    private final int[] qbar;
    private final Receivers receivers;
    private final Map<String, HeaterLink> heaterVolts = new HashMap<>();

    /**
     * A heater link: its voltage with the string across {@code railVolts} of rail {@code rail};
     * a series string divides whatever the rail stands at in proportion.
     */
    private record HeaterLink(double volts, String rail, double railVolts) {
        double at(RailSet rails) {
            Rail r = rails.rail(rail);
            return r == null || !(railVolts != 0) ? volts : volts * r.volts() / railVolts;
        }
    }
    /** The nodes behind the soft starts' resistors, by the rail whose voltage they take once the bypass has closed. */
    private final Map<String, String> behind = new HashMap<>();

    public PinVoltages(BuildDocuments docs) {
        this.docs = docs;
        this.m = docs.machine();
        this.circuits = docs.circuits();
        this.stateRails = new StateRails(m, org.thermion.power.StageDraw.of(m, circuits));
        this.fanout = NetFanout.of(m);
        this.receivers = new Receivers(m, circuits, fanout);
        this.qbar = BuildDocuments.complements(m.netlist());
        for (org.thermion.model.SoftStart ss : m.softStarts()) {
            Rail r = m.rails().get(ss.rail());
            behind.put(WiringBuilder.behindName(ss, r.name()), r.name());
        }
        for (HeaterWiring.HeaterRun run : docs.heaters()) {
            double below = 0;
            for (int i = run.steps().size() - 1; i >= 0; i--) {
                HeaterWiring.HeaterStep s = run.steps().get(i);
                heaterVolts.put(s.to(), new HeaterLink(below, run.rail(), run.railVolts()));
                below += s.volts();
                heaterVolts.putIfAbsent(s.from(), new HeaterLink(below, run.rail(), run.railVolts()));
            }
        }
    }

    /** The rails of one state: the solver at them and the highest and lowest of them. */
    private record At(StageSolver solver, double highest, double lowest) {
        RailSet rails() {
            return solver.rails();
        }
    }

    /** Rail voltages are rounded to this (volts) before a solver is chosen for them. */
    static final double RAIL_STEP = 0.01;

    private At rails(State s) {
        double[] v = stateRails.volts(net -> s.known(net) && s.high[net]);
        List<Double> key = new ArrayList<>();
        Map<String, Rail> set = new java.util.LinkedHashMap<>();
        double h = 0;
        double l = 0;
        for (int i = 0; i < v.length; i++) {
            Rail r = m.rails().get(i);
            double volts = Math.round(v[i] / RAIL_STEP) * RAIL_STEP;
            key.add(volts);
            set.put(r.name(), new Rail(r.name(), volts, r.sourceOhms(), r.limitAmps()));
            h = Math.max(h, volts);
            l = Math.min(l, volts);
        }
        StageSolver solver = solvers.computeIfAbsent(key, k -> new StageSolver(new RailSet(set)));
        return new At(solver, h, l);
    }

    /** The chart of every node in state {@code s}. */
    public Chart at(State s) {
        At at = rails(s);
        Netlist n = m.netlist();
        double[] net = new double[n.netCount()];
        String[] why = new String[n.netCount()];
        Arrays.fill(net, Double.NaN);
        Map<Integer, Solved> points = new HashMap<>();
        List<String> warnings = new ArrayList<>();
        for (NetFanout.Node node : fanout.nodes()) {
            if (node.source() == NetFanout.Source.OUTSIDE) {
                int r = node.net();
                if (s.known(r)) {
                    set(node, net, why, s.high[r] ? at.highest() : 0, null);
                } else {
                    set(node, net, why, Double.NaN, "state unknown");
                }
            }
        }
        for (Latch l : n.latches()) {
            if (l.stage() < 0) {
                continue;
            }
            int key = StageKey.latch(n, l.id());
            Solved r = solve(at, l.stage(), new double[0], new boolean[0], s, l.output());
            points.put(key, r);
            set(fanout.nodeOf(l.output()), net, why, r.volts(), r.note());
            double other = r.point("driver.plateB");
            if (r.point() != null && (s.high[l.output()] ? r.volts() <= other : r.volts() >= other)) {
                warnings.add(String.format(java.util.Locale.ROOT,
                        "flip-flop %s does not hold %d at these values: its plates settle at %.1f V and %.1f V",
                        n.netName(l.output()), s.high[l.output()] ? 1 : 0, r.volts(), other));
            }
            if (qbar[l.id()] >= 0) {
                set(fanout.nodeOf(qbar[l.id()]), net, why, r.point("driver.plateB"), r.note());
            }
        }
        for (Gate g : n.gates()) {
            if (g.stage() < 0) {
                continue;
            }
            int[] in = g.inputs();
            double[] v = new double[in.length];
            boolean[] logic = new boolean[in.length];
            String missing = null;
            for (int i = 0; i < in.length; i++) {
                v[i] = Math.round(net[in[i]] / GRID) * GRID;
                logic[i] = s.high[in[i]];
                if (Double.isNaN(net[in[i]])) {
                    missing = why[in[i]] == null ? "an input has no voltage" : why[in[i]];
                }
            }
            Solved r = missing != null ? new Solved(null, missing) : solve(at, g.stage(), v, logic, s, g.output());
            points.put(StageKey.gate(g.id()), r);
            set(fanout.nodeOf(g.output()), net, why, r.volts(), r.note());
        }
        bypasses(at, points);
        return chart(at, s, net, why, points, warnings);
    }

    private Chart chart(At at, State s, double[] net, String[] why, Map<Integer, Solved> points, List<String> warnings) {
        List<Node> nodes = docs.wiring().nodes();
        double[] volts = new double[nodes.size()];
        String[] notes = new String[nodes.size()];
        for (int i = 0; i < volts.length; i++) {
            Node node = nodes.get(i);
            double v = Double.NaN;
            String note = null;
            switch (node.kind()) {
                case NET -> {
                    v = net[node.net()];
                    note = why[node.net()];
                }
                case RAIL -> {
                    Rail r = at.rails().rail(node.name());
                    Double bypassed = behindAt(at, node.name());
                    v = node.name().equals(RailSet.GROUND) ? 0 : r != null ? r.volts() : bypassed != null ? bypassed : Double.NaN;
                    note = r == null && bypassed == null && !node.name().equals(RailSet.GROUND)
                            ? "clock pulses: no steady voltage" : null;
                }
                case LOCAL -> {
                    Solved p = points.get(node.stage());
                    v = p == null ? Double.NaN : p.point("driver." + node.point());
                    note = p == null ? "stage not solved" : p.note() != null ? p.note() : "not a node of the stage's circuit";
                }
                case HEATER -> {
                    HeaterLink d = heaterVolts.get(node.name());
                    v = d == null ? Double.NaN : d.at(at.rails());
                }
            }
            volts[i] = v;
            notes[i] = Double.isNaN(v) && note == null ? "no voltage known" : note;
        }
        Map<String, Double> rails = new java.util.LinkedHashMap<>();
        for (Rail r : m.rails()) {
            rails.put(r.name(), at.rails().rail(r.name()).volts());
        }
        return new Chart(s, volts, notes, warnings, rails);
    }

    /**
     * The soft starts' thyratrons, fired: every chart is of a machine switched on and warm, so each
     * bypass has closed (its grid network's input on the highest rail, as the wiring has it).
     */
    private void bypasses(At at, Map<Integer, Solved> points) {
        for (int i = 0; i < m.softStarts().size(); i++) {
            Optional<org.thermion.circuit.ThyratronStage> d = circuits.softStartDriver(m.softStarts().get(i));
            if (d.isPresent()) {
                DcResult r = at.solver().solve(d.get(), new double[] {at.highest()}, true, List.of(),
                        Corner.NOMINAL);
                points.put(StageKey.softStart(m, i), r instanceof NoDcSolution no
                        ? new Solved(null, "no operating point: " + no.reason()) : new Solved((OperatingPoint) r, null));
            }
        }
    }

    /** A node behind a soft start's resistor: its rail's voltage in this state; null for another node. */
    private Double behindAt(At at, String node) {
        String rail = behind.get(node);
        Rail r = rail == null ? null : at.rails().rail(rail);
        return r == null ? null : r.volts();
    }

    private static void set(NetFanout.Node node, double[] net, String[] why, double volts, String note) {
        for (int x : node.nets()) {
            net[x] = volts;
            why[x] = Double.isNaN(volts) ? note : null;
        }
    }

    /** A stage's solve: its operating point, or null and why not. */
    private record Solved(OperatingPoint point, String note) {
        double volts() {
            return point == null ? Double.NaN : point.outputVolts();
        }

        double point(String name) {
            Double d = point == null || name == null ? null : point.nodeVolts().get(name);
            return d == null ? Double.NaN : d;
        }
    }

    private Solved solve(At at, int stage, double[] volts, boolean[] logic, State s, int output) {
        Optional<StageCircuit> c = circuits.circuit(m.stages().get(stage));
        if (c.isEmpty()) {
            return new Solved(null, "stage " + m.stages().get(stage).name() + " declares its currents: no circuit");
        }
        if (volts.length > c.get().inputs()) {
            return new Solved(null, "stage " + c.get().name() + " has only " + c.get().inputs() + " inputs in its circuit");
        }
        if (volts.length < c.get().inputs()) {
            boolean neutral = neutral(c.get());
            int n = volts.length;
            volts = Arrays.copyOf(volts, c.get().inputs());
            logic = Arrays.copyOf(logic, volts.length);
            for (int i = n; i < volts.length; i++) {
                volts[i] = neutral ? at.highest() : at.lowest();
                logic[i] = neutral;
            }
        }
        // The stored state is the one that gives the simulated output: a flip-flop's side, a thyratron fired.
        boolean stored = s.high[output];
        if (c.get().logic(logic, stored) != s.high[output]) {
            stored = !stored;
        }
        if (c.get().inputs() == 0 && !s.known(output)) {
            return new Solved(null, "state unknown");
        }
        DcResult r = at.solver().solve(c.get(), volts, stored, loads(output), Corner.NOMINAL);
        if (r instanceof NoDcSolution no) {
            return new Solved(null, "no operating point: " + no.reason());
        }
        return new Solved((OperatingPoint) r, null);
    }

    /**
     * The value an input left unused stands at so that it changes nothing: true for a stage that
     * needs all its inputs (an AND, a series stack), false for one that needs any (an OR, a NOR).
     * The section is not wired; in the circuit it stands at the highest or lowest rail.
     */
    static boolean neutral(StageCircuit c) {
        boolean[] all = new boolean[c.inputs()];
        Arrays.fill(all, true);
        boolean[] one = all.clone();
        one[0] = false;
        return c.logic(all, false) != c.logic(one, false);
    }

    /** The inputs a net drives, as loads in a stable order (one cache key per kind of net). */
    private List<Load> loads(int net) {
        return receivers.loadsOn(fanout.nodeOf(net));
    }
}
