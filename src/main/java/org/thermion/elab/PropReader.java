package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.lang.ast.Value;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads the values of one property line left to right: quantities with units, words,
 * whole numbers, or a whole list of {@link Slot}s as a property table declares them.
 * Every mismatch is reported once, at the offending token; numbers that are not finite or
 * do not fit are reported with the limit, never passed on.
 */
final class PropReader {
    private static final Pattern GLUED = Pattern.compile("([0-9]+(?:\\.[0-9]+)?)([A-Za-z]+)");

    private final Prop prop;
    private final Diagnostics diags;
    private final List<Value> values;
    private int pos;
    private boolean failed;

    PropReader(Prop prop, Diagnostics diags) {
        this.prop = prop;
        this.diags = diags;
        this.values = prop.values();
    }

    boolean failed() {
        return failed;
    }

    boolean atEnd() {
        return pos >= values.size();
    }

    Value peek() {
        return atEnd() ? null : values.get(pos);
    }

    boolean peekWord(String w) {
        Value v = peek();
        return v instanceof Value.Word word && word.text().equals(w);
    }

    boolean peekSym(String s) {
        Value v = peek();
        return v instanceof Value.Sym sym && sym.text().equals(s);
    }

    Span here() {
        Value v = peek();
        if (v != null) {
            return v.span();
        }
        Span s = prop.span();
        return new Span(s.file(), s.endLine(), Math.max(1, s.endCol() - 1), s.endLine(), s.endCol());
    }

    private void fail(Span span, String message, String hint) {
        if (!failed) {
            diags.error(span, message, hint);
        }
        failed = true;
    }

    /** Reads {@code slots} in order into {@code into}/{@code spans}; false after an error. */
    boolean read(List<Slot> slots, Map<String, Object> into, Map<String, Span> spans) {
        for (int i = 0; i < slots.size() && !failed; i++) {
            readSlot(slots.get(i), slots.subList(i + 1, slots.size()), into, spans);
        }
        return !failed;
    }

    /** Reads a whole line against a table entry: its slots, then nothing more. Null after an error. */
    PropLine line(Property p) {
        Map<String, Object> into = new LinkedHashMap<>();
        Map<String, Span> spans = new LinkedHashMap<>();
        read(p.slots(), into, spans);
        end();
        return failed ? null : new PropLine(prop, Map.copyOf(into), Map.copyOf(spans));
    }

