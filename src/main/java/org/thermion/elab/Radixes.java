package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.Value;
import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** The machine block's {@code radix} lines checked against its input and output buses. */
final class Radixes {
    private Radixes() {
    }

    /** Bus name to radix; a name that is no bus of the machine's inputs or outputs is an error at its place. */
    static Map<String, Integer> of(MachineBlock mb, List<Port> inputs, List<Port> outputs, Diagnostics diags) {
        Set<String> buses = new LinkedHashSet<>();
        List<Port> ports = new ArrayList<>(inputs);
        ports.addAll(outputs);
        for (Port p : ports) {
            int open = p.name().lastIndexOf('[');
            if (open > 0 && p.name().endsWith("]")) {
                buses.add(p.name().substring(0, open));
            }
        }
        Map<String, Integer> out = new LinkedHashMap<>();
        for (int i = 0; i < mb.radixBuses.size(); i++) {
            Value v = mb.radixBuses.get(i);
            if (!buses.contains(v.text()) && ports.stream().anyMatch(p -> p.name().equals(v.text()))) {
                diags.error(v.span(), "'" + v.text() + "' is one bit, not a bus: a radix is for a bus of several bits",
                        "declare the port with a width (e.g. in " + v.text() + "[4]) or leave it out of the radix line");
            } else if (!buses.contains(v.text())) {
                List<String> known = new ArrayList<>(buses);
                diags.error(v.span(), "no input or output bus '" + v.text() + "' to write in a radix",
                        Declarations.hintFor(v.text(), known, known.isEmpty()
                                ? "the machine's inputs and outputs hold no bus (a port declared with a width, like code[3])"
                                : "name a bus of the inputs or outputs lines, e.g. " + known.get(0)));
            } else {
                out.put(v.text(), mb.radixes.get(i));
            }
        }
        return out;
    }
}
