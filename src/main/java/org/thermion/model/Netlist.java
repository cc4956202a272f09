package org.thermion.model;

import java.util.List;

/**
 * The flat netlist. Nets are numbered; net 0 is constant 0 and net 1 constant 1.
 * {@code netModule[n]} is the module instance whose scope holds net n.
 * Gates are in levelized order: each gate's inputs are driven by constants, inputs,
 * latches or earlier gates. Arrays are copied in and handed out as copies: loops read
 * {@link #netName(int)} and {@link #netModule(int)}. {@code netPlaces[n]} is "file:line" of the
 * statement that drives net n (null when unknown), so reports can point at a generated net's source.
 */
public record Netlist(String[] netNames, int[] netModule, List<Gate> gates, List<Latch> latches, String[] netPlaces) {
    public static final int CONST0 = 0;
    public static final int CONST1 = 1;

    public Netlist {
        netNames = netNames.clone();
        netModule = netModule.clone();
        netPlaces = netPlaces == null ? new String[netNames.length] : java.util.Arrays.copyOf(netPlaces, netNames.length);
        gates = List.copyOf(gates);
        latches = List.copyOf(latches);
    }

    /** A netlist without source places. */
    public Netlist(String[] netNames, int[] netModule, List<Gate> gates, List<Latch> latches) {
        this(netNames, netModule, gates, latches, null);
    }

    /** A copy of the source places. */
    @Override
    public String[] netPlaces() {
        return netPlaces.clone();
    }

    /** "file:line" of the statement driving {@code net}, or null. */
    public String netPlace(int net) {
        return netPlaces[net];
    }

    /** True for a net the elaborator named itself (an expression's inner result, "$N"). */
    public boolean isGenerated(int net) {
        String n = netNames[net];
        return n.startsWith("$", n.lastIndexOf('.') + 1);
    }

    /** A copy of the net names. */
    @Override
    public String[] netNames() {
        return netNames.clone();
    }

    /** A copy of the module of every net. */
    @Override
    public int[] netModule() {
        return netModule.clone();
    }

    public int netCount() {
        return netNames.length;
    }

    public String netName(int net) {
        return netNames[net];
    }

    /** The module instance whose scope holds {@code net}. */
    public int netModule(int net) {
        return netModule[net];
    }
}
