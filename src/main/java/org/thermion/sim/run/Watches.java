package org.thermion.sim.run;

import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.model.StateBit;
import org.thermion.sim.NetLookup;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Turns watched names into {@link Watch}es: a net, a bus by its name, or {@code pc}. */
public final class Watches {
    private Watches() {
    }

    /**
     * Names on the logic level: any net as {@code check} lists it, a bus by its name, and
     * {@code pc} (unless a net is called so).
     *
     * @throws IllegalArgumentException naming the nearest known name for an unknown one
     */
    public static List<Watch> logic(Machine m, List<String> names) {
        return resolve(m, names, new NetLookup(m));
    }

    /** Names on the ISA level: state bits, inputs, buses of either, and {@code pc}. */
    public static List<Watch> isa(Machine m, List<String> names) {
        Map<String, Integer> named = new LinkedHashMap<>();
        for (StateBit b : m.isa().state()) {
            named.put(b.name(), b.net());
        }
        for (Port p : m.inputs()) {
            named.putIfAbsent(p.name(), p.net());
        }
        try {
            return resolve(m, names, new NetLookup(named));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(e.getMessage().replace("no net named", "no state bit or input named")
                    .replaceFirst("(named '[^']*')", "$1 at the ISA level"), e);
        }
    }

    private static List<Watch> resolve(Machine m, List<String> names, NetLookup lookup) {
        List<Watch> out = new ArrayList<>();
        for (String raw : names) {
            String name = raw.strip();
            if (name.equals("pc") && m.pc() != null && !known(lookup, name)) {
                out.add(Watch.pc());
                continue;
            }
            List<Integer> nets = lookup.resolve(name);
            out.add(new Watch(name, nets.stream().mapToInt(Integer::intValue).toArray()));
        }
        return out;
    }

    private static boolean known(NetLookup lookup, String name) {
        try {
            lookup.resolve(name);
            return true;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    /** The machine's outputs as watches: a bus of output ports as one, in the order of its first bit. */
    public static List<Watch> outputs(Machine m) {
        Map<String, List<Integer>> groups = new LinkedHashMap<>();
        Map<String, Integer> bitIndex = new LinkedHashMap<>();
        for (Port p : m.outputs()) {
            String bus = NetLookup.busOf(p.name());
            String key = bus == null ? p.name() : bus;
            groups.computeIfAbsent(key, k -> new ArrayList<>()).add(p.net());
            bitIndex.put(key + "#" + p.net(), bus == null ? 0 : NetLookup.bitIndex(p.name()));
        }
        List<Watch> out = new ArrayList<>();
        for (Map.Entry<String, List<Integer>> g : groups.entrySet()) {
            List<Integer> nets = new ArrayList<>(g.getValue());
            nets.sort((a, b) -> Integer.compare(bitIndex.get(g.getKey() + "#" + a), bitIndex.get(g.getKey() + "#" + b)));
            out.add(new Watch(g.getKey(), nets.stream().mapToInt(Integer::intValue).toArray()));
        }
        return out;
    }
}
