package org.thermion.elab;

import org.thermion.text.Nouns;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.model.Envelope;
import org.thermion.model.HeaterRating;
import org.thermion.model.HeaterRule;
import org.thermion.model.HeaterString;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Packs stage sections into envelopes (per module and tube type, a stage never split
 * across two envelopes) and wires the envelopes' heaters into strings by the rules.
 */
final class Packer {
    final List<Envelope> envelopes = new ArrayList<>();
    final List<HeaterRule> rules = new ArrayList<>();
    final List<HeaterString> strings = new ArrayList<>();
    private final Parts parts;
    private final Diagnostics diags;
    private final Map<String, Integer> open = new HashMap<>();
    private final Map<Integer, Integer> free = new HashMap<>();
    /** Sharing scope per tube type from {@code packing} blocks: "module" (default), "board" or "machine". */
    final Map<Integer, String> share = new HashMap<>();
    /** Envelopes the description names, with the stages' output nets as written. */
    final List<Named> named = new ArrayList<>();

    /** {@code envelope NAME "OUT, OUT"}: the text and where it was written. */
    record Named(String name, String outputs, Span span) {
    }
    private final List<Span> ruleSpans = new ArrayList<>();

    Packer(Parts parts, Diagnostics diags) {
        this.parts = parts;
        this.diags = diags;
    }

    /** Places a stage outside the netlist (a soft start's thyratron); returns the envelope. */
    int place(int tube, int module, int sections) {
        return place(tube, module, module, sections, false, -1);
    }

    /**
     * The envelopes with their gate slots renumbered to the levelized order ({@code order[k]} is the
     * builder's index of gate k).
     */
    List<Envelope> levelized(int[] order) {
        int[] rank = new int[order.length];
        for (int k = 0; k < order.length; k++) {
            rank[order[k]] = k;
        }
        java.util.Set<String> taken = new java.util.HashSet<>();
        for (Envelope e : envelopes) {
            if (e.pinned()) {
                taken.add(e.designator());
            }
        }
        List<Envelope> out = new ArrayList<>(envelopes.size());
        int number = 0;
        for (Envelope e : envelopes) {
            String designator = e.designator();
            if (!e.pinned()) {
                do {
                    number++;
                } while (taken.contains("V" + number));
                designator = "V" + number;
            }
            List<Envelope.Slot> slots = new ArrayList<>(e.slots().size());
            for (Envelope.Slot s : e.slots()) {
                slots.add(s.latch() || s.index() < 0 ? s : new Envelope.Slot(s.section(), false, rank[s.index()]));
            }
            out.add(new Envelope(e.id(), designator, e.tube(), e.module(), e.sectionsUsed(), slots, e.pinned()));
        }
        return out;
    }

    /** Places a stage instance needing {@code sections} of {@code tube} in module {@code module}; returns the envelope. */
    int place(int tube, int module, int group, int sections, boolean latch, int index) {
        TubeType t = parts.tubes.get(tube);
        String key = tube + ":" + group;
        Integer cur = open.get(key);
        if (sections > t.sections()) {
            // A stage wider than one envelope (a many-input diode gate) spans envelopes densely.
            int first = -1;
            int left = sections;
            if (cur != null && free.get(cur) > 0) {
                int take = Math.min(left, free.get(cur));
                use(cur, take, latch, index);
                first = cur;
                left -= take;
            }
            while (left > 0) {
                int take = Math.min(left, t.sections());
                int e = newEnvelope(tube, module, take, latch, index);
                open.put(key, e);
                first = first < 0 ? e : first;
                left -= take;
            }
            return first;
        }
        if (cur != null && free.get(cur) >= sections) {
            use(cur, sections, latch, index);
            return cur;
        }
        int e = newEnvelope(tube, module, sections, latch, index);
        open.put(key, e);
        return e;
    }

    private void use(int env, int sections, boolean latch, int index) {
        Envelope e = envelopes.get(env);
        List<Envelope.Slot> slots = new ArrayList<>(e.slots());
        for (int s = 0; s < sections; s++) {
            slots.add(new Envelope.Slot(e.sectionsUsed() + s + 1, latch, index));
        }
        envelopes.set(env, new Envelope(e.id(), e.designator(), e.tube(), e.module(), e.sectionsUsed() + sections, slots,
                e.pinned()));
        free.put(env, free.get(env) - sections);
    }

    /** A new envelope the description names; its stages go in with {@link #into}. */
    int pinned(String name, int tube, int module) {
        int id = envelopes.size();
        envelopes.add(new Envelope(id, name, tube, module, 0, List.of(), true));
        free.put(id, parts.tubes.get(tube).sections());
        return id;
    }

    /** Puts a stage into a named envelope (the caller has checked it fits). */
    void into(int env, int sections, boolean latch, int index) {
        use(env, sections, latch, index);
    }

    private int newEnvelope(int tube, int module, int used, boolean latch, int index) {
        int id = envelopes.size();
        envelopes.add(new Envelope(id, "V" + (id + 1), tube, module, 0, List.of(), false));
        free.put(id, parts.tubes.get(tube).sections());
        use(id, used, latch, index);
        return id;
    }

