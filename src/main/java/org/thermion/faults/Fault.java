package org.thermion.faults;

import java.util.List;

/**
 * One modelled fault: its kind, what it names ({@code subject}: the slot of a stuck-at, the
 * envelope of a dead tube, the heater string, the relay stage's gate, the lamp, the bridge's
 * place in {@link FaultList#bridges()}), the wires it forces and, for a solder bridge, the two
 * nets it joins ({@code bridge}, null otherwise). {@code id} is its index in the full fault list.
 */
public record Fault(int id, FaultKind kind, int subject, List<Force> forces, Bridge bridge) {
    public Fault {
        forces = List.copyOf(forces);
    }

    /** A fault that only forces wires. */
    public Fault(int id, FaultKind kind, int subject, List<Force> forces) {
        this(id, kind, subject, forces, null);
    }

    /** The stem slots the fault touches: its forced wires, or the two bridged nets. */
    public int[] slots() {
        if (bridge != null) {
            return new int[] {bridge.slotA(), bridge.slotB()};
        }
        int[] out = new int[forces.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = forces.get(i).slot();
        }
        return out;
    }
}
