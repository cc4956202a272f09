package org.thermion.power.startup;

import org.thermion.model.BypassTrigger;
import org.thermion.model.Envelope;
import org.thermion.model.HeaterRating;
import org.thermion.model.HeaterString;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.SoftStart;
import org.thermion.model.StageType;
import org.thermion.model.TubeType;
import org.thermion.power.DrawingInstance;
import org.thermion.power.DrawingInstances;
import org.thermion.power.StageDraw;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

// About 400 lines: one reduction whose grouping tables (strings, nodes, plates, soft starts) are built together and read by index.
/**
 * The machine's supplies reduced to what the power-up transient needs: calibrated heater models,
 * heater strings grouped by identity (identical strings on one rail share one temperature
 * trajectory, so a machine of a hundred strings of one kind integrates a handful of states),
 * the plate and bias loads of every stage instance as conductances tied to the heater that warms
 * their cathode, and the soft-start networks. Immutable once built; {@link #solve} may be called
 * many times (a resistor sweep does).
 *
 * <p>Plate and bias loads are modelled as conductances {@code I_steady / V_rail}: stage currents
 * are set mostly by load resistors, so they fall with the rail voltage. Each is scaled by the
 * {@link Emission} factor of its envelope's heater.
 */
public final class StartupNetwork {
    final Machine machine;
    final ThermalAssumptions assumptions;
    final DrawMode drawMode;
    /** Each stage's steady draws: computed from its circuit, or declared (the budget's figures). */
    final StageDraw draw;
    final Emission emission;
    final List<HeaterModel> models;
    final List<String> notes;
    final ModelAdjustment adjust;

    // heater states (one per position of each distinct string)
    final int states;
    final int[] stateModel;
    final int[] stateGroup;
    final int[] statePosition;
    final double[] stateShunt;

    // distinct strings
    final int[] groupRail;
    /** The partial soft start whose resistor feeds the string (index in {@link #softs}; -1: the rail's bus). */
    final int[] groupSoft;
    final int[] groupCount;
    final double[] groupDrop;
    final int[][] groupStates;
    final String[] groupLabel;
    final boolean[] groupMixed;

    /** Per rail, the loads on its bus (behind its whole-rail soft starts, ahead of its partial ones). */
    final NodeLoads[] railLoads;

    // soft starts
    final List<Soft> softs;

    /**
     * A soft-start network as the solver sees it. {@code covered} holds the loads behind a partial
     * soft start's resistor (null: it is in series with the whole rail); {@code branchSoft} is the
     * partial soft start of rail {@code fromRail} whose resistor feeds the thyratron's plate circuit
     * (-1: the rail's bus).
     */
    record Soft(String name, int rail, double declaredOhms, double ratedWatts, double delay, int thyState,
                int fromRail, double branchSiemens, double branchVolts, double contactAmps,
                double operate, RelayDriverCheck check, NodeLoads covered, int branchSoft) {
        boolean thyratron() {
            return thyState >= 0;
        }

        boolean partial() {
            return covered != null;
        }
    }


