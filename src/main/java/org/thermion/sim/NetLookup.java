package org.thermion.sim;

import org.thermion.lang.Names;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Finds nets by the names of {@code Netlist.netNames()} ({@code acc}, {@code osel.term[3]}),
 * or a whole bus by its base name ({@code line} for {@code line[0]..line[15]}).
 */
public final class NetLookup {
    private final Map<String, Integer> byName = new HashMap<>();
    private final Map<String, List<Integer>> buses = new LinkedHashMap<>();

    public NetLookup(Machine machine) {
        this(namedNets(machine.netlist().netNames()));
    }

    /** Looks names up among {@code named} (name to net, in the order buses list their bits' first use). */
    public NetLookup(Map<String, Integer> named) {
        Map<String, String> nameOfBit = new HashMap<>();
        for (Map.Entry<String, Integer> e : named.entrySet()) {
            String name = e.getKey();
            byName.put(name, e.getValue());
            int open = name.lastIndexOf('[');
            if (open > 0 && name.endsWith("]")) {
                buses.computeIfAbsent(name.substring(0, open), k -> new ArrayList<>()).add(e.getValue());
                nameOfBit.put(name.substring(0, open) + "#" + e.getValue(), name);
            }
        }
        for (Map.Entry<String, List<Integer>> bus : buses.entrySet()) {
            String base = bus.getKey();
            bus.getValue().sort((a, b) -> Integer.compare(bitIndex(nameOfBit.get(base + "#" + a)),
                    bitIndex(nameOfBit.get(base + "#" + b))));
        }
    }

    private static Map<String, Integer> namedNets(String[] names) {
        Map<String, Integer> m = new LinkedHashMap<>();
        for (int n = 2; n < names.length; n++) {
            m.put(names[n], n);
        }
        return m;
    }

    /** The bus a name is a bit of ({@code line} for {@code line[3]}), or null. */
    public static String busOf(String name) {
        int open = name.lastIndexOf('[');
        return open > 0 && name.endsWith("]") ? name.substring(0, open) : null;
    }

    /** The index of a bus bit name ({@code 3} for {@code line[3]}); {@code Integer.MAX_VALUE} when it has none. */
    public static int bitIndex(String name) {
        try {
            return Integer.parseInt(name.substring(name.lastIndexOf('[') + 1, name.length() - 1));
        } catch (NumberFormatException e) {
            return Integer.MAX_VALUE;
        }
    }

    /** True when the net's last name part is a temporary the elaborator made ({@code $7}). */
    public static boolean temporary(String netName) {
        int dot = netName.lastIndexOf('.');
        return netName.startsWith("$", dot + 1);
    }

    /**
     * The nets a name stands for: one net, or every bit of a bus, LSB first.
     *
     * @throws IllegalArgumentException naming the nearest known name when there is no such net
     */
    public List<Integer> resolve(String name) {
        Integer n = byName.get(name);
        if (n != null) {
            return List.of(n);
        }
        List<Integer> bus = buses.get(name);
        if (bus != null) {
            return List.copyOf(bus);
        }
        List<String> candidates = new ArrayList<>(byName.keySet());
        candidates.addAll(buses.keySet());
        candidates.removeIf(NetLookup::temporary);
        String hint = null;
        int dot = name.lastIndexOf('.');
        if (dot >= 0) {
            // A port of an instance is joined to the net outside it, which keeps the outer name.
            String leaf = name.substring(dot + 1);
            String outer = candidates.stream().filter(c -> c.equals(leaf) || c.endsWith("." + leaf))
                    .min((a, b) -> Integer.compare(a.length(), b.length())).orElse(null);
            if (outer != null) {
                hint = "a port takes the name of the net it is connected to: did you mean '" + outer + "'?";
            }
        }
        if (hint == null) {
            hint = Names.didYouMean(name, candidates);
        }
        throw new IllegalArgumentException("no net named '" + name + "'" + (hint == null ? "" : "; " + hint));
    }
}
