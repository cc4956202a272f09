package org.thermion.faults;

import java.util.List;

/**
 * One modelled fault: its kind, what it names ({@code subject}: the slot of a stuck-at, the
 * envelope of a dead tube, the heater string, the relay stage's gate, the lamp) and the wires
 * it forces. {@code id} is its index in the full fault list.
 */
public record Fault(int id, FaultKind kind, int subject, List<Force> forces) {
    public Fault {
        forces = List.copyOf(forces);
    }
}
