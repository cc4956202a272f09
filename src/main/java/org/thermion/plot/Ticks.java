package org.thermion.plot;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * Axis ticks at round values: steps of 1, 2 or 5 times a power of ten, about six to an axis,
 * and the axis range widened to the ticks that enclose the data.
 */
record Ticks(double low, double high, List<Double> values) {
    static Ticks of(double min, double max) {
        if (!(min <= max) || !Double.isFinite(min) || !Double.isFinite(max)) {
            min = 0;
            max = 1;
        }
        if (max - min < 1e-12 * Math.max(1, Math.abs(max))) {
            double pad = min == 0 ? 1 : Math.abs(min) * 0.1;
            min -= pad;
            max += pad;
        }
        double raw = (max - min) / 6;
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = mag;
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * mag >= raw) {
                step = m * mag;
                break;
            }
        }
        double lo = Math.floor(min / step + 1e-9) * step, hi = Math.ceil(max / step - 1e-9) * step;
        List<Double> v = new ArrayList<>();
        for (long k = Math.round(lo / step); k <= Math.round(hi / step); k++) {
            v.add(k * step);
        }
        return new Ticks(lo, hi, List.copyOf(v));
    }

    /** A tick's label: the shortest decimal that names it. */
    static String label(double v) {
        if (Math.abs(v) < 1e-15) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros();
        double a = Math.abs(v);
        return a >= 1e6 || a < 1e-4 ? String.format(java.util.Locale.ROOT, "%.3g", v) : d.toPlainString();
    }
}
