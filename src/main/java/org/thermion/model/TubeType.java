package org.thermion.model;

import java.util.List;

/**
 * A tube type by its trade designation. Capacitances are per section in farads;
 * {@code warmupSeconds} and {@code coldHotRatio} are NaN when not declared.
 * Ratings that do not apply are NaN. {@code curves} is the electrical model (null when the
 * block declares none: the tube's stages must then state their currents).
 */
public record TubeType(
        String name,
        TubeKind kind,
        int sections,
        List<HeaterRating> heaters,
        double warmupSeconds,
        double coldHotRatio,
        double cgk,
        double cgp,
        double cpk,
        double cin,
        double cout,
        double avgCathodeAmps,
        double peakCathodeAmps,
        double arcDropVolts,
        String source,
        TubeCurves curves) {

    /** The heater rating used when nothing else is chosen: the first one declared. */
    public HeaterRating defaultHeater() {
        return heaters.get(0);
    }

    /** The rating wired for a given heater voltage, or null when the tube has none. */
    public HeaterRating heaterAt(double volts) {
        for (HeaterRating h : heaters) {
            if (Math.abs(h.volts() - volts) < 1e-6) {
                return h;
            }
        }
        return null;
    }

    public boolean hasWarmup() {
        return !Double.isNaN(warmupSeconds);
    }
}
