package org.thermion.circuit;

/**
 * A net's levels and margins: the driver's worst high and low output under its loads, the
 * receivers' thresholds, NM_H = V_OH − V_IH and NM_L = V_IL − V_OL (textbook definition).
 * NaN levels mean no DC solution at some input state ({@code problem} says why).
 */
public record NoiseMargins(double voh, double vol, Thresholds thresholds, int loads, String problem) {

    public double highMargin() {
        return thresholds == null ? Double.NaN : voh - thresholds.vih();
    }

    public double lowMargin() {
        return thresholds == null ? Double.NaN : thresholds.vil() - vol;
    }

    /** The smaller margin (NaN-safe: no solution counts as −infinity). */
    public double worst() {
        double h = highMargin();
        double l = lowMargin();
        if (Double.isNaN(h) || Double.isNaN(l)) {
            return Double.NEGATIVE_INFINITY;
        }
        return Math.min(h, l);
    }
}
