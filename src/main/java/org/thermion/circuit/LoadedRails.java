package org.thermion.circuit;

import java.util.Map;

/**
 * The machine's rails at one static loading, solved so that each rail's voltage and the
 * current its loads take at that voltage agree. {@code problem} is null when they do; else why
 * not (a rail that cannot supply its load).
 */
public record LoadedRails(Loading loading, Map<String, RailState> rails, int iterations, String problem) {
    public LoadedRails {
        rails = Map.copyOf(rails);
    }

    /** The loaded volts of a rail (NaN when the machine has no rail of that name). */
    public double volts(String rail) {
        RailState r = rails.get(rail);
        return r == null ? Double.NaN : r.volts();
    }

    /** The rails at these voltages, for a solver. */
    public RailSet railSet() {
        java.util.Map<String, org.thermion.model.Rail> m = new java.util.LinkedHashMap<>();
        rails.values().forEach(r -> m.put(r.rail(), new org.thermion.model.Rail(r.rail(), r.volts(), r.sourceOhms(),
                r.limitAmps())));
        return new RailSet(m);
    }
}
