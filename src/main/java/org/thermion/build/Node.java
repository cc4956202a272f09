package org.thermion.build;

import java.util.List;

/**
 * One electrical node of the built machine: a logic net of the netlist ({@code net} >= 0), a rail,
 * a node inside one stage (a grid tap, a plate of a stacked pair), or a link of a heater string.
 */
public record Node(String name, Kind kind, int net, List<Lead> leads) {
    /** What a node is. */
    public enum Kind { NET, RAIL, LOCAL, HEATER }

    public Node {
        leads = List.copyOf(leads);
    }
}
