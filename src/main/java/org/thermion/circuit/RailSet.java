package org.thermion.circuit;

import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.Map;

import org.thermion.model.Rail;

/**
 * The rails a stage is solved at: the machine's own, by name. "ground" (0 V) is always present.
 * A rail's current limit (NaN or infinite when none) is checked against what a solve draws.
 */
public record RailSet(Map<String, Rail> rails) {
    /** The reference every circuit returns to. */
    public static final String GROUND = "ground";

    public RailSet {
        Map<String, Rail> m = new LinkedHashMap<>(rails);
        m.putIfAbsent(GROUND, new Rail(GROUND, 0, 0, Double.POSITIVE_INFINITY));
        m.values().forEach(r -> Checks.finite("volts of rail " + r.name(), r.volts()));
        rails = Map.copyOf(m);
    }

    /** From the machine's rails. */
    public static RailSet of(Collection<Rail> rails) {
        Map<String, Rail> m = new LinkedHashMap<>();
        rails.forEach(r -> m.put(r.name(), r));
        return new RailSet(m);
    }

    /** Ideal rails of the given volts, no limits: "bplus", 48.0, "bias", -12.0, ... */
    public static RailSet volts(Object... nameVolts) {
        Map<String, Rail> m = new LinkedHashMap<>();
        for (int i = 0; i < nameVolts.length; i += 2) {
            String n = (String) nameVolts[i];
            m.put(n, new Rail(n, ((Number) nameVolts[i + 1]).doubleValue(), 0, Double.POSITIVE_INFINITY));
        }
        return new RailSet(m);
    }

    /**
     * The most positive rail (the first by name on a tie). A soft start's thyratron takes its
     * grid network's input from it: the grid then stands above its critical voltage, so the tube
     * fires as soon as its cathode can emit, which is what "bypass when ... warm" asks.
     */
    public Rail highest() {
        return rails.values().stream()
                .max(java.util.Comparator.comparingDouble(Rail::volts).thenComparing(Rail::name, java.util.Comparator.reverseOrder()))
                .orElseThrow();
    }

    /** The rail named, or null. */
    public Rail rail(String name) {
        return rails.get(name);
    }
}
