package org.thermion.levels;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.thermion.circuit.Corner;
import org.thermion.circuit.InputLevels;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.MarginAnalysis;
import org.thermion.circuit.NetAnalysis;
import org.thermion.circuit.NoiseMargins;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.Tolerances;
import org.thermion.circuit.WorstCase;
import org.thermion.circuit.WorstMargin;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.StageType;

/**
 * Levels and noise margins of every node of a machine, under its real load, at its own rails.
 * Each node's driver is solved with every input pin it feeds as a load; its inputs stand at the
 * nominal levels of the nodes that drive them (nodes come in levelized order, latches first),
 * rounded outward to {@value #GRID} V so nodes alike share one solve; its worst-case margins also
 * at the levels those nodes have at their own worst corners, where that is worse. Inputs from outside the tube
 * logic (switches, the ROM, constants) are taken as switched between 0 V and the highest rail.
 * Each margin is then taken to the tolerance corner that worsens it ({@link WorstCase}). Nodes of
 * one kind (driver, input levels, receivers) are analysed once: a large machine costs one
 * analysis per kind of net. Lamp and coil drivers are judged by their load current
 * ({@link DriveAnalysis}). Not thread-safe.
 */
public final class LevelAnalysis {
    /** Input levels are rounded outward to this step (volts) so that near-equal nets share a solve. */
    public static final double GRID = 0.1;

    private final Machine machine;
    private final MachineCircuits circuits;
    private final Tolerances tolerances;
    private final double minMargin;
    private final MarginAnalysis analysis;
    private final WorstCase worstCase;
    private final Map<Kind, Figures> byKind = new HashMap<>();
    private final List<NetLevel> nets = new ArrayList<>();
    private final List<NetAnalysis> points = new ArrayList<>();
    private final List<StageUse> pointUses = new ArrayList<>();
    private final List<LoadDrive> drives;
    private final Receivers receivers;
    private final RailsUnderLoad rails;

    private record Kind(StageCircuit driver, InputLevels levels, InputLevels worstLevels, List<StageCircuit> receivers) {
    }

    /**
     * One kind's figures; {@code worstVoh}/{@code worstVol} the net's own levels at the corners of
     * its worst high and low margins (what the stages it drives see in their worst case).
     */
    private record Figures(NoiseMargins nominal, WorstMargin high, WorstMargin low, int fanOut, String limitKind,
                           NetAnalysis points, double worstVoh, double worstVol) {
    }

    private LevelAnalysis(Machine machine, MachineCircuits circuits, RailsUnderLoad rails, Tolerances tolerances,
                          double minMargin) {
        this.machine = machine;
        this.circuits = circuits;
        this.rails = rails;
        this.tolerances = tolerances.withLightRise(rails.lightRise());
        this.minMargin = minMargin;
        this.analysis = new MarginAnalysis(rails.solver());
        this.worstCase = new WorstCase(analysis, this.tolerances);
        NetFanout fanout = NetFanout.of(machine);
        this.receivers = new Receivers(machine, circuits, fanout);
        double[] high = new double[machine.netlist().netCount()];
        double[] low = new double[high.length];
        double outsideHigh = Math.max(0, rails.solver().rails().highest().volts());
        java.util.Arrays.fill(high, outsideHigh);
        double[] worstHigh = high.clone();
        double[] worstLow = low.clone();
        for (NetFanout.Node node : order(fanout)) {
            NetLevel level = analyse(fanout, node, low, high, worstLow, worstHigh);
            if (level == null) {
                continue;
            }
            nets.add(level);
            if (Double.isFinite(level.voh()) && Double.isFinite(level.vol())) {
                for (int net : node.nets()) {
                    high[net] = level.voh();
                    low[net] = level.vol();
                    worstHigh[net] = Double.isFinite(level.worstVoh()) ? Math.min(level.voh(), level.worstVoh()) : level.voh();
                    worstLow[net] = Double.isFinite(level.worstVol()) ? Math.max(level.vol(), level.worstVol()) : level.vol();
                }
            }
        }
        nets.sort(Comparator.comparingDouble(LevelAnalysis::sortKey).thenComparing(NetLevel::name));
        this.drives = new DriveAnalysis(machine, circuits, rails.solver(), this.tolerances)
                .drives(fanout, low, high, worstLow, worstHigh);
    }

