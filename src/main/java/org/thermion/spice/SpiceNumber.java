package org.thermion.spice;

import java.util.Locale;

/**
 * Numbers as a SPICE3 deck writes and reads them: written in full precision with an exponent
 * ("4.7e3"), read with SPICE3's scale factors (T, G, MEG, K, M, MIL, U, N, P, F; case-insensitive,
 * trailing letters after them ignored, as the SPICE3 user's manual describes).
 */
public final class SpiceNumber {
    private SpiceNumber() {
    }

    /** The shortest text that reads back to exactly {@code v}. */
    public static String format(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return String.valueOf((long) v);
        }
        return Double.toString(v).replace('E', 'e');
    }

    /** The value of {@code text}, or NaN when it is not a SPICE number. */
    public static double parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        int sign = t.startsWith("-") || t.startsWith("+") ? 1 : 0;
        int end = numberEnd(t, sign);
        if (end == sign) {
            return Double.NaN;
        }
        double v;
        try {
            v = Double.parseDouble(t.substring(0, end));
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
        String rest = t.substring(end);
        if (rest.isEmpty()) {
            return v;
        }
        if (!Character.isLetter(rest.charAt(0))) {
            return Double.NaN;
        }
        return v * scale(rest);
    }

    /** The end of the plain number (digits, point, exponent) starting at {@code from}; {@code from} when none. */
    static int numberEnd(String t, int from) {
        int i = from;
        int digits = 0;
        while (i < t.length() && Character.isDigit(t.charAt(i))) {
            i++;
            digits++;
        }
        if (i < t.length() && t.charAt(i) == '.') {
            i++;
            while (i < t.length() && Character.isDigit(t.charAt(i))) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return from;
        }
        if (i < t.length() && (t.charAt(i) == 'e' || t.charAt(i) == 'E')) {
            int j = i + 1;
            if (j < t.length() && (t.charAt(j) == '+' || t.charAt(j) == '-')) {
                j++;
            }
            int k = j;
            while (k < t.length() && Character.isDigit(t.charAt(k))) {
                k++;
            }
            if (k > j) {
                i = k;
            }
        }
        return i;
    }

    /** The multiplier of a scale-factor suffix (lower case); 1 for unknown letters (units such as "v"). */
    static double scale(String suffix) {
        if (suffix.startsWith("meg")) {
            return 1e6;
        }
        if (suffix.startsWith("mil")) {
            return 25.4e-6;
        }
        switch (suffix.charAt(0)) {
            case 't': return 1e12;
            case 'g': return 1e9;
            case 'k': return 1e3;
            case 'm': return 1e-3;
            case 'u': return 1e-6;
            case 'n': return 1e-9;
            case 'p': return 1e-12;
            case 'f': return 1e-15;
            default: return 1;
        }
    }
}
