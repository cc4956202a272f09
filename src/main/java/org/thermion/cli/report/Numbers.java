package org.thermion.cli.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/**
 * The one number formatter of the reports. Tools (CSV, JSON) get SI base units rounded to
 * six significant figures, free of binary noise; people (text) get a value scaled by an SI
 * prefix, either alone ({@link #si}) or as a column sharing one prefix ({@link Scale}).
 */
public final class Numbers {
    private static final String[] PREFIX = {"p", "n", "u", "m", "", "k", "M", "G"};
    private static final int UNITY = 4;
    private static final MathContext SIX = new MathContext(6);

    private Numbers() {
    }

    /** {@code v} to six significant figures, or null when it is not a finite number. */
    public static BigDecimal decimal(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return null;
        }
        if (v == 0) {
            return BigDecimal.ZERO;
        }
        BigDecimal d = new BigDecimal(v).round(SIX).stripTrailingZeros();
        return d.scale() < 0 ? d.setScale(0) : d;
    }

    /** {@code v} for a CSV field: six significant figures, empty when not finite. */
    public static String plain(double v) {
        BigDecimal d = decimal(v);
        return d == null ? "" : d.toString();
    }

    /** One value for people: three significant figures and a prefix ({@code 243 mA}, {@code 4.00 ohm}). */
    public static String si(double v, ReportUnit unit) {
        if (Double.isNaN(v)) {
            return "-";
        }
        if (unit == ReportUnit.PERCENT) {
            return String.format(Locale.ROOT, "%+.1f %%", v);
        }
        if (!unit.prefixed()) {
            return significant(v) + (unit.symbol() == null || unit.symbol().isEmpty() ? "" : " " + unit.symbol());
        }
        int k = prefixIndex(Math.abs(v), unit);
        return threeFigures(v / Math.pow(1000, k - UNITY)) + " " + PREFIX[k] + unit.symbol();
    }

    /** A plain number to three significant figures, in scientific notation when far from 1. */
    static String significant(double v) {
        double a = Math.abs(v);
        if (a != 0 && (a < 1e-3 || a >= 1e6)) {
            return String.format(Locale.ROOT, "%.2e", v);
        }
        return threeFigures(v);
    }

    private static String threeFigures(double x) {
        double a = Math.abs(x);
        return String.format(Locale.ROOT, a >= 99.95 ? "%.0f" : a >= 9.995 ? "%.1f" : "%.2f", x);
    }

    private static int prefixIndex(double a, ReportUnit unit) {
        if (a == 0 || Double.isNaN(a) || Double.isInfinite(a)) {
            return UNITY;
        }
        int k = 0;
        for (int i = PREFIX.length - 1; i >= 0; i--) {
            if (a >= Math.pow(1000, i - UNITY) * 0.9995) {
                k = i;
                break;
            }
        }
        return unit == ReportUnit.OHMS ? Math.max(k, UNITY) : k;
    }

    /**
     * How one table writes the values of one unit: one prefix for the whole table (chosen
     * from its largest value), and per column as many decimals as show the largest value to
     * three significant figures and the smallest non-zero one to three, at most three.
     */
    public record Scale(ReportUnit unit, int prefix) {
        /** The scale for values of {@code unit} whose largest magnitude is {@code largest}. */
        public static Scale of(ReportUnit unit, double largest) {
            return new Scale(unit, unit.prefixed() ? prefixIndex(largest, unit) : UNITY);
        }

        /** The unit as a column heading shows it ({@code mA}), empty when it has none. */
        public String symbol() {
            String s = unit.symbol();
            return s == null ? "" : PREFIX[prefix] + s;
        }

        public double scaled(double v) {
            return v / Math.pow(1000, prefix - UNITY);
        }

        /** Decimals for a column whose scaled values span {@code largest} down to {@code smallest} (non-zero). */
        public int decimals(double largest, double smallest) {
            if (unit == ReportUnit.COUNT) {
                return 0;
            }
            int d = Math.max(digitsFor(scaled(largest), 3), digitsFor(scaled(smallest), 3));
            return Math.max(0, Math.min(3, d));
        }

        private static int digitsFor(double a, int figures) {
            if (!(a > 0) || Double.isInfinite(a)) {
                return 0;
            }
            return figures - 1 - (int) Math.floor(Math.log10(a * 1.0000001));
        }

        public String format(double v, int decimals) {
            if (unit == ReportUnit.NUMBER) {
                return significant(v);
            }
            if (unit == ReportUnit.PERCENT) {
                return String.format(Locale.ROOT, "%+." + Math.max(1, decimals) + "f", v);
            }
            return String.format(Locale.ROOT, "%." + decimals + "f", scaled(v));
        }
    }
}