    /**
     * Analyses {@code machine} at its rails under its heaviest static load, each rail's tolerance
     * reaching up to its lightest load's voltage ({@link RailsUnderLoad}), with these tolerances
     * and minimum margin (volts).
     */
    public static LevelAnalysis of(Machine machine, MachineCircuits circuits, Tolerances tolerances, double minMargin) {
        return new LevelAnalysis(machine, circuits, RailsUnderLoad.of(machine, circuits, tolerances.rail()), tolerances,
                minMargin);
    }

    /** Analyses {@code machine} at its own rails with its declared margin rules. */
    public static LevelAnalysis of(Machine machine, org.thermion.model.MarginRules rules) {
        return of(machine, MachineCircuits.of(machine),
                new Tolerances(rules.rail(), rules.resistor(), rules.endOfLife()), rules.minMargin());
    }

    /** Every node with a stage driver or a receiver, worst margin first (nets without margins last). */
    public List<NetLevel> nets() {
        return Collections.unmodifiableList(nets);
    }

    /** Every lamp and coil driver. */
    public List<LoadDrive> drives() {
        return drives;
    }

    /** The tolerances the worst cases take, each rail's reaching up to its lightest load's voltage. */
    public Tolerances tolerances() {
        return tolerances;
    }

    /** The rails the levels are solved at, and how far each rises at the lightest load. */
    public RailsUnderLoad rails() {
        return rails;
    }

    public double minMargin() {
        return minMargin;
    }

    /** Transfer curves swept for the receivers' thresholds. */
    public int sweeps() {
        return analysis.sweeps();
    }

    /** Distinct kinds of net analysed (each once). */
    public int kinds() {
        return byKind.size();
    }

    /** The driving stage uses with their nominal operating points in every input state, for rating checks. */
    public List<StageUse> pointUses() {
        return Collections.unmodifiableList(pointUses);
    }

    /** The operating points of {@link #pointUses()}, in the same order. */
    public List<NetAnalysis> points() {
        return Collections.unmodifiableList(points);
    }

    private static double sortKey(NetLevel n) {
        double w = n.worstMargin();
        return Double.isNaN(w) ? Double.POSITIVE_INFINITY : w;
    }

    /** Latch outputs first (a flip-flop's level needs no input), then their complements, then gates in order. */
    private static List<NetFanout.Node> order(NetFanout fanout) {
        List<NetFanout.Node> first = new ArrayList<>();
        List<NetFanout.Node> second = new ArrayList<>();
        List<NetFanout.Node> gates = new ArrayList<>();
        List<NetFanout.Node> rest = new ArrayList<>();
        for (NetFanout.Node n : fanout.nodes()) {
            switch (n.source()) {
                case LATCH -> first.add(n);
                case COMPLEMENT -> second.add(n);
                case GATE -> gates.add(n);
                default -> rest.add(n);
            }
        }
        gates.sort(Comparator.comparingInt(NetFanout.Node::driver));
        first.addAll(second);
        first.addAll(gates);
        first.addAll(rest);
        return first;
    }

