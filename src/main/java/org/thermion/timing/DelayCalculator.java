package org.thermion.timing;

import org.thermion.circuit.Corner;
import org.thermion.circuit.Load;
import org.thermion.circuit.MachineCircuits;
import org.thermion.levels.NetFanout;
import org.thermion.levels.Receivers;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.Tolerances;
import org.thermion.circuit.TubeStage;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.model.ProgramCounter;
import org.thermion.model.StageType;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.List;

/**
 * Works out every stage instance's rise and fall delay. A delay the stage declares is
 * used as given. A stage with a circuit gets ln 9 R C with R its effective output resistance for
 * that edge computed from its operating points under its real loads ({@link StageDrive}); a stage
 * without one gets R_load for the rise and r_on for the fall (swapped for a load returned to a
 * negative rail, which pulls the output down). C is the capacitance the output drives: the
 * stage's own output capacitance, the input capacitance of every stage input on the net (through
 * free cells, which are wires or a flip-flop's other plate; a triode's Miller term with its
 * computed gain where it has a circuit), and the stage's wiring capacitance per connection.
 * At the slow corner each edge's parameters sit at the tolerance ends that slow it; declared
 * resistances are scaled to the same ends (load up by the resistor tolerance, r_on by 1 / end of
 * life), declared delays stay as given.
 */
public final class DelayCalculator {
    private final Machine machine;
    private final Netlist netlist;
    /** For each net, the stage-type index of every stage input pin on it (-1: a pin without a stage). */
    private final List<List<Integer>> pins;

    private final MachineCircuits circuits;
    private final StageDrive drive;
    private final Tolerances slow;
    private NetFanout fanout;
    private Receivers receivers;

    /** Nominal delays, from the machine's own circuits where its stages have them. */
    public DelayCalculator(Machine machine) {
        this(machine, MachineCircuits.of(machine), null);
    }

    /**
     * Delays from {@code circuits}; {@code slow} null for nominal values, else the tolerances
     * whose slow ends are taken.
     */
    public DelayCalculator(Machine machine, MachineCircuits circuits, Tolerances slow) {
        this(machine, circuits, new StageDrive(circuits.solver(), highRail(machine)), slow);
    }

