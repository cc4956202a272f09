package org.thermion.text;

import java.util.Locale;

/** Figures for messages, each in the unit a builder would read it in. */
public final class Quantities {
    private Quantities() {
    }

    /** A current: mA from 0.1 mA to 1 A (the common case), else uA or A, so no figure reads 0.00. */
    public static String amps(double a) {
        double m = Math.abs(a);
        if (m >= 1) {
            return String.format(Locale.ROOT, "%.2f A", a);
        }
        if (m >= 1e-4) {
            return String.format(Locale.ROOT, "%.2f mA", a * 1e3);
        }
        return String.format(Locale.ROOT, "%.2f uA", a * 1e6);
    }

    /** A resistance with three significant figures and no trailing zeros: "887 ohm", "4.7 k", "1 M". */
    public static String ohms(double ohms) {
        double scale = ohms >= 1e6 ? 1e6 : ohms >= 1000 ? 1000 : 1;
        String n = new java.math.BigDecimal(ohms / scale).round(new java.math.MathContext(3)).stripTrailingZeros()
                .toPlainString();
        return n + (scale == 1e6 ? " M" : scale == 1000 ? " k" : " ohm");
    }
}