    private NetLevel analyse(NetFanout fanout, NetFanout.Node node, double[] low, double[] high, double[] worstLow,
                             double[] worstHigh) {
        Receivers.Found found = receivers.of(node);
        List<StageCircuit> receivers = found.circuits();
        List<String> missing = found.missing();
        String receiverText = describe(receivers, missing);
        int loads = node.pins().size();
        if (node.source() == NetFanout.Source.OUTSIDE) {
            if (node.pins().isEmpty()) {
                return null;
            }
            return outside(node, receivers, receiverText, loads, low[node.net()], high[node.net()]);
        }
        StageUse use = driverUse(fanout, node);
        StageType st = stageOf(use.latch(), use.index());
        if (st.function().isDriver()) {
            return null;
        }
        Optional<StageCircuit> driver = circuits.circuit(st);
        if (driver.isEmpty()) {
            return new NetLevel(node.name(), st.name(), use, null, null, false, loads, receiverText, Double.NaN,
                    Double.NaN, Double.NaN, Double.NaN, null, null, -1, "", Double.NaN, Double.NaN,
                    "stage " + st.name() + " declares its currents: no circuit to solve");
        }
        StageCircuit d = driver.get();
        InputLevels levels = inputLevels(d, use, low, high);
        InputLevels worstLevels = inputLevels(d, use, worstLow, worstHigh);
        if (receivers.isEmpty()) {
            NetAnalysis a = analysis.net(d, levels, List.of());
            remember(use, a);
            NoiseMargins m = a.margins();
            return new NetLevel(node.name(), st.name(), use, levels, worstLevels, MarginAnalysis.restores(d), loads,
                    receiverText, m.voh(), m.vol(), Double.NaN, Double.NaN, null, null, -1, "", Double.NaN, Double.NaN,
                    m.problem() != null && !"no receivers".equals(m.problem()) ? m.problem()
                            : loads == 0 ? "feeds no stage (an output)" : "its receivers declare their currents");
        }
        Kind kind = new Kind(d, levels, worstLevels, List.copyOf(receivers));
        Figures f = byKind.get(kind);
        if (f == null) {
            f = figures(d, levels, worstLevels, receivers);
            byKind.put(kind, f);
        }
        remember(use, f.points());
        NoiseMargins m = f.nominal();
        String note = m.problem() != null ? m.problem() : missing.isEmpty() ? "" : "not counted: " + missing;
        double vih = m.thresholds() == null ? Double.NaN : m.thresholds().vih();
        double vil = m.thresholds() == null ? Double.NaN : m.thresholds().vil();
        return new NetLevel(node.name(), st.name(), use, levels, worstLevels, MarginAnalysis.restores(d), loads,
                receiverText, m.voh(), m.vol(), vih, vil, f.high(), f.low(), f.fanOut(), f.limitKind(), f.worstVoh(),
                f.worstVol(), note);
    }

    private void remember(StageUse use, NetAnalysis a) {
        pointUses.add(use);
        points.add(a);
    }

    /**
     * A kind's figures. Each worst-case margin is the lower of two: with the driver's inputs at
     * their nominal levels, and at the levels their own drivers give at their worst corners (an
     * upstream stage worn or off tolerance hands on a poorer level). The two corners are found
     * apart, so a rail may sit at one end upstream and the other here: conservative.
     */
    private Figures figures(StageCircuit d, InputLevels levels, InputLevels worstLevels, List<StageCircuit> receivers) {
        NetAnalysis a = analysis.net(d, levels, receivers);
        NoiseMargins nominal = a.margins();
        if (nominal.problem() != null) {
            return new Figures(nominal, null, null, -1, "", a, Double.NaN, Double.NaN);
        }
        List<WorstMargin> w = worstCase.margins(d, levels, receivers);
        InputLevels highAt = levels;
        InputLevels lowAt = levels;
        WorstMargin high = w.get(0);
        WorstMargin low = w.get(1);
        if (!worstLevels.equals(levels)) {
            List<WorstMargin> fromWorst = worstCase.margins(d, worstLevels, receivers);
            if (fromWorst.get(0).worst() < high.worst()) {
                high = new WorstMargin(high.side(), high.nominal(), fromWorst.get(0).worst(), fromWorst.get(0).corner());
                highAt = worstLevels;
            }
            if (fromWorst.get(1).worst() < low.worst()) {
                low = new WorstMargin(low.side(), low.nominal(), fromWorst.get(1).worst(), fromWorst.get(1).corner());
                lowAt = worstLevels;
            }
        }
        boolean highWorse = high.worst() <= low.worst();
        Corner corner = highWorse ? high.corner() : low.corner();
        InputLevels limitAt = highWorse ? highAt : lowAt;
        int limit = Integer.MAX_VALUE;
        String limitKind = "";
        for (StageCircuit r : new java.util.LinkedHashSet<>(receivers)) {
            if (!MarginAnalysis.restores(r)) {
                continue; // a diode gate or follower has no threshold of its own: judged at its output
            }
            int k = analysis.fanOut(d, limitAt, r, minMargin, corner);
            if (k < limit) {
                limit = k;
                limitKind = r.name();
            }
        }
        if (limit == Integer.MAX_VALUE) {
            limit = -1;
        }
        double worstVoh = analysis.margins(d, highAt, receivers, high.corner()).voh();
        double worstVol = analysis.margins(d, lowAt, receivers, low.corner()).vol();
        return new Figures(nominal, high, low, limit, limitKind, a, worstVoh, worstVol);
    }

