package org.thermion.spice;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads back the subset of SPICE3 that {@link SpiceDeck} writes: a title line, '*' comments,
 * '+' continuations, R, C, V (DC) and B (I=expression) cards, and the control lines .op and .end.
 * Anything else is an error naming its line, so the reader doubles as a check that a deck stays
 * within the documented element set.
 */
public final class SpiceReader {
    private SpiceReader() {
    }

    /** A line the reader cannot accept. */
    public static final class BadDeck extends IllegalArgumentException {
        public BadDeck(int line, String what) {
            super("line " + line + ": " + what);
        }
    }

    /** Parses {@code text}; throws {@link BadDeck} at the first line outside the subset. */
    public static SpiceDeck read(String text) {
        String[] raw = text.split("\r?\n", -1);
        if (raw.length == 0 || raw[0].isBlank()) {
            throw new BadDeck(1, "a deck starts with its title line");
        }
        List<String> logical = new ArrayList<>();
        List<Integer> at = new ArrayList<>();
        for (int i = 1; i < raw.length; i++) {
            String l = raw[i];
            if (l.startsWith("+")) {
                if (logical.isEmpty()) {
                    throw new BadDeck(i + 1, "a continuation with no card before it");
                }
                int last = logical.size() - 1;
                logical.set(last, logical.get(last) + " " + l.substring(1).trim());
            } else {
                logical.add(l);
                at.add(i + 1);
            }
        }
        List<SpiceDeck.Line> lines = new ArrayList<>();
        boolean ended = false;
        for (int i = 0; i < logical.size(); i++) {
            String l = logical.get(i).trim();
            int n = at.get(i);
            if (l.isEmpty()) {
                continue;
            }
            if (ended) {
                throw new BadDeck(n, "text after .end");
            }
            if (l.startsWith("*")) {
                lines.add(SpiceDeck.Line.note(l.substring(1).trim()));
                continue;
            }
            String lower = l.toLowerCase(Locale.ROOT);
            if (lower.equals(".op")) {
                continue;
            }
            if (lower.equals(".end")) {
                ended = true;
                continue;
            }
            lines.add(SpiceDeck.Line.of(card(l, n)));
        }
        if (!ended) {
            throw new BadDeck(raw.length, "the deck has no .end line");
        }
        return new SpiceDeck(raw[0], lines);
    }

    private static SpiceCard card(String l, int n) {
        char kind = Character.toLowerCase(l.charAt(0));
        if (kind == 'b') {
            int eq = l.toLowerCase(Locale.ROOT).indexOf("i=");
            if (eq < 0) {
                throw new BadDeck(n, "a B source here is a current: B name from to I=expression");
            }
            String[] head = l.substring(0, eq).trim().split("\\s+");
            if (head.length != 3) {
                throw new BadDeck(n, "expected B name from to I=expression");
            }
            String expr = l.substring(eq + 2).trim();
            try {
                SpiceExpression.parse(expr);
            } catch (IllegalArgumentException e) {
                throw new BadDeck(n, "expression " + e.getMessage());
            }
            return new SpiceCard.CurrentExpression(head[0], head[1], head[2], expr);
        }
        String[] f = l.split("\\s+");
        switch (kind) {
            case 'r':
                need(f, 4, n, "R name a b ohms");
                return new SpiceCard.Resistor(f[0], f[1], f[2], positive(f[3], n));
            case 'c':
                need(f, 4, n, "C name a b farads");
                return new SpiceCard.Capacitor(f[0], f[1], f[2], positive(f[3], n));
            case 'v':
                if (f.length == 5 && f[3].equalsIgnoreCase("dc")) {
                    return new SpiceCard.VoltageSource(f[0], f[1], f[2], value(f[4], n));
                }
                need(f, 4, n, "V name plus minus [DC] volts");
                return new SpiceCard.VoltageSource(f[0], f[1], f[2], value(f[3], n));
            default:
                throw new BadDeck(n, "'" + f[0] + "' is not an R, C, V or B card (the element set of these decks)");
        }
    }

    private static void need(String[] f, int count, int n, String form) {
        if (f.length != count) {
            throw new BadDeck(n, "expected " + form);
        }
    }

    private static double value(String s, int n) {
        double v = SpiceNumber.parse(s);
        if (!Double.isFinite(v)) {
            throw new BadDeck(n, "'" + s + "' is not a number");
        }
        return v;
    }

    private static double positive(String s, int n) {
        double v = value(s, n);
        if (!(v > 0)) {
            throw new BadDeck(n, "'" + s + "' must be above 0");
        }
        return v;
    }
}
