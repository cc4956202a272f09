package org.thermion.tui;

import org.thermion.model.Port;
import org.thermion.sim.NetLookup;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Machine inputs or outputs as the switch-and-lamp panel shows them: the bits of a bus
 * ({@code code[0]}, {@code code[1]}, ...) as one entry holding a number, a lone bit alone.
 *
 * @param name  the bus's name, or the bit's
 * @param ports indices into the machine's port list, least significant bit first
 */
record PortGroup(String name, int[] ports) {

    boolean bus() {
        return ports.length > 1;
    }

    /** The groups in the order their first bit comes in {@code ports}. */
    static List<PortGroup> of(List<Port> ports) {
        Map<String, List<int[]>> byName = new LinkedHashMap<>();
        for (int i = 0; i < ports.size(); i++) {
            String n = ports.get(i).name();
            String bus = NetLookup.busOf(n);
            int bit = bus == null ? 0 : NetLookup.bitIndex(n);
            // A lone bit keeps its own name; a name used both ways stays apart from the bus.
            byName.computeIfAbsent(bus == null ? n + "\u0000" : bus, k -> new ArrayList<>()).add(new int[] {bit, i});
        }
        List<PortGroup> out = new ArrayList<>();
        for (Map.Entry<String, List<int[]>> e : byName.entrySet()) {
            List<int[]> bits = e.getValue();
            bits.sort((a, b) -> Integer.compare(a[0], b[0]));
            int[] idx = new int[bits.size()];
            for (int k = 0; k < idx.length; k++) {
                idx[k] = bits.get(k)[1];
            }
            String key = e.getKey();
            boolean lone = key.endsWith("\u0000");
            String name = lone ? key.substring(0, key.length() - 1) : key;
            if (!lone && idx.length == 1) {
                // A one-bit bus reads best under its bit's own name.
                name = ports.get(idx[0]).name();
            }
            out.add(new PortGroup(name, idx));
        }
        return out;
    }
}