    /** A line driven from outside: its levels are the switch's, its thresholds its receivers'. */
    private NetLevel outside(NetFanout.Node node, List<StageCircuit> receivers, String text, int loads, double low,
                             double high) {
        double vil = Double.POSITIVE_INFINITY;
        double vih = Double.NEGATIVE_INFINITY;
        for (StageCircuit r : receivers) {
            var t = analysis.thresholds(r, Corner.NOMINAL);
            if (t != null) {
                vil = Math.min(vil, t.vil());
                vih = Math.max(vih, t.vih());
            }
        }
        if (!Double.isFinite(vil)) {
            return new NetLevel(node.name(), "", null, null, null, false, loads, text, high, low, Double.NaN,
                    Double.NaN, null, null, -1, "", Double.NaN, Double.NaN, "driven from outside");
        }
        WorstMargin h = new WorstMargin(WorstMargin.Side.HIGH, high - vih, high - vih, Corner.NOMINAL);
        WorstMargin l = new WorstMargin(WorstMargin.Side.LOW, vil - low, vil - low, Corner.NOMINAL);
        return new NetLevel(node.name(), "", null, null, null, false, loads, text, high, low, vih, vil, h, l, -1, "",
                Double.NaN, Double.NaN, "driven from outside (0 V / highest rail)");
    }

    /** The stage use that drives a node (a complement is driven by its latch). */
    private static StageUse driverUse(NetFanout fanout, NetFanout.Node node) {
        if (node.source() == NetFanout.Source.COMPLEMENT) {
            NetFanout.Node latch = fanout.nodeOf(node.driver());
            return new StageUse(latch.source() == NetFanout.Source.LATCH, latch.driver());
        }
        return new StageUse(node.source() == NetFanout.Source.LATCH, node.driver());
    }

    StageType stageOf(boolean latch, int index) {
        int s = latch ? machine.netlist().latches().get(index).stage() : machine.netlist().gates().get(index).stage();
        return machine.stages().get(s);
    }

    /** The driver's input levels: the worst of its input nets' levels, rounded outward to {@link #GRID}. */
    InputLevels inputLevels(StageCircuit d, StageUse use, double[] low, double[] high) {
        if (d.inputs() == 0) {
            return new InputLevels(0, 0);
        }
        int[] in;
        if (use.latch()) {
            Latch l = machine.netlist().latches().get(use.index());
            in = new int[] {l.data()};
        } else {
            Gate g = machine.netlist().gates().get(use.index());
            in = g.inputs();
        }
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        for (int net : in) {
            lo = Math.max(lo, low[net]);
            hi = Math.min(hi, high[net]);
        }
        return outward(lo, hi);
    }

    /** Levels rounded outward to {@link #GRID}: the low one up, the high one down (the worse way). */
    static InputLevels outward(double low, double high) {
        return new InputLevels(Math.ceil(low / GRID - 1e-9) * GRID, Math.floor(high / GRID + 1e-9) * GRID);
    }

    private static String describe(List<StageCircuit> receivers, List<String> missing) {
        Map<String, Integer> count = new java.util.TreeMap<>();
        for (StageCircuit r : receivers) {
            count.merge(r.name(), 1, Integer::sum);
        }
        for (String m : missing) {
            count.putIfAbsent(m, 0);
        }
        StringBuilder sb = new StringBuilder();
        count.forEach((k, v) -> {
            if (sb.length() > 0) {
                sb.append(' ');
            }
            sb.append(k).append(v > 1 ? "x" + v : "");
        });
        return sb.toString();
    }
}
