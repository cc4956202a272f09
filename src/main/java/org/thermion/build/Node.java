package org.thermion.build;

import java.util.List;

/**
 * One electrical node of the built machine: a logic net of the netlist ({@code net} >= 0), a rail,
 * a node inside one stage (a grid tap, a plate of a stacked pair), or a link of a heater string.
 * A node inside a stage names its stage instance ({@code stage}, a {@link StageKey}; -1 otherwise)
 * and the node of the stage's circuit it is ({@code point}: "cathode", "tap0"; null otherwise),
 * so that the stage's operating point gives its voltage.
 */
public record Node(String name, Kind kind, int net, List<Lead> leads, int stage, String point) {
    /** What a node is. */
    public enum Kind { NET, RAIL, LOCAL, HEATER }

    public Node {
        leads = List.copyOf(leads);
    }
}
