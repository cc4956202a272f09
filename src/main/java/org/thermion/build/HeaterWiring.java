package org.thermion.build;

import org.thermion.circuit.RailSet;
import org.thermion.model.Basing;
import org.thermion.model.Electrode;
import org.thermion.model.HeaterRating;
import org.thermion.model.HeaterString;
import org.thermion.model.SoftStart;
import org.thermion.model.TubeType;
import org.thermion.power.HeaterAnalysis;

import java.util.ArrayList;
import java.util.List;

/**
 * Wires every heater string in order, from its rail through the dropping resistor (where one is
 * declared) and each heater to the return: a heater wired at the lower of two ratings on a tube
 * with a centre tap has both heater pins joined at one end and the tap at the other; otherwise
 * its two heater pins are the ends. Shunts go across the heaters that need them (values from
 * {@link HeaterAnalysis}).
 */
public final class HeaterWiring {
    private final WiringBuilder w;
    final List<HeaterRun> runs = new ArrayList<>();

    HeaterWiring(WiringBuilder w) {
        this.w = w;
    }

    /** One heater in a string: where it sits, its pins at each end, the nodes, what it gets, its shunt. */
    public record HeaterStep(int position, String tubeRef, String socketRef, String tube, String startPins, String endPins,
                      String from, String to, double volts, double amps, String shunt, double shuntOhms,
                      double shuntWatts, boolean doubtful) {
    }

    /** One string: its rail, current, dropping resistor and the heaters in order. */
    public record HeaterRun(int index, String rail, double railVolts, double amps, boolean series, String dropper,
                     double dropOhms, double dropWatts, double suggestOhms, double suggestWatts, List<HeaterStep> steps) {
    }

    void wire(HeaterAnalysis analysis) {
        for (HeaterAnalysis.StringResult r : analysis.strings()) {
            HeaterString s = r.string();
            String railName = w.m.rails().get(s.rail()).name();
            int board = w.boards.of(s.module());
            int node = feed(s, railName);
            String dropper = null;
            String tag = "heater string " + (r.index() + 1);
            if (s.dropOhms() > 0) {
                int next = w.local(tag + " after dropper", Node.Kind.HEATER);
                dropper = w.twoLead(PartClass.RESISTOR, s.dropOhms(), "power resistor", board, "dropper of " + tag,
                        r.dropWatts(), -1, node, next);
                node = next;
            }
            List<HeaterStep> steps = new ArrayList<>();
            for (int i = 0; i < s.envelopes().size(); i++) {
                int env = s.envelopes().get(i);
                HeaterAnalysis.Heater h = r.heaters().get(i);
                boolean last = i == s.envelopes().size() - 1;
                int next = last ? w.rail(RailSet.GROUND) : w.local(tag + " link " + (i + 1), Node.Kind.HEATER);
                String[] ends = ends(env, s.ratings().get(i));
                String from = w.name(node);
                String to = last ? RailSet.GROUND : tag + " link " + (i + 1);
                boolean doubtful = heaterEnds(env, s.ratings().get(i), node, next);
                String shunt = null;
                if (h.shunted()) {
                    shunt = w.twoLead(PartClass.RESISTOR, h.shuntOhms(), "power resistor", board,
                            "heater shunt across " + w.tubeRef(env), h.shuntWatts(), -1, node, next);
                }
                steps.add(new HeaterStep(i + 1, w.tubeRef(env), socketRef(env), tubeName(env), ends[0], ends[1], from, to,
                        h.volts(), h.amps(), shunt, h.shuntOhms(), h.shuntWatts(), doubtful));
                node = next;
            }
            HeaterAnalysis.Suggestion sug = r.suggestion();
            runs.add(new HeaterRun(r.index(), railName, r.railVolts(), r.amps(), steps.size() > 1, dropper, s.dropOhms(),
                    r.dropWatts(), sug == null ? Double.NaN : sug.ohms(), sug == null ? Double.NaN : sug.watts(), steps));
        }
    }

    /** Where a string starts: behind the soft start that covers it, else the rail's supply. */
    private int feed(HeaterString s, String rail) {
        for (SoftStart ss : w.m.softStarts()) {
            if (ss.rail() == s.rail() && ss.cover().coversString(s, w.m.envelopes())) {
                return w.behind(ss);
            }
        }
        return w.supply(rail);
    }

    private String socketRef(int env) {
        return w.socketRef(env);
    }

    private String tubeName(int env) {
        return w.m.tubes().get(w.m.envelopes().get(env).tube()).name();
    }

    /** Whether the tap end is used: a lower of two ratings on a tube with a centre tap. */
    private boolean tapped(TubeType t, HeaterRating r) {
        Basing b = t.basing();
        boolean hasTap = b != null && !b.pinsFor(Electrode.TAP, 0).isEmpty();
        return hasTap && t.heaters().stream().anyMatch(x -> x.volts() > r.volts() + 1e-9);
    }

    /** The pins at each end, for people ("4+5", "9"). */
    private String[] ends(int env, HeaterRating r) {
        TubeType t = w.m.tubes().get(w.m.envelopes().get(env).tube());
        Basing b = t.basing();
        if (b == null) {
            return new String[] {"?", "?"};
        }
        List<Integer> h = b.pinsFor(Electrode.HEATER, 0);
        if (tapped(t, r)) {
            return new String[] {h.get(0) + "+" + h.get(1), String.valueOf(b.pinsFor(Electrode.TAP, 0).get(0))};
        }
        return new String[] {String.valueOf(h.get(0)), String.valueOf(h.get(1))};
    }

    /** Wires the heater pins between {@code a} and {@code b}; true when a pin depends on a basing doubt. */
    private boolean heaterEnds(int env, HeaterRating r, int a, int b) {
        TubeType t = w.m.tubes().get(w.m.envelopes().get(env).tube());
        Basing basing = t.basing();
        if (basing == null) {
            w.pin(env, 0, Electrode.HEATER, a);
            return false;
        }
        List<Integer> h = basing.pinsFor(Electrode.HEATER, 0);
        java.util.Set<Integer> doubts = t.doubtfulPins();
        if (tapped(t, r)) {
            w.pin(env, 0, Electrode.HEATER, a);
            w.pin(env, 0, Electrode.TAP, b);
            return doubts.contains(h.get(0)) || doubts.contains(h.get(1)) || doubts.containsAll(basing.pinsFor(Electrode.TAP, 0));
        }
        w.pinNumber(env, h.get(0), "heater", a);
        w.pinNumber(env, h.get(1), "heater", b);
        return doubts.contains(h.get(0)) || doubts.contains(h.get(1));
    }
}
