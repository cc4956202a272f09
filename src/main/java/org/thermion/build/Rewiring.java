package org.thermion.build;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What to do on the chassis to turn one revision of a machine into the next: parts to take out,
 * wires to unsolder, stages the packing moved to other tube sections, wires that move from one node
 * to another, parts whose value or type changes, parts to fit and wires to add, in the order a
 * builder works. Parts are matched by what they do
 * (their role: {@code plate load of x}), tubes and sockets by designator, so a part keeps its
 * identity when others come and go; a lead by its part and pin, a wire by the node it reaches
 * (nodes by name).
 */
public record Rewiring(List<Change> changes) {
    public Rewiring {
        changes = List.copyOf(changes);
    }

    /** What a change does. */
    public enum Action { REMOVE_PART, REMOVE_WIRE, MOVE_STAGE, MOVE_WIRE, CHANGE_PART, RENUMBER, ADD_PART, ADD_WIRE }

    /**
     * One change: its action, the designator it concerns (the new one where the part stays; a moved
     * stage: the tube it now sits in), the pin for a wire ("" for a part or stage), what it is, the
     * state before and after ("" where none; a moved stage: its sections, "V1.2").
     */
    public record Change(Action action, String ref, String pin, String what, String before, String after) {
    }

    /** A lead of a part: the part's role and the pin, with the node it is wired to. */
    private record LeadAt(Part part, Lead lead, String node) {
    }

    /** The changes from {@code old} to {@code now}. */
    public static Rewiring between(Wiring old, Wiring now) {
        Map<String, Part> before = byRole(old);
        Map<String, Part> after = byRole(now);
        Map<String, LeadAt> leadsBefore = leads(old, before);
        Map<String, LeadAt> leadsAfter = leads(now, after);
        List<Change> removeParts = new ArrayList<>();
        List<Change> removeWires = new ArrayList<>();
        List<Change> moves = new ArrayList<>();
        List<Change> changed = new ArrayList<>();
        List<Change> addParts = new ArrayList<>();
        List<Change> addWires = new ArrayList<>();
        for (Part p : before.values()) {
            Part q = after.get(key(p));
            if (q == null) {
                removeParts.add(new Change(Action.REMOVE_PART, p.ref(), "", p.role(), describe(p), ""));
                continue;
            }
            if (!describe(p).equals(describe(q))) {
                changed.add(new Change(Action.CHANGE_PART, q.ref(), "", q.role(), describe(p), describe(q)));
            }
            if (!p.ref().equals(q.ref())) {
                changed.add(new Change(Action.RENUMBER, q.ref(), "", q.role(), p.ref(), q.ref()));
            }
        }
        for (Part q : after.values()) {
            if (!before.containsKey(key(q))) {
                addParts.add(new Change(Action.ADD_PART, q.ref(), "", q.role(), "", describe(q)));
            }
        }
        for (Map.Entry<String, LeadAt> e : leadsBefore.entrySet()) {
            LeadAt a = e.getValue();
            LeadAt b = leadsAfter.get(e.getKey());
            if (b == null) {
                if (after.containsKey(key(a.part()))) {
                    removeWires.add(new Change(Action.REMOVE_WIRE, ref(a, after), a.lead().pin(), a.lead().what(), a.node(), ""));
                }
            } else if (!a.node().equals(b.node())) {
                moves.add(new Change(Action.MOVE_WIRE, b.part().ref(), b.lead().pin(), b.lead().what(), a.node(), b.node()));
            }
        }
        for (Map.Entry<String, LeadAt> e : leadsAfter.entrySet()) {
            if (!leadsBefore.containsKey(e.getKey())) {
                LeadAt b = e.getValue();
                addWires.add(new Change(Action.ADD_WIRE, b.part().ref(), b.lead().pin(), b.lead().what(), "", b.node()));
            }
        }
        for (List<Change> group : List.of(removeWires, moves, addWires)) {
            group.sort(BY_PLACE);
        }
        List<Change> all = new ArrayList<>(removeWires);
        all.addAll(removeParts);
        all.addAll(stageMoves(old, now));
        all.addAll(moves);
        all.addAll(changed);
        all.addAll(addParts);
        all.addAll(addWires);
        return new Rewiring(all);
    }

