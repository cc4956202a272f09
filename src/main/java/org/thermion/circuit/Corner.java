package org.thermion.circuit;

import java.util.Map;
import java.util.TreeMap;

/**
 * One corner of the tolerances: a factor per parameter label (a rail "rail.bplus", a resistor
 * "driver.load", an emission "receiver.emission"); labels not named keep factor 1.
 */
public record Corner(Map<String, Double> factors) {
    /** Every part at its nominal value. */
    public static final Corner NOMINAL = new Corner(Map.of());

    public Corner {
        factors = Map.copyOf(factors);
        factors.forEach((k, f) -> Checks.positive("factor of " + k, f));
    }

    /** The factor for {@code label}. */
    public double factor(String label) {
        return factors.getOrDefault(label, 1.0);
    }

    /** This corner with {@code label} at {@code factor}. */
    public Corner with(String label, double factor) {
        Map<String, Double> m = new TreeMap<>(factors);
        m.put(label, factor);
        return new Corner(m);
    }

    /** The corner named for a reader, e.g. "bplus -5 %, driver.load +5 %, driver.emission 70 %". */
    public String describe() {
        return describe(null);
    }

    /**
     * As {@link #describe()}, with each rail given as the volts it stands at in this corner, from
     * {@code rails} (the voltages the solve starts from); null: rails as percentages too.
     */
    public String describe(RailSet rails) {
        if (factors.isEmpty()) {
            return "nominal";
        }
        StringBuilder sb = new StringBuilder();
        new TreeMap<>(factors).forEach((k, f) -> {
            if (sb.length() > 0) {
                sb.append(", ");
            }
            org.thermion.model.Rail rail = rails != null && k.startsWith("rail.") ? rails.rail(k.substring(5)) : null;
            if (k.endsWith("emission")) {
                sb.append(k).append(' ').append(Math.round(f * 100)).append(" %");
            } else if (rail != null) {
                sb.append(rail.name()).append(' ').append(String.format(java.util.Locale.ROOT, "%.1f V", rail.volts() * f));
            } else {
                sb.append(k.startsWith("rail.") ? k.substring(5) : k).append(' ')
                        .append(String.format(java.util.Locale.ROOT, "%+.0f %%", (f - 1) * 100));
            }
        });
        return sb.toString();
    }
}