    /** As above, sharing {@code drive}'s cached figures. */
    public DelayCalculator(Machine machine, MachineCircuits circuits, StageDrive drive, Tolerances slow) {
        this.machine = machine;
        this.circuits = circuits;
        this.drive = drive;
        this.slow = slow;
        this.netlist = machine.netlist();
        int n = netlist.netCount();
        List<List<Integer>> direct = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            direct.add(new ArrayList<>());
        }
        List<List<Integer>> freeOut = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            freeOut.add(new ArrayList<>());
        }
        for (Gate g : netlist.gates()) {
            for (int in : g.inputs()) {
                if (g.stage() >= 0) {
                    direct.get(in).add(g.stage());
                } else {
                    freeOut.get(in).add(g.output());
                }
            }
        }
        for (Latch l : netlist.latches()) {
            direct.get(l.data()).add(l.stage());
            if (l.enable() >= 0) {
                direct.get(l.enable()).add(l.stage());
            }
        }
        ProgramCounter pc = machine.pc();
        if (pc != null) {
            if (pc.jumpNet() >= 0) {
                direct.get(pc.jumpNet()).add(-1);
            }
            for (int t : pc.targetNets()) {
                direct.get(t).add(-1);
            }
        }
        pins = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            pins.add(null);
        }
        // Free cells form a forest in levelized order; resolve from the last net backwards.
        for (int i = n - 1; i >= 0; i--) {
            resolve(i, direct, freeOut);
        }
    }

    private List<Integer> resolve(int net, List<List<Integer>> direct, List<List<Integer>> freeOut) {
        List<Integer> have = pins.get(net);
        if (have != null) {
            return have;
        }
        List<Integer> all = new ArrayList<>(direct.get(net));
        for (int out : freeOut.get(net)) {
            all.addAll(resolve(out, direct, freeOut));
        }
        pins.set(net, all);
        return all;
    }

    /** The level a logic 1 input is held at when figures are computed: the machine's highest rail. */
    public static double highRail(Machine machine) {
        double h = 0;
        for (org.thermion.model.Rail r : machine.rails()) {
            h = Math.max(h, r.volts());
        }
        return h;
    }

    /** The circuits the figures come from. */
    public MachineCircuits circuits() {
        return circuits;
    }

    /** The tolerances of the slow corner, or null for nominal values. */
    public Tolerances slowTolerances() {
        return slow;
    }

    /** The figures' source, shared by calculators of one machine. */
    public StageDrive drive() {
        return drive;
    }

    /** The circuit of a stage type, or null. */
    public StageCircuit circuit(StageType st) {
        return circuits.circuit(st).orElse(null);
    }

    /**
     * The grid gains a triode receiver's input is counted with: computed at its operating points
     * where it has a circuit, else its declared gain (an inverting stage; 1 when not declared).
     */
    public StageDrive.GridGains gains(StageType st) {
        StageCircuit c = circuit(st);
        StageDrive.GridGains g = c == null ? null : drive.gridGains(c);
        return g != null ? g : StageDrive.GridGains.declared(st);
    }

    /** |gain| from a receiver's grid to its output: computed where it has a circuit, else declared. */
    public double gain(StageType st) {
        StageCircuit c = circuit(st);
        double g = c == null ? Double.NaN : drive.millerGain(c);
        return Double.isNaN(g) ? st.gain() : g;
    }

    /** True when {@link #gain} is computed. */
    public boolean gainComputed(StageType st) {
        StageCircuit c = circuit(st);
        return c != null && !Double.isNaN(drive.millerGain(c));
    }

    /**
     * The capacitance one input of {@code st} puts on the net that drives it (Miller effect included):
     * one grid's, times the sections that input drives together (a lamp or relay driver's pair).
     */
    public double inputFarads(StageType st) {
        StageCircuit c = circuit(st);
        int grids = c instanceof TubeStage t ? t.sectionsPerInput() : 1;
        return grids * Capacitance.input(tube(st), gains(st));
    }

    /** Stage-type indices of the stage inputs a net drives (-1 for off-board pins such as the PC). */
    public List<Integer> pinsOn(int net) {
        return pins.get(net);
    }

    /** The stage's own output capacitance with {@code sections} sections. */
    public double ownFarads(StageType st, int sections) {
        return Capacitance.output(tube(st), sections);
    }

    /** The capacitance the stage {@code st} sees when its output is {@code net} and uses {@code sections}. */
    public double drivenFarads(StageType st, int sections, int net) {
        double c = Capacitance.output(tube(st), sections);
        for (int s : pins.get(net)) {
            if (s >= 0) {
                StageType driven = machine.stages().get(s);
                c += inputFarads(driven);
            }
        }
        c += Capacitance.orZero(st.wiringFarads()) * pins.get(net).size();
        return c;
    }

    /** The delay of gate {@code g}; a free cell has none. */
    public StageDelay gate(Gate g) {
        if (g.stage() < 0) {
            return new StageDelay(0, 0, 0, 0, true, true, "free");
        }
        StageType st = machine.stages().get(g.stage());
        return delay(st, st.sectionsFor(g.arity()), g.output());
    }

    /** The delay of latch {@code l} from its loading edge to its output settling. */
    public StageDelay latch(Latch l) {
        if (l.stage() < 0) {
            return new StageDelay(0, 0, 0, 0, true, true, "free");
        }
        StageType st = machine.stages().get(l.stage());
        return delay(st, st.sectionsFor(1), l.output());
    }

    /** Delays of every gate, in netlist order. */
    public StageDelay[] gates() {
        StageDelay[] d = new StageDelay[netlist.gates().size()];
        for (int i = 0; i < d.length; i++) {
            d[i] = gate(netlist.gates().get(i));
        }
        return d;
    }

    /** Delays of every latch, in netlist order. */
    public StageDelay[] latches() {
        StageDelay[] d = new StageDelay[netlist.latches().size()];
        for (int i = 0; i < d.length; i++) {
            d[i] = latch(netlist.latches().get(i));
        }
        return d;
    }

    private StageDelay delay(StageType st, int sections, int net) {
        double c = drivenFarads(st, sections, net);
        String problem = "";
        boolean riseGiven = !Double.isNaN(st.rise());
        boolean fallGiven = !Double.isNaN(st.fall());
        StageCircuit circuit = circuit(st);
        if (circuit != null) {
            List<Load> loads = loadsOn(net);
            Corner riseAt = slow == null ? Corner.NOMINAL : drive.slowCorner(circuit, loads, slow, true);
            Corner fallAt = slow == null ? Corner.NOMINAL : drive.slowCorner(circuit, loads, slow, false);
            StageDrive.Edges nominal = drive.edges(circuit, loads, Corner.NOMINAL);
            double rOhms = drive.edges(circuit, loads, riseAt).riseOhms();
            double fOhms = drive.edges(circuit, loads, fallAt).fallOhms();
            problem = nominal.problem();
            StringBuilder slowNote = new StringBuilder();
            if (Double.isNaN(rOhms) && nominal.solved()) {
                rOhms = nominal.riseOhms();
                slowNote.append("no rising edge at its slow corner (").append(riseAt.describe(drive.solver().rails())).append("): nominal R");
            }
            if (Double.isNaN(fOhms) && nominal.solved()) {
                fOhms = nominal.fallOhms();
                slowNote.append(slowNote.length() > 0 ? "; " : "").append("no falling edge at its slow corner (")
                        .append(fallAt.describe(drive.solver().rails())).append("): nominal R");
            }
            if (nominal.problem().isEmpty() && !Double.isNaN(rOhms) && !Double.isNaN(fOhms)) {
                String corner = slow == null ? "nominal"
                        : "rise: " + riseAt.describe(drive.solver().rails()) + "; fall: " + fallAt.describe(drive.solver().rails());
                return new StageDelay(riseGiven ? st.rise() : RcDelay.tenToNinety(rOhms, c),
                        fallGiven ? st.fall() : RcDelay.tenToNinety(fOhms, c), c, pins.get(net).size(), riseGiven,
                        fallGiven, slowNote.toString(), rOhms, fOhms, "computed", corner);
            }
        }
        StringBuilder note = new StringBuilder();
        if (circuit != null) {
            note.append("circuit: ").append(problem.isEmpty() ? "no edge found" : problem).append("; declared values used");
        }
        // A load to a negative rail pulls the output down (diode OR, cathode follower): the
        // conducting tube then pulls it up, and the load sets the fall instead of the rise.
        boolean pullDown = pullsDown(st);
        double loadOhms = st.loadOhms() * (slow == null ? 1 : 1 + slow.resistor());
        double tubeOhms = st.outputOhmsLow() / (slow == null ? 1 : slow.endOfLife());
        double viaLoad = Double.NaN;
        double viaTube = Double.NaN;
        if (!(pullDown ? fallGiven : riseGiven)) {
            viaLoad = computed(loadOhms, c, "no load resistor", note);
        }
        if (!(pullDown ? riseGiven : fallGiven)) {
            viaTube = computed(tubeOhms, c, "no conducting resistance (ron)", note);
        }
        double rise = riseGiven ? st.rise() : pullDown ? viaTube : viaLoad;
        double fall = fallGiven ? st.fall() : pullDown ? viaLoad : viaTube;
        String corner = slow == null ? "nominal" : String.format(java.util.Locale.ROOT,
                "load %+.0f %%, ron / %.2f", slow.resistor() * 100, slow.endOfLife());
        return new StageDelay(rise, fall, c, pins.get(net).size(), riseGiven, fallGiven, note.toString(),
                pullDown ? tubeOhms : loadOhms, pullDown ? loadOhms : tubeOhms, "declared", corner);
    }

    /**
     * The inputs on a net that have circuits, as loads on its driver; a diode gate's input
     * carries what the gate feeds ({@link Receivers}): through its conducting diode the driver
     * charges those loads too.
     */
    public List<Load> loadsOn(int net) {
        if (receivers == null) {
            fanout = NetFanout.of(machine);
            receivers = new Receivers(machine, circuits, fanout);
        }
        return receivers.loadsOn(fanout.nodeOf(net));
    }

    /** True when the stage's load resistor returns to a negative rail. */
    public boolean pullsDown(StageType st) {
        return st.loadRail() >= 0 && st.loadRail() < machine.rails().size()
                && machine.rails().get(st.loadRail()).volts() < 0;
    }

    private static double computed(double ohms, double farads, String missing, StringBuilder note) {
        if (Double.isNaN(ohms)) {
            if (note.length() > 0) {
                note.append("; ");
            }
            note.append(missing).append(": counted 0");
            return 0;
        }
        return RcDelay.tenToNinety(ohms, farads);
    }

    private TubeType tube(StageType st) {
        return st.tube() >= 0 && st.tube() < machine.tubes().size() ? machine.tubes().get(st.tube()) : null;
    }
}