    private StartupNetwork(Machine m, ThermalAssumptions a, DrawMode mode, boolean share, ModelAdjustment adjust) {
        this.adjust = adjust;
        this.machine = m;
        this.assumptions = a;
        this.drawMode = mode;
        this.draw = StageDraw.of(m);
        this.emission = new Emission(a);
        List<String> noteList = new ArrayList<>();

        // Heater models per tube type and rating.
        FiniteInputs.check(m);
        Map<String, Integer> modelIndex = new LinkedHashMap<>();
        List<HeaterModel> ml = new ArrayList<>();
        // Distinct strings.
        Map<String, Integer> groupIndex = new LinkedHashMap<>();
        List<HeaterString> groupFirst = new ArrayList<>();
        List<Integer> counts = new ArrayList<>();
        int[] envString = new int[m.envelopes().size()];
        int[] envPos = new int[m.envelopes().size()];
        Arrays.fill(envString, -1);
        List<Integer> groupCover = new ArrayList<>();
        for (HeaterString hs : m.heaterStrings()) {
            int cover = partialCovering(m, hs.rail(), ss -> ss.cover().coversString(hs, m.envelopes()));
            StringBuilder key = new StringBuilder().append(hs.rail()).append('|').append(hs.dropOhms()).append('|')
                    .append(hs.shunt()).append('|').append(cover).append('|').append(share ? 0 : groupFirst.size());
            for (int i = 0; i < hs.envelopes().size(); i++) {
                Envelope e = m.envelopes().get(hs.envelopes().get(i));
                HeaterRating r = hs.ratings().get(i);
                key.append('|').append(e.tube()).append('@').append(r.volts()).append('/').append(r.amps());
                String mk = e.tube() + "@" + r.volts() + "/" + r.amps();
                if (!modelIndex.containsKey(mk)) {
                    TubeType tt = m.tubes().get(e.tube());
                    modelIndex.put(mk, ml.size());
                    ml.add(HeaterCalibration.calibrate(tt.name(), r, adjust.warmup(tt.warmupSeconds(), a),
                            adjust.ratio(tt.coldHotRatio()), a));
                    if (!tt.hasWarmup()) {
                        noteList.add(tt.name() + ": no warm-up time declared; " + fmt(a.defaultWarmup())
                                + " s assumed (the controlled-warm-up figure)");
                    }
                }
            }
            Integer g = groupIndex.get(key.toString());
            if (g == null) {
                g = groupFirst.size();
                groupIndex.put(key.toString(), g);
                groupFirst.add(hs);
                groupCover.add(cover);
                counts.add(0);
            }
            counts.set(g, counts.get(g) + 1);
            for (int i = 0; i < hs.envelopes().size(); i++) {
                envString[hs.envelopes().get(i)] = g;
                envPos[hs.envelopes().get(i)] = i;
            }
        }
        this.models = List.copyOf(ml);
        int ng = groupFirst.size();
        groupRail = new int[ng];
        groupSoft = groupCover.stream().mapToInt(Integer::intValue).toArray();
        groupCount = new int[ng];
        groupDrop = new double[ng];
        groupStates = new int[ng][];
        groupLabel = new String[ng];
        groupMixed = new boolean[ng];
        List<int[]> st = new ArrayList<>();
        List<Double> shunts = new ArrayList<>();
        for (int g = 0; g < ng; g++) {
            HeaterString hs = groupFirst.get(g);
            groupRail[g] = hs.rail();
            groupCount[g] = counts.get(g);
            groupDrop[g] = hs.dropOhms();
            double stringAmps = 0;
            for (HeaterRating r : hs.ratings()) {
                stringAmps = Math.max(stringAmps, r.amps());
            }
            groupStates[g] = new int[hs.envelopes().size()];
            StringBuilder label = new StringBuilder();
            java.util.Set<Integer> tubeTypes = new java.util.HashSet<>();
            for (int i = 0; i < hs.envelopes().size(); i++) {
                Envelope e = m.envelopes().get(hs.envelopes().get(i));
                HeaterRating r = hs.ratings().get(i);
                tubeTypes.add(e.tube());
                int model = modelIndex.get(e.tube() + "@" + r.volts() + "/" + r.amps());
                groupStates[g][i] = st.size();
                st.add(new int[] {model, g, i});
                shunts.add(hs.shunt() && r.amps() < stringAmps - 1e-12 ? r.volts() / (stringAmps - r.amps())
                        : Double.POSITIVE_INFINITY);
                label.append(i == 0 ? "" : " + ").append(m.tubes().get(e.tube()).name());
            }
            if (hs.dropOhms() > 0) {
                label.append(" + ").append(fmt(hs.dropOhms())).append(" ohm");
            }
            if (groupSoft[g] >= 0) {
                label.append(" behind ").append(m.softStarts().get(groupSoft[g]).name());
            }
            groupLabel[g] = label.toString();
            groupMixed[g] = tubeTypes.size() > 1;
        }
        states = st.size();
        stateModel = new int[states];
        stateGroup = new int[states];
        statePosition = new int[states];
        stateShunt = new double[states];
        for (int s = 0; s < states; s++) {
            stateModel[s] = st.get(s)[0];
            stateGroup[s] = st.get(s)[1];
            statePosition[s] = st.get(s)[2];
            stateShunt[s] = shunts.get(s);
        }
        // NodeLoads per node: nodes 0..nr-1 are the rails' buses, node nr + k the far side of soft start k.
        int nr = m.rails().size();
        int nodes = nr + m.softStarts().size();
        List<List<Integer>> rg = new ArrayList<>();
        List<Map<Integer, Double>> plate = new ArrayList<>();
        for (int n = 0; n < nodes; n++) {
            rg.add(new ArrayList<>());
            plate.add(new HashMap<>());
        }
        for (int g = 0; g < ng; g++) {
            rg.get(groupSoft[g] < 0 ? groupRail[g] : nr + groupSoft[g]).add(g);
        }
        int[] envState = new int[m.envelopes().size()];
        for (int e = 0; e < envState.length; e++) {
            envState[e] = envString[e] < 0 ? -1 : groupStates[envString[e]][envPos[e]];
        }
        for (DrawingInstance d : DrawingInstances.of(m)) {
            if (d.kind() != DrawingInstance.Kind.BYPASS) { // the bypass thyratron is the relay driver's
                addDraw(m, m.stages().get(d.stage()), d.module(), envState, d.envelope(), plate);
            }
        }
        NodeLoads[] nodeLoads = new NodeLoads[nodes];
        for (int n = 0; n < nodes; n++) {
            Map<Integer, Double> p = plate.get(n);
            Double always = p.remove(-1);
            int[] keys = p.keySet().stream().mapToInt(Integer::intValue).sorted().toArray();
            double[] siemens = new double[keys.length];
            for (int i = 0; i < keys.length; i++) {
                siemens[i] = p.get(keys[i]);
            }
            nodeLoads[n] = new NodeLoads(rg.get(n).stream().mapToInt(Integer::intValue).toArray(), keys, siemens,
                    always == null ? 0 : always);
        }
        railLoads = Arrays.copyOf(nodeLoads, nr);

        // Soft starts.
        List<Soft> sl = new ArrayList<>();
        for (SoftStart ss : m.softStarts()) {
            double delay = Double.NaN;
            int thy = -1;
            double bs = 0, bv = 0;
            int from = -1;
            int branchSoft = -1;
            RelayDriverCheck check = null;
            if (ss.trigger() instanceof BypassTrigger.AfterDelay d) {
                delay = d.seconds();
            } else if (ss.trigger() instanceof BypassTrigger.ThyratronWarm tw) {
                thy = envState[tw.envelope()];
                if (thy < 0) {
                    throw new IllegalArgumentException("soft start " + ss.name() + ": its thyratron has no heater string");
                }
                from = tw.fromRail();
                int module = m.envelopes().get(tw.envelope()).module();
                branchSoft = partialCovering(m, from, c -> c.cover().coversModule(module));
                TubeType tube = m.tubes().get(tw.tube());
                double arc = tube.arcDropVolts();
                if (Double.isNaN(arc)) {
                    arc = 10;
                    noteList.add(tube.name() + ": no arc drop declared; 10 V assumed (8-12 V is typical of small gas thyratrons)");
                }
                Rail fr = rail(from);
                check = RelayDriverCheck.of(tube.name(), fr.name(), fr.volts(), fr.sourceOhms(), arc, tw.plateOhms(),
                        ss.relay(), tube.avgCathodeAmps(), tube.peakCathodeAmps(), Double.NaN, tube.warmupSeconds());
                if (tube.warmupSeconds() > 0) {
                    noteList.add(tube.name() + " of soft start " + ss.name() + ": its anode has rail " + fr.name()
                            + "'s voltage from switch-on, before its rated " + fmt(tube.warmupSeconds())
                            + " s of cathode heating (a rating a builder may knowingly bend)");
                }
                bs = 1 / (tw.plateOhms() + ss.relay().coilOhms());
                bv = arc;
            }
            sl.add(new Soft(ss.name(), ss.rail(), ss.resistorOhms(), ss.ratedWatts(), delay, thy, from, bs, bv,
                    ss.relay().contactAmps(), ss.relay().operateSeconds(), check,
                    ss.cover().isWholeRail() ? null : nodeLoads[nr + sl.size()], branchSoft));
        }
        softs = List.copyOf(sl);
        notes = List.copyOf(noteList);
    }