    /** Reads a {@code packing { ... }} block: sharing scopes and named envelopes. */
    void readPacking(Prop p) {
        PropBlock b = PropBlock.read(PropertyTable.PACKING, p, "packing", p.key().span(), diags);
        for (PropLine line : b.lines("share")) {
            for (org.thermion.lang.ast.Value v : line.tokens("tubes")) {
                int t = parts.tube(v.text(), v.span());
                if (t >= 0) {
                    share.put(t, line.word("scope"));
                }
            }
        }
        for (PropLine line : b.lines("envelope")) {
            named.add(new Named(line.word("name"), line.word("stages"), line.span("stages")));
        }
    }

    /** Reads a {@code heaters on RAIL { ... }} block into rules. */
    /** The line of each heater rule, in rule order. */
    List<Span> ruleSpans() {
        return List.copyOf(ruleSpans);
    }

    void readRules(Prop p) {
        PropReader head = new PropReader(p, diags);
        head.expectWord("on");
        String railName = head.word("a rail name");
        Span rs = head.lastSpan();
        head.end();
        if (railName == null) {
            return;
        }
        int rail = parts.rail(railName, rs);
        PropBlock b = PropBlock.read(PropertyTable.HEATERS, p, "heaters on " + railName, rs, diags);
        for (Prop q : p.block()) {
            PropLine line = lineOf(b, q);
            if (line == null) {
                continue;
            }
            List<Integer> tubes = new ArrayList<>();
            for (org.thermion.lang.ast.Value v : line.tokens("tubes")) {
                int t = parts.tube(v.text(), v.span());
                if (t >= 0) {
                    tubes.add(t);
                }
            }
            if (rail < 0 || tubes.isEmpty()) {
                continue;
            }
            boolean series = q.key().text().equals("series");
            double volts = line.has("at") ? line.num("volts") : Double.NaN;
            double drop = line.has("drop") ? line.num("drop") : 0;
            double restDrop = line.has("rest") ? line.num("restdrop") : 0;
            rules.add(new HeaterRule(rail, series, List.copyOf(tubes), series ? (int) line.num() : 1, !line.has("across"),
                    volts, drop, line.has("shunt"), restDrop));
            ruleSpans.add(q.span());
        }
    }

    /** The line read from {@code q}, or null when it had an error. */
    private static PropLine lineOf(PropBlock b, Prop q) {
        for (PropLine l : b.lines(q.key().text())) {
            if (l.prop() == q) {
                return l;
            }
        }
        return null;
    }

    /** Forms strings from the envelopes; every envelope must be covered by some rule. */
    void wire(Span machineSpan) {
        boolean[] done = new boolean[envelopes.size()];
        for (int ri = 0; ri < rules.size(); ri++) {
            HeaterRule rule = rules.get(ri);
            Map<Integer, List<Integer>> groups = new LinkedHashMap<>();
            for (Envelope e : envelopes) {
                if (!done[e.id()] && rule.tubes().contains(e.tube())) {
                    done[e.id()] = true;
                    groups.computeIfAbsent(rule.perModule() ? e.module() : -1, k -> new ArrayList<>()).add(e.id());
                }
            }
            for (Map.Entry<Integer, List<Integer>> g : groups.entrySet()) {
                List<Integer> ids = g.getValue();
                int size = rule.series() ? rule.count() : 1;
                for (int i = 0; i < ids.size(); i += size) {
                    List<Integer> chunk = ids.subList(i, Math.min(ids.size(), i + size));
                    List<HeaterRating> ratings = new ArrayList<>();
                    boolean ok = true;
                    for (int id : chunk) {
                        TubeType t = parts.tubes.get(envelopes.get(id).tube());
                        HeaterRating h = Double.isNaN(rule.volts()) ? t.defaultHeater() : t.heaterAt(rule.volts());
                        if (h == null) {
                            diags.error(ruleSpans.get(ri), "tube " + t.name() + " has no " + fmt(rule.volts()) + " V heater",
                                    "its heater takes " + t.heaters().stream().map(x -> fmt(x.volts()) + " V").toList());
                            ok = false;
                            break;
                        }
                        ratings.add(h);
                    }
                    if (!ok) {
                        break;
                    }
                    double drop = chunk.size() < size && rule.restDropOhms() > 0 ? rule.restDropOhms() : rule.dropOhms();
                    strings.add(new HeaterString(rule.rail(), List.copyOf(chunk), List.copyOf(ratings), drop,
                            rule.shunt(), g.getKey() >= 0 ? g.getKey() : envelopes.get(chunk.get(0)).module(), ri));
                }
            }
        }
        Map<Integer, Integer> missing = new LinkedHashMap<>();
        for (Envelope e : envelopes) {
            if (!done[e.id()]) {
                missing.merge(e.tube(), 1, Integer::sum);
            }
        }
        for (Map.Entry<Integer, Integer> m : missing.entrySet()) {
            String t = parts.tubes.get(m.getKey()).name();
            diags.error(machineSpan, "no heater arrangement for tube type " + t + " (" + Nouns.count(m.getValue(), "envelope") + ")",
                    "add `parallel " + t + "` or `series N of " + t + "` to a `heaters on RAIL` block");
        }
    }

    /** A number for a message; never a wrapped-around integer. */
    static String fmt(double v) {
        return Unit.number(v);
    }
}