    /**
     * Stages present in both revisions whose tube sections differ (the packing moved them: another
     * envelope, another section, more or fewer sections), in the new revision's order.
     */
    private static List<Change> stageMoves(Wiring old, Wiring now) {
        Map<String, List<String>> was = new LinkedHashMap<>();
        for (Wiring.Placement p : old.placements()) {
            was.put(p.stage(), p.sections());
        }
        List<Change> out = new ArrayList<>();
        for (Wiring.Placement p : now.placements()) {
            List<String> before = was.get(p.stage());
            if (before != null && !before.equals(p.sections())) {
                String tube = p.sections().isEmpty() ? "" : p.sections().get(0).replaceAll("\\.[0-9]+$", "");
                out.add(new Change(Action.MOVE_STAGE, tube, "", "stage " + p.stage(), sections(before),
                        sections(p.sections())));
            }
        }
        return out;
    }

    private static String sections(List<String> s) {
        return s.isEmpty() ? "no section" : String.join(" ", s);
    }

    /** Wires by part (class letters, then number) and pin, as a builder goes round the chassis. */
    private static final java.util.Comparator<Change> BY_PLACE = java.util.Comparator
            .comparing((Change c) -> c.ref().replaceAll("[0-9]+$", ""))
            .thenComparingInt(c -> number(c.ref()))
            .thenComparingInt(c -> number(c.pin()))
            .thenComparing(Change::pin);

    /** The number at the end of {@code s}, 0 when there is none. */
    private static int number(String s) {
        String digits = s.replaceAll("^.*?([0-9]*)$", "$1");
        return digits.isEmpty() || digits.length() > 9 ? 0 : Integer.parseInt(digits);
    }

    /** How many changes of {@code action}. */
    public long count(Action action) {
        return changes.stream().filter(c -> c.action() == action).count();
    }

    /** The part's type with its value where it has one: {@code resistor 47 kohm}, {@code 12AU7}. */
    static String describe(Part p) {
        return Double.isNaN(p.ohms()) ? p.type() : p.type() + " " + Values.ohms(p.ohms());
    }

    private static String ref(LeadAt a, Map<String, Part> after) {
        Part q = after.get(key(a.part()));
        return q == null ? a.part().ref() : q.ref();
    }

    /**
     * What identifies a part between revisions: a tube and its socket by designator (the socket on the
     * chassis stays while the stages in its sections change; designators kept by a designators file),
     * every other part by what it does.
     */
    private static String key(Part p) {
        return p.cls() == PartClass.TUBE || p.cls() == PartClass.SOCKET ? "at " + p.ref() : p.role();
    }

    private static Map<String, Part> byRole(Wiring w) {
        Map<String, Part> m = new LinkedHashMap<>();
        for (Part p : w.parts()) {
            m.put(key(p), p);
        }
        return m;
    }

    /** Every lead by "role|pin|what", with the node it is on; a part removed takes its wires with it. */
    private static Map<String, LeadAt> leads(Wiring w, Map<String, Part> parts) {
        Map<String, Part> byRef = new LinkedHashMap<>();
        for (Part p : parts.values()) {
            byRef.put(p.ref(), p);
        }
        Map<String, LeadAt> m = new LinkedHashMap<>();
        for (Node n : w.nodes()) {
            for (Lead l : n.leads()) {
                Part p = byRef.get(l.ref());
                if (p != null) {
                    m.putIfAbsent(key(p) + "|" + l.pin() + "|" + l.what(), new LeadAt(p, l, n.name()));
                }
            }
        }
        return m;
    }
}