    /** {@code base} with one more soft start (a copy: the network stays immutable). */
    private StartupNetwork(StartupNetwork base, Soft extra) {
        this.machine = base.machine;
        this.adjust = base.adjust;
        this.assumptions = base.assumptions;
        this.drawMode = base.drawMode;
        this.draw = base.draw;
        this.emission = base.emission;
        this.models = base.models;
        this.notes = base.notes;
        this.states = base.states;
        this.stateModel = base.stateModel;
        this.stateGroup = base.stateGroup;
        this.statePosition = base.statePosition;
        this.stateShunt = base.stateShunt;
        this.groupRail = base.groupRail;
        this.groupCount = base.groupCount;
        this.groupDrop = base.groupDrop;
        this.groupStates = base.groupStates;
        this.groupLabel = base.groupLabel;
        this.groupMixed = base.groupMixed;
        this.groupSoft = base.groupSoft;
        this.railLoads = base.railLoads;
        List<Soft> sl = new ArrayList<>(base.softs);
        sl.add(extra);
        this.softs = List.copyOf(sl);
    }

    /** Name of the soft start {@link #withTimedSoftStart} adds. */
    public static final String SIZING = "sizing";

    /**
     * This network with a soft start of no resistor, bypassed by timer, in rail {@code rail}: what
     * {@link SoftStartSizing} varies on a machine that declares none.
     */
    StartupNetwork withTimedSoftStart(int rail) {
        return new StartupNetwork(this, new Soft(SIZING, rail, 0, Double.POSITIVE_INFINITY, Double.NaN, -1, -1, 0, 0,
                Double.NaN, 0, null, null, -1));
    }