    private void readSlot(Slot slot, List<Slot> rest, Map<String, Object> into, Map<String, Span> spans) {
        Span at = here();
        if (slot instanceof Slot.Quantity q) {
            int start = pos;
            double v = quantity(q.unit(), q.what());
            if (!failed) {
                Span whole = at.to(lastSpan());
                if (!q.range().contains(v)) {
                    fail(whole, q.what() + " is out of range: " + written(start), "use a value " + rangeText(q.range(), q.unit()));
                }
                into.put(q.id(), v);
                spans.put(q.id(), whole);
            }
        } else if (slot instanceof Slot.Plain p) {
            int start = pos;
            double v = number(p.what());
            if (!failed) {
                if (!p.range().contains(v)) {
                    fail(at.to(lastSpan()), p.what() + " is out of range: " + written(start), "use a value " + rangeText(p.range(), null));
                }
                into.put(p.id(), v);
                spans.put(p.id(), at.to(lastSpan()));
            }
        } else if (slot instanceof Slot.Whole w) {
            long n = whole(w.what(), w.min(), w.max());
            if (!failed) {
                into.put(w.id(), n);
                spans.put(w.id(), lastSpan());
            }
        } else if (slot instanceof Slot.Name n) {
            String w = word(n.what());
            if (w != null && !n.choices().isEmpty() && !n.choices().contains(w)) {
                fail(lastSpan(), "unknown " + n.what() + " '" + w + "'",
                        Declarations.hintFor(w, n.choices(), "expected " + orList(n.choices())));
            }
            if (!failed) {
                into.put(n.id(), w);
                spans.put(n.id(), lastSpan());
            }
        } else if (slot instanceof Slot.Names n) {
            names(n, stopWords(rest), into, spans);
        } else if (slot instanceof Slot.Text t) {
            String s = string(t.what());
            if (s != null) {
                into.put(t.id(), s);
                spans.put(t.id(), lastSpan());
            }
        } else if (slot instanceof Slot.Word w) {
            expectWord(w.word());
        } else if (slot instanceof Slot.Optional o) {
            if (acceptWord(o.word())) {
                into.put(o.word(), Boolean.TRUE);
                spans.put(o.word(), lastSpan());
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
        Span first = here();
        while (!atEnd()) {
            Value v = peek();
            if (v instanceof Value.Sym s && s.text().equals(",")) {
                pos++;
            } else if ((v instanceof Value.Word || v instanceof Value.Num) && !stop.contains(v.text())) {
                String option = v.text().matches(".*[0-9].*") ? null : Names.nearestWord(v.text(), stop, 2);
                if (option != null) {
                    // Part names carry digits (12AU7, T1); a plain word near an option is a slip.
                    fail(v.span(), "unexpected '" + v.text() + "'", "did you mean '" + option + "'?");
                    return;
                }
                got.add(v);
                pos++;
            } else {
                break;
            }
        }
        if (got.isEmpty()) {
            fail(here(), "expected " + n.what() + found(peek()), null);
            return;
        }
        into.put(n.id(), List.copyOf(got));
        spans.put(n.id(), first.to(lastSpan()));
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
        Value v = peek();
        if (v instanceof Value.Word w && c.branches().containsKey(w.text())) {
            pos++;
            into.put(c.id(), w.text());
            spans.put(c.id(), w.span());
            read(c.branches().get(w.text()), into, spans);
        } else if (c.otherwise() != null) {
            read(c.otherwise(), into, spans);
        } else {
            List<String> words = new ArrayList<>(c.branches().keySet());
            String hint = v instanceof Value.Word w ? Declarations.hintFor(w.text(), words, null) : null;
            fail(here(), "expected " + orList(words) + found(v), hint);
        }
    }

    private void anyOrder(Slot.AnyOrder a, Map<String, Object> into, Map<String, Span> spans) {
        List<String> words = a.options().stream().map(Slot.Optional::word).toList();
        while (!atEnd() && !failed) {
            Value v = peek();
            Slot.Optional match = null;
            for (Slot.Optional o : a.options()) {
                if (v instanceof Value.Word w && w.text().equals(o.word())) {
                    match = o;
                }
            }
            if (match == null) {
                fail(v.span(), "unexpected '" + v.text() + "'",
                        Declarations.hintFor(v.text(), words, "expected one of: " + String.join(", ", words)));
            } else if (into.containsKey(match.word())) {
                fail(v.span(), "'" + match.word() + "' given twice", "give each option once");
            } else {
                readSlot(match, List.of(), into, spans);
            }
        }
    }

    /** The tokens from {@code start} to the reader's position as written: "-2 A", "47k". */
    private String written(int start) {
        StringBuilder b = new StringBuilder();
        for (int i = start; i < pos; i++) {
            Value v = values.get(i);
            if (b.length() > 0 && !b.toString().equals("-")) {
                b.append(' ');
            }
            b.append(v.text());
        }
        return b.toString();
    }

    /** "above 0 ohm and at most 100 M", "from 1 to 30". */
    static String rangeText(Slot.Range r, Unit unit) {
        String min = unit == null ? Unit.number(r.min()) : unit.format(r.min());
        String max = unit == null ? Unit.number(r.max()) : unit.format(r.max());
        return r.minIncluded() ? "from " + min + " to " + max : "above " + min + " and at most " + max;
    }

    private static String orList(List<String> words) {
        if (words.size() == 1) {
            return words.get(0);
        }
        return String.join(", ", words.subList(0, words.size() - 1)) + " or " + words.get(words.size() - 1);
    }

    /** A quantity of the given dimension, in SI; NaN after an error. */
    private double quantity(Unit unit, String what) {
        if (failed) {
            return Double.NaN;
        }
        Value v = peek();
        double sign = 1;
        if (v instanceof Value.Sym s && s.text().equals("-")) {
            sign = -1;
            pos++;
            v = peek();
        }
        if (v instanceof Value.Num n) {
            pos++;
            double x = parseDouble(n);
            Value u = peek();
            if (u instanceof Value.Word w && Unit.WORDS.containsKey(w.text())) {
                pos++;
                return sign * x * checkUnit(Unit.WORDS.get(w.text()), unit, w.span(), what);
            }
            fail(u == null ? n.span() : u.span(), what + " needs a unit", "write it with " + unit.example());
            return Double.NaN;
        }
        if (v instanceof Value.Word w) {
            Matcher m = GLUED.matcher(w.text());
            if (m.matches() && Unit.WORDS.containsKey(m.group(2))) {
                pos++;
                double x = Double.parseDouble(m.group(1));
                return sign * x * checkUnit(Unit.WORDS.get(m.group(2)), unit, w.span(), what);
            }
            if (m.matches()) {
                fail(w.span(), "unknown unit '" + m.group(2) + "' in " + what, "write it with " + unit.example());
                return Double.NaN;
            }
        }
        fail(here(), "expected " + what + " (a number with " + unit.example() + ")" + found(v), null);
        return Double.NaN;
    }

    private double checkUnit(Unit.Scaled got, Unit want, Span span, String what) {
        if (got.unit() != want) {
            fail(span, what + " is in the wrong unit: " + got.unit().plural() + " given, " + want.plural() + " expected",
                    "write it with " + want.example());
            return Double.NaN;
        }
        return got.factor();
    }

    /** A plain number without unit; NaN after an error. */
    private double number(String what) {
        if (failed) {
            return Double.NaN;
        }
        Value v = peek();
        double sign = 1;
        if (v instanceof Value.Sym s && s.text().equals("-")) {
            sign = -1;
            pos++;
            v = peek();
        }
        if (v instanceof Value.Num n) {
            pos++;
            return sign * parseDouble(n);
        }
        fail(here(), "expected " + what + " (a plain number)" + found(v), null);
        return Double.NaN;
    }

    /** A whole number; -1 after an error. */
    long whole(String what) {
        return whole(what, 0, Long.MAX_VALUE);
    }

    /** A whole number within bounds; -1 after an error. */
    long whole(String what, long min, long max) {
        if (failed) {
            return -1;
        }
        Value v = peek();
        if (v instanceof Value.Num n) {
            pos++;
            BigInteger b = parseWhole(n.text());
            if (b == null) {
                fail(n.span(), "expected " + what + " as a whole number, found '" + n.text() + "'", null);
                return -1;
            }
            if (b.compareTo(BigInteger.valueOf(min)) < 0 || b.compareTo(BigInteger.valueOf(max)) > 0) {
                fail(n.span(), what + " is out of range: " + n.text(), "use a value from " + min + " to " + max);
                return -1;
            }
            return b.longValueExact();
        }
        fail(here(), "expected " + what + " (a whole number)" + found(v), null);
        return -1;
    }

    /** A bare word; null after an error. */
    String word(String what) {
        if (failed) {
            return null;
        }
        Value v = peek();
        if (v instanceof Value.Word w) {
            pos++;
            return w.text();
        }
        if (v instanceof Value.Num n) {
            pos++;
            return n.text();
        }
        fail(here(), "expected " + what + found(v), null);
        return null;
    }

    Span lastSpan() {
        return pos == 0 ? prop.span() : values.get(pos - 1).span();
    }

    String string(String what) {
        if (failed) {
            return null;
        }
        Value v = peek();
        if (v instanceof Value.Str s) {
            pos++;
            return s.text();
        }
        fail(here(), "expected " + what + " in quotes" + found(v), null);
        return null;
    }

    void expectSym(String sym) {
        if (failed) {
            return;
        }
        if (peekSym(sym)) {
            pos++;
            return;
        }
        fail(here(), "expected '" + sym + "'" + found(peek()), null);
    }

    void expectWord(String w) {
        if (failed) {
            return;
        }
        if (peekWord(w)) {
            pos++;
            return;
        }
        fail(here(), "expected '" + w + "'" + found(peek()), null);
    }

    boolean acceptWord(String w) {
        if (!failed && peekWord(w)) {
            pos++;
            return true;
        }
        return false;
    }

    /** Reports leftovers after the expected values. */
    void end() {
        if (!failed && !atEnd()) {
            fail(peek().span(), "unexpected '" + peek().text() + "' after the value of '" + prop.key().text() + "'",
                    "one value per property line; start a new line for the next property");
        }
    }

    private static String found(Value v) {
        return v == null ? ", found end of line" : ", found '" + v.text() + "'";
    }

    /** A number as written; hex and binary of any length become doubles, too large ones infinite. */
    private static double parseDouble(Value.Num n) {
        BigInteger b = parseWhole(n.text());
        if (b != null) {
            return b.doubleValue();
        }
        try {
            return Double.parseDouble(n.text().replace("_", ""));
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    /** A whole number written in decimal, {@code 0x} hex or {@code 0b} binary, or null. */
    private static BigInteger parseWhole(String text) {
        String t = text.replace("_", "");
        try {
            if (t.startsWith("0x")) {
                return new BigInteger(t.substring(2), 16);
            }
            if (t.startsWith("0b")) {
                return new BigInteger(t.substring(2), 2);
            }
            return new BigInteger(t);
        } catch (NumberFormatException e) {
            return null;
        }
    }
}
