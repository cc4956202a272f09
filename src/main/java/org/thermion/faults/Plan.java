package org.thermion.faults;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * A bring-up test plan: the steps, the lamps the good machine shows after each
 * ({@code expected[step][lamp]}, 0, 1 or {@link FaultSimulator#UNKNOWN}), and what became of
 * every collapsed fault ({@code outcome} and {@code detectedAt}, by position in
 * {@code faults}). {@code targets} is how many faults plan generation aimed at after
 * dominance.
 */
public record Plan(List<Step> steps, byte[][] expected, List<Fault> faults, Outcome[] outcome, int[] detectedAt,
                   int targets) {
    public Plan {
        steps = List.copyOf(steps);
    }

    /** How many faults ended in each outcome. */
    public Map<Outcome, Integer> counts() {
        Map<Outcome, Integer> m = new EnumMap<>(Outcome.class);
        for (Outcome o : Outcome.values()) {
            m.put(o, 0);
        }
        for (Outcome o : outcome) {
            m.merge(o, 1, Integer::sum);
        }
        return m;
    }

    public int count(Outcome o) {
        return counts().get(o);
    }
}
