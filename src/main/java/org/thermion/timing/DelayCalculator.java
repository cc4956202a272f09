package org.thermion.timing;

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
 * used as given; otherwise the rise is ln 9 R_load C and the fall ln 9 r_on C (swapped for
 * a load returned to a negative rail, which pulls the output down), where C is
 * the capacitance the output drives: the stage's own output capacitance, the input
 * capacitance of every stage input on the net (through free cells, which are wires or a
 * flip-flop's other plate), and the stage's wiring capacitance per connection.
 */
public final class DelayCalculator {
    private final Machine machine;
    private final Netlist netlist;
    /** For each net, the stage-type index of every stage input pin on it (-1: a pin without a stage). */
    private final List<List<Integer>> pins;

    public DelayCalculator(Machine machine) {
        this.machine = machine;
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

    /** Stage-type indices of the stage inputs a net drives (-1 for off-board pins such as the PC). */
    public List<Integer> pinsOn(int net) {
        return pins.get(net);
    }

    /** The capacitance the stage {@code st} sees when its output is {@code net} and uses {@code sections}. */
    public double drivenFarads(StageType st, int sections, int net) {
        double c = Capacitance.output(tube(st), sections);
        for (int s : pins.get(net)) {
            if (s >= 0) {
                StageType driven = machine.stages().get(s);
                c += Capacitance.input(driven, tube(driven));
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
        StringBuilder note = new StringBuilder();
        boolean riseGiven = !Double.isNaN(st.rise());
        boolean fallGiven = !Double.isNaN(st.fall());
        // A load to a negative rail pulls the output down (diode OR, cathode follower): the
        // conducting tube then pulls it up, and the load sets the fall instead of the rise.
        boolean pullDown = pullsDown(st);
        double viaLoad = Double.NaN;
        double viaTube = Double.NaN;
        if (!(pullDown ? fallGiven : riseGiven)) {
            viaLoad = computed(st.loadOhms(), c, "no load resistor", note);
        }
        if (!(pullDown ? riseGiven : fallGiven)) {
            viaTube = computed(st.outputOhmsLow(), c, "no conducting resistance (ron)", note);
        }
        double rise = riseGiven ? st.rise() : pullDown ? viaTube : viaLoad;
        double fall = fallGiven ? st.fall() : pullDown ? viaLoad : viaTube;
        return new StageDelay(rise, fall, c, pins.get(net).size(), riseGiven, fallGiven, note.toString());
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
