package org.thermion.elab;

import org.thermion.lang.Names;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Value;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads a property line against a list of {@link Slot}s as a property table declares them
 * (quantities, names, optional parts, choices, options in any order), value by value through
 * a {@link PropReader}, which reports each mismatch once.
 */
final class SlotReader {
    private final PropReader in;

    SlotReader(PropReader in) {
        this.in = in;
    }

    /** Reads {@code slots} in order into {@code into}/{@code spans}; false after an error. */
    boolean read(List<Slot> slots, Map<String, Object> into, Map<String, Span> spans) {
        for (int i = 0; i < slots.size() && !in.failed(); i++) {
            readSlot(slots.get(i), slots.subList(i + 1, slots.size()), into, spans);
        }
        return !in.failed();
    }

    /** Reads a whole line against a table entry: its slots, then nothing more. Null after an error. */
    PropLine line(Property p) {
        Map<String, Object> into = new LinkedHashMap<>();
        Map<String, Span> spans = new LinkedHashMap<>();
        read(p.slots(), into, spans);
        in.end();
        return in.failed() ? null : new PropLine(in.prop(), Map.copyOf(into), Map.copyOf(spans));
    }

    private void readSlot(Slot slot, List<Slot> rest, Map<String, Object> into, Map<String, Span> spans) {
        Span at = in.here();
        if (slot instanceof Slot.Quantity q) {
            int start = in.position();
            double v = in.quantity(q.unit(), q.what());
            if (!in.failed()) {
                Span whole = at.to(in.lastSpan());
                if (!q.range().contains(v)) {
                    in.fail(whole, q.what() + " is out of range: " + in.written(start), "use a value " + PropReader.rangeText(q.range(), q.unit()));
                }
                into.put(q.id(), v);
                spans.put(q.id(), whole);
            }
        } else if (slot instanceof Slot.Plain p) {
            int start = in.position();
            double v = in.number(p.what());
            if (!in.failed()) {
                if (!p.range().contains(v)) {
                    in.fail(at.to(in.lastSpan()), p.what() + " is out of range: " + in.written(start), "use a value " + PropReader.rangeText(p.range(), null));
                }
                into.put(p.id(), v);
                spans.put(p.id(), at.to(in.lastSpan()));
            }
        } else if (slot instanceof Slot.Whole w) {
            long n = in.whole(w.what(), w.min(), w.max());
            if (!in.failed()) {
                into.put(w.id(), n);
                spans.put(w.id(), in.lastSpan());
            }
        } else if (slot instanceof Slot.Name n) {
            if (n.id().equals("rail") && !in.failed() && in.peek() instanceof Value.Num num && num.text().matches("[-+0-9.eE]+")) {
                // `draw low 1 mA from bplus`: a number where the rail goes, said there, not at the unit after it
                in.fail(num.span(), "expected " + n.what() + ", found '" + num.text() + "'", null);
                return;
            }
            String w = in.word(n.what());
            if (w != null && !n.choices().isEmpty() && !n.choices().contains(w)) {
                in.fail(in.lastSpan(), "unknown " + n.what() + " '" + w + "'",
                        Declarations.hintFor(w, n.choices(), "expected " + orList(n.choices())));
            }
            if (!in.failed()) {
                into.put(n.id(), w);
                spans.put(n.id(), in.lastSpan());
            }
        } else if (slot instanceof Slot.Names n) {
            names(n, stopWords(rest), into, spans);
        } else if (slot instanceof Slot.Text t) {
            String s = in.string(t.what());
            if (s != null) {
                into.put(t.id(), s);
                spans.put(t.id(), in.lastSpan());
            }
        } else if (slot instanceof Slot.Word w) {
            in.expectWord(w.word());
        } else if (slot instanceof Slot.Optional o) {
            if (in.acceptWord(o.word())) {
                into.put(o.word(), Boolean.TRUE);
                spans.put(o.word(), in.lastSpan());
                read(o.then(), into, spans);
            }
        } else if (slot instanceof Slot.Choice c) {
            choice(c, into, spans);
        } else if (slot instanceof Slot.AnyOrder a) {
            anyOrder(a, into, spans);
        }
    }

    private void names(Slot.Names n, Set<String> stop, Map<String, Object> into, Map<String, Span> spans) {
        List<Value> got = new ArrayList<>();
        Span first = in.here();
        while (!in.atEnd()) {
            Value v = in.peek();
            if (v instanceof Value.Sym s && s.text().equals(",")) {
                in.skip();
            } else if ((v instanceof Value.Word || v instanceof Value.Num) && !stop.contains(v.text())) {
                String option = v.text().matches(".*[0-9].*") ? null : Names.nearestWord(v.text(), stop, 2);
                if (option != null) {
                    // Part names carry digits (12AU7, T1); a plain word near an option is a slip.
                    in.fail(v.span(), "unexpected '" + v.text() + "'", "did you mean '" + option + "'?");
                    return;
                }
                got.add(v);
                in.skip();
            } else {
                break;
            }
        }
        if (got.isEmpty()) {
            in.fail(in.here(), "expected " + n.what() + PropReader.found(in.peek()), null);
            return;
        }
        into.put(n.id(), List.copyOf(got));
        spans.put(n.id(), first.to(in.lastSpan()));
    }

    /** The words that start the optional parts after a list of names: they end the list. */
    private static Set<String> stopWords(List<Slot> rest) {
        Set<String> stop = new HashSet<>();
        for (Slot s : rest) {
            if (s instanceof Slot.Optional o) {
                stop.add(o.word());
            } else if (s instanceof Slot.AnyOrder a) {
                a.options().forEach(o -> stop.add(o.word()));
            } else {
                break;
            }
        }
        return stop;
    }

    private void choice(Slot.Choice c, Map<String, Object> into, Map<String, Span> spans) {
        Value v = in.peek();
        if (v instanceof Value.Word w && c.branches().containsKey(w.text())) {
            in.skip();
            into.put(c.id(), w.text());
            spans.put(c.id(), w.span());
            read(c.branches().get(w.text()), into, spans);
        } else if (c.otherwise() != null) {
            read(c.otherwise(), into, spans);
        } else {
            List<String> words = new ArrayList<>(c.branches().keySet());
            String hint = v instanceof Value.Word w ? Declarations.hintFor(w.text(), words, null) : null;
            in.fail(in.here(), "expected " + orList(words) + PropReader.found(v), hint);
        }
    }

    private void anyOrder(Slot.AnyOrder a, Map<String, Object> into, Map<String, Span> spans) {
        List<String> words = a.options().stream().map(Slot.Optional::word).toList();
        while (!in.atEnd() && !in.failed()) {
            Value v = in.peek();
            Slot.Optional match = null;
            for (Slot.Optional o : a.options()) {
                if (v instanceof Value.Word w && w.text().equals(o.word())) {
                    match = o;
                }
            }
            if (match == null) {
                in.fail(v.span(), "unexpected '" + v.text() + "'",
                        Declarations.hintFor(v.text(), words, "expected one of: " + String.join(", ", words)));
            } else if (into.containsKey(match.word())) {
                in.fail(v.span(), "'" + match.word() + "' given twice", "give each option once");
            } else {
                readSlot(match, List.of(), into, spans);
            }
        }
    }

    private static String orList(List<String> words) {
        if (words.size() == 1) {
            return words.get(0);
        }
        return String.join(", ", words.subList(0, words.size() - 1)) + " or " + words.get(words.size() - 1);
    }
}
