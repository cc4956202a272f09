package org.thermion.cli;

import org.thermion.power.startup.PowerUpOptions;

import java.util.Locale;

/**
 * Parses the values the {@code powerup} command takes: resistances and times with their unit
 * (the same unit words as the machine language: {@code ohm k M}, {@code s ms us}), an optional
 * {@code NAME=} prefix naming a soft start, and sweep ranges {@code RMIN..RMAX:STEP}. A number
 * without a unit is refused, as in the language.
 */
final class PowerUpArgs {
    private PowerUpArgs() {
    }

    /** A value for a named (or the only) soft start; {@code softStart} is null when not named. */
    record Named<T>(String softStart, T value) {
    }

    /** A sweep range in ohms. */
    record Range(double from, double to, double step) {
    }

    static Named<Double> resistor(String text) {
        String[] p = splitName(text);
        return new Named<>(p[0], ohms(p[1], "--resistor"));
    }

    static Named<Range> sweep(String text) {
        String[] p = splitName(text);
        String body = p[1].trim();
        int dots = body.indexOf("..");
        int colon = body.lastIndexOf(':');
        if (dots < 0 || colon < dots) {
            throw new IllegalArgumentException("--sweep wants RMIN..RMAX:STEP, e.g. 1ohm..5ohm:0.25ohm, got '" + text + "'");
        }
        String a = body.substring(0, dots).trim(), b = body.substring(dots + 2, colon).trim(),
                c = body.substring(colon + 1).trim();
        // A unit written once at the end applies to all three (1..5:0.25 ohm).
        String unit = trailingUnit(c);
        double from = ohms(withUnit(a, unit), "--sweep"), to = ohms(withUnit(b, unit), "--sweep"),
                step = ohms(withUnit(c, unit), "--sweep");
        if (!(step > 0)) {
            throw new IllegalArgumentException("--sweep step must be positive, got '" + c + "'");
        }
        if (to < from) {
            throw new IllegalArgumentException("--sweep range runs backwards: " + a + " .. " + b);
        }
        return new Named<>(p[0], new Range(from, to, step));
    }

    static double seconds(String text, String option) {
        String t = text.trim();
        String[][] units = {{"ms", "1e-3"}, {"us", "1e-6"}, {"min", "60"}, {"s", "1"}};
        for (String[] u : units) {
            if (t.endsWith(u[0])) {
                double v = number(t.substring(0, t.length() - u[0].length()), option, text);
                return v * Double.parseDouble(u[1]);
            }
        }
        throw new IllegalArgumentException(option + " needs a unit (s, ms or min), e.g. '" + option + " 30s'; got '" + text + "'");
    }

    static double ohms(String text, String option) {
        String t = text.trim().replace("\u03A9", "ohm");
        String[][] units = {{"mohm", "1e-3"}, {"kohm", "1e3"}, {"Mohm", "1e6"}, {"ohm", "1"}, {"k", "1e3"}, {"M", "1e6"}};
        for (String[] u : units) {
            if (t.endsWith(u[0])) {
                double v = number(t.substring(0, t.length() - u[0].length()), option, text);
                if (v < 0) {
                    throw new IllegalArgumentException(option + ": a resistance cannot be negative, got '" + text + "'");
                }
                double ohms = v * Double.parseDouble(u[1]);
                if (ohms > PowerUpOptions.MAX_OHMS) {
                    throw new IllegalArgumentException(option + ": at most 1 Mohm, got '" + text + "'");
                }
                return ohms;
            }
        }
        throw new IllegalArgumentException(option + " needs a unit (ohm, k or M), e.g. '" + option + " 2ohm'; got '" + text + "'");
    }

    private static String trailingUnit(String s) {
        int i = s.length();
        while (i > 0 && (Character.isLetter(s.charAt(i - 1)) || s.charAt(i - 1) == '\u03A9')) {
            i--;
        }
        return s.substring(i).trim();
    }

    private static String withUnit(String s, String unit) {
        return trailingUnit(s).isEmpty() ? s + unit : s;
    }

    private static double number(String s, String option, String whole) {
        String n = s.trim();
        try {
            if (n.isEmpty()) {
                throw new NumberFormatException();
            }
            double v = Double.parseDouble(n);
            if (!Double.isFinite(v)) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(option + ": '" + whole + "' is not a number with a unit");
        }
    }

    private static String[] splitName(String text) {
        int eq = text.indexOf('=');
        if (eq < 0) {
            return new String[] {null, text};
        }
        String name = text.substring(0, eq).trim();
        if (name.isEmpty()) {
            throw new IllegalArgumentException("empty soft-start name before '=' in '" + text + "'");
        }
        return new String[] {name, text.substring(eq + 1)};
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
