package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.lang.ast.Value;

import java.math.BigInteger;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads the values of one property line left to right: quantities with units, words,
 * whole numbers, or (through {@link SlotReader}) a list of {@link Slot}s as a table declares them.
 * Every mismatch is reported once, at the offending token; numbers that are not finite or
 * do not fit are reported with the limit, never passed on.
 */
final class PropReader {
    private static final Pattern GLUED = Pattern.compile("([0-9]+(?:\\.[0-9]+)?)([A-Za-z]+)");
    /** A resistor's marking with its multiplier as the decimal point (IEC 60062): 4k7, 2M2, 4R7. */
    private static final Pattern RESISTOR_CODE = Pattern.compile("([0-9]+)([kKMRr])([0-9]+)");

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

    /** The value {@code ahead} places past the next, or null. */
    private Value peek(int ahead) {
        return pos + ahead >= values.size() ? null : values.get(pos + ahead);
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

    void fail(Span span, String message, String hint) {
        if (!failed) {
            diags.error(span, message, hint);
        }
        failed = true;
    }

    /** Reads {@code slots} in order into {@code into}/{@code spans}; false after an error. */
    boolean read(List<Slot> slots, Map<String, Object> into, Map<String, Span> spans) {
        return new SlotReader(this).read(slots, into, spans);
    }

    /** Reads a whole line against a table entry: its slots, then nothing more. Null after an error. */
    PropLine line(Property p) {
        return new SlotReader(this).line(p);
    }

    Prop prop() {
        return prop;
    }

    /** The index of the next value, for {@link #written(int)}. */
    int position() {
        return pos;
    }

    /** Passes over the next value, already looked at with {@link #peek()}. */
    void skip() {
        pos++;
    }

    /** The tokens from {@code start} to the reader's position as written: "-2 A", "47k". */
    String written(int start) {
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

    /** A quantity of the given dimension, in SI; NaN after an error. */
    double quantity(Unit unit, String what) {
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
            if (u instanceof Value.Word w && Unit.meant(w.text()) != null) {
                String meant = Unit.meant(w.text(), unit);
                fail(w.span(), "unknown unit '" + w.text() + "' in " + what, meant != null ? "write " + n.text() + " "
                        + meant + " (" + what + " takes " + unit.example() + ")" : "write it with " + unit.example());
                return Double.NaN;
            }
            if (u instanceof Value.Sym c && c.text().equals(",") && peek(1) instanceof Value.Num) {
                fail(c.span(), what + " has a decimal comma", "write a decimal point: " + n.text() + "." + ((Value.Num)
                        peek(1)).text());
                return Double.NaN;
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
                String meant = Unit.meant(m.group(2), unit);
                fail(w.span(), "unknown unit '" + m.group(2) + "' in " + what, meant != null ? "write " + m.group(1)
                        + " " + meant + " (" + what + " takes " + unit.example() + ")" : "write it with " + unit.example());
                return Double.NaN;
            }
            Matcher code = RESISTOR_CODE.matcher(w.text());
            if (unit == Unit.OHM && code.matches()) {
                String word = code.group(2).toUpperCase(Locale.ROOT).equals("R") ? "ohm"
                        : code.group(2).equals("M") ? "M" : "k";
                fail(w.span(), "expected " + what + " (a number with " + unit.example() + "), found the resistor "
                        + "marking '" + w.text() + "'", "write " + code.group(1) + "." + code.group(3) + " " + word);
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
    double number(String what) {
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
        fail(here(), "expected '" + w + "'" + found(peek()), "percent".equals(w) ? percentHint() : null);
    }

    /**
     * A share written without `percent` right after its number: a fraction (0.7 for 70 %) is the likely slip, and
     * 1.5 may be 150 % meant as a fraction; say what the line would read in percent.
     */
    private String percentHint() {
        Value before = pos > 0 ? values.get(pos - 1) : null;
        if (!(before instanceof Value.Num n)) {
            return null;
        }
        double x = parseDouble(n);
        String as = Unit.number(x) + " percent";
        return x > 0 && x <= 2 ? "write it in percent: `" + as + "` is " + Unit.number(x) + " %; a fraction "
                + Unit.number(x) + " is `" + Unit.number(100 * x) + " percent`" : "write `" + as + "`";
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

    static String found(Value v) {
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
