package org.thermion.circuit;

/**
 * Diode section by the 3/2-power (Child–Langmuir) law: I = G·V^1.5 for V > 0, with the
 * perveance G taken from one published point (volts, amperes).
 *
 * @param maxAmps rated average current per plate (NaN when unknown)
 */
public record ChildDiode(String name, double perveance, double maxAmps, String source) implements TubeModel {

    public ChildDiode {
        Checks.positive("perveance", perveance);
    }

    /** The diode whose law passes through ({@code volts}, {@code amps}). */
    public static ChildDiode throughPoint(String name, double volts, double amps, double maxAmps, String source) {
        Checks.positive("volts", volts);
        Checks.positive("amps", amps);
        return new ChildDiode(name, amps / Math.pow(volts, 1.5), maxAmps,
                source + " (perveance from " + volts + " V, " + amps * 1e3 + " mA)");
    }

    /** Plate current in amperes at plate-to-cathode voltage {@code v}. */
    public double current(double v) {
        return v > 0 ? perveance * v * Math.sqrt(v) : 0;
    }
}
