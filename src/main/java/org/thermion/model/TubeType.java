package org.thermion.model;

import java.util.List;

/**
 * A tube type by its trade designation. Capacitances are per section in farads;
 * {@code warmupSeconds} and {@code coldHotRatio} are NaN when not declared.
 * Ratings that do not apply are NaN. {@code basings}: the base and its pins, one per source
 * (several when sources disagree; empty when the description gives none). {@code curves} is the
 * electrical model (null when the block declares none: the tube's stages must then state their currents).
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
        List<Basing> basings,
        TubeCurves curves) {

    public TubeType {
        heaters = List.copyOf(heaters);
        basings = List.copyOf(basings);
    }

    /** The basing wired from (the first declared), or null when the tube has none. */
    public Basing basing() {
        return basings.isEmpty() ? null : basings.get(0);
    }

    /** Pins on which two of the declared basings disagree (their wiring depends on which source is right). */
    public java.util.SortedSet<Integer> doubtfulPins() {
        java.util.SortedSet<Integer> out = new java.util.TreeSet<>();
        for (Basing other : basings.subList(Math.min(1, basings.size()), basings.size())) {
            Basing first = basings.get(0);
            int n = Math.max(first.pinCount(), other.pinCount());
            for (int pin = 1; pin <= n; pin++) {
                if (!java.util.Objects.equals(first.at(pin), other.at(pin))) {
                    out.add(pin);
                }
            }
        }
        return out;
    }

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

    /** The same tube with another electrical model (null: none). */
    public TubeType withCurves(TubeCurves other) {
        return new TubeType(name, kind, sections, heaters, warmupSeconds, coldHotRatio, cgk, cgp, cpk, cin, cout,
                avgCathodeAmps, peakCathodeAmps, arcDropVolts, source, basings, other);
    }

    public boolean hasWarmup() {
        return !Double.isNaN(warmupSeconds);
    }
}
