package org.thermion.cli;

import java.util.Locale;

/** Formats SI values for people: a sensible prefix and three significant figures. */
public final class Units {
    private Units() {
    }

    public static String volts(double v) {
        return scaled(v, "V");
    }

    public static String amps(double a) {
        return scaled(a, "A");
    }

    public static String ohms(double r) {
        return scaled(r, "ohm");
    }

    public static String watts(double w) {
        return scaled(w, "W");
    }

    public static String time(double s) {
        return scaled(s, "s");
    }

    public static String farads(double f) {
        return scaled(f, "F");
    }

    public static String scaled(double v, String unit) {
        if (Double.isNaN(v)) {
            return "-";
        }
        double a = Math.abs(v);
        String[] p = {"p", "n", "u", "m", "", "k", "M"};
        double[] f = {1e-12, 1e-9, 1e-6, 1e-3, 1, 1e3, 1e6};
        int k = 4;
        if (a != 0) {
            for (int i = p.length - 1; i >= 0; i--) {
                if (a >= f[i] * 0.9995) {
                    k = i;
                    break;
                }
                k = 0;
            }
        }
        if (unit.equals("ohm") && k < 4) {
            k = 4;
        }
        double x = v / f[k];
        String num = Math.abs(x) >= 100 ? String.format(Locale.ROOT, "%.0f", x)
                : Math.abs(x) >= 10 ? String.format(Locale.ROOT, "%.1f", x) : String.format(Locale.ROOT, "%.2f", x);
        String space = unit.equals("ohm") && !p[k].isEmpty() ? "" : " ";
        if (unit.equals("ohm") && !p[k].isEmpty()) {
            return num + " " + p[k] + "ohm";
        }
        return num + space + p[k] + unit;
    }
}
