package org.thermion.model;

import java.util.List;

/**
 * The flat netlist. Nets are numbered; net 0 is constant 0 and net 1 constant 1.
 * {@code netModule[n]} is the module instance whose scope holds net n.
 * Gates are in levelized order: each gate's inputs are driven by constants, inputs,
 * latches or earlier gates.
 */
public record Netlist(String[] netNames, int[] netModule, List<Gate> gates, List<Latch> latches) {
    public static final int CONST0 = 0;
    public static final int CONST1 = 1;

    public int netCount() {
        return netNames.length;
    }

    public String netName(int net) {
        return netNames[net];
    }
}