    /** Builds the network of {@code m} under the given assumptions. */
    public static StartupNetwork of(Machine m, ThermalAssumptions a, DrawMode mode) {
        return new StartupNetwork(m, a, mode, true, ModelAdjustment.none());
    }

    /** The network of {@code m} with the figures a bench trace corrected ({@link TraceFit}). */
    public static StartupNetwork of(Machine m, ThermalAssumptions a, DrawMode mode, ModelAdjustment adjust) {
        return new StartupNetwork(m, a, mode, true, adjust);
    }

    /** Rail {@code r} as the model sees it (declared, or as a bench trace corrected it). */
    Rail rail(int r) {
        return adjust.apply(machine.rails().get(r), r);
    }

    /**
     * The same network with one trajectory per heater string, identical or not: slower, the same
     * answer (for tests of the sharing and for the bench's worst case).
     */
    public static StartupNetwork unshared(Machine m, ThermalAssumptions a, DrawMode mode) {
        return new StartupNetwork(m, a, mode, false, ModelAdjustment.none());
    }

    /** Solves the transient. */
    public PowerUpResult solve(PowerUpOptions o) {
        for (String name : o.resistorOhms().keySet()) {
            if (softs.stream().noneMatch(s -> s.name().equals(name))) {
                throw new IllegalArgumentException("no soft start named '" + name + "'");
            }
        }
        return new TransientRun(this, o).run();
    }

    /** Names of the soft-start networks, in machine order. */
    public List<String> softStartNames() {
        return softs.stream().map(Soft::name).toList();
    }

    /** Number of distinct heater trajectories integrated. */
    public int heaterStates() {
        return states;
    }

    /** Steady current a stage instance draws from a rail under the draw mode, amperes. */
    double drawAmps(StageType st, int rail) {
        return drawMode == DrawMode.HIGHEST ? draw.maxAmps(st, rail)
                : 0.5 * (draw.amps(st, rail, false) + draw.amps(st, rail, true));
    }

    private void addDraw(Machine m, StageType st, int module, int[] envState, int env, List<Map<Integer, Double>> plate) {
        int nr = m.rails().size();
        for (int r = 0; r < nr; r++) {
            double v = Math.abs(m.rails().get(r).volts());
            double amps = drawAmps(st, r);
            if (amps > 0 && v > 0) {
                int s = env < 0 ? -1 : envState[env];
                int soft = partialCovering(m, r, ss -> ss.cover().coversModule(module));
                plate.get(soft < 0 ? r : nr + soft).merge(s, amps / v, Double::sum);
            }
        }
    }

    /** The partial soft start of rail {@code rail} that covers a load (index in the machine's list), or -1. */
    private static int partialCovering(Machine m, int rail, java.util.function.Predicate<SoftStart> covers) {
        for (int k = 0; k < m.softStarts().size(); k++) {
            SoftStart ss = m.softStarts().get(k);
            if (ss.rail() == rail && !ss.cover().isWholeRail() && covers.test(ss)) {
                return k;
            }
        }
        return -1;
    }

    static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e9 ? String.valueOf((long) v)
                : String.format(java.util.Locale.ROOT, "%.3g", v);
    }
}
