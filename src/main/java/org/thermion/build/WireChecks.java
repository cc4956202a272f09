package org.thermion.build;

import org.thermion.model.BasePin;
import org.thermion.model.Basing;
import org.thermion.model.Electrode;
import org.thermion.model.Envelope;
import org.thermion.model.Machine;
import org.thermion.model.TubeKind;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The wire list's own checks: every socket pin in at most one node; pins the basing marks as
 * internal connections (ic) or not connected (nc) carry nothing; every electrode of every used
 * section (a built block's and a soft start's thyratron included), and every heater pin, is wired. Each failure is one line for people.
 */
public final class WireChecks {
    private WireChecks() {
    }

    public static List<String> run(Machine m, Wiring w) {
        List<String> out = new ArrayList<>();
        Map<String, String> pinNode = new HashMap<>();
        for (Node n : w.nodes()) {
            for (Lead l : n.leads()) {
                if (l.pin().equals("?")) {
                    continue;
                }
                String earlier = pinNode.putIfAbsent(l.label(), n.name());
                if (earlier != null && !earlier.equals(n.name())) {
                    out.add(l.label() + " is in two nets: " + earlier + " and " + n.name());
                }
            }
        }
        // sections outside the netlist that are wired all the same: built blocks' and soft starts' thyratrons
        java.util.Set<Integer> builtModules = new java.util.HashSet<>();
        for (org.thermion.model.BuiltBlock bb : m.built()) {
            if (bb.counted()) {
                builtModules.add(bb.module());
            }
        }
        for (org.thermion.model.SoftStart ss : m.softStarts()) {
            if (ss.trigger() instanceof org.thermion.model.BypassTrigger.ThyratronWarm tw) {
                builtModules.add(m.envelopes().get(tw.envelope()).module());
            }
        }
        for (Wiring.Socket s : w.sockets()) {
            Envelope e = m.envelopes().get(s.envelope());
            TubeType t = m.tubes().get(e.tube());
            Basing b = t.basing();
            if (b == null) {
                continue;
            }
            for (int p = 1; p <= b.pinCount(); p++) {
                BasePin bp = b.at(p);
                if (bp != null && (bp.electrode() == Electrode.INTERNAL || bp.electrode() == Electrode.NONE)
                        && pinNode.containsKey(s.ref() + "-" + p)) {
                    out.add(s.ref() + "-" + p + " is marked " + bp.electrode().word() + " but is wired to " + pinNode.get(s.ref() + "-" + p));
                }
                if (bp != null && bp.electrode() == Electrode.HEATER && s.node(p) < 0) {
                    out.add(s.ref() + "-" + p + " (heater) is not wired");
                }
            }
            for (Envelope.Slot slot : e.slots()) {
                if (slot.index() < 0 && !builtModules.contains(e.module())) {
                    continue;
                }
                for (Electrode el : needed(t.kind())) {
                    for (int p : b.pinsFor(el, slot.section())) {
                        if (s.node(p) < 0) {
                            out.add(s.ref() + "-" + p + " (" + el.word() + "." + slot.section() + " of a used section) is not wired");
                        }
                    }
                }
            }
        }
        return out;
    }

    /** Electrodes a used section of a kind must have wired. */
    static List<Electrode> needed(TubeKind kind) {
        switch (kind) {
            case PENTODE:
                return List.of(Electrode.PLATE, Electrode.GRID, Electrode.SCREEN, Electrode.SUPPRESSOR, Electrode.CATHODE);
            case DIODE:
                return List.of(Electrode.PLATE, Electrode.CATHODE);
            case THYRATRON:
                return List.of(Electrode.PLATE, Electrode.GRID, Electrode.SCREEN, Electrode.CATHODE);
            default:
                return List.of(Electrode.PLATE, Electrode.GRID, Electrode.CATHODE);
        }
    }
}
