package org.thermion.sim;

import java.util.List;

/**
 * Watched values at the end of one cycle: the cycle (0-based), the address of the instruction
 * it ran, and one value per watched name: '0', '1' or 'x' for a net, hexadecimal for a bus
 * or the program counter.
 */
public record WatchRow(long cycle, int pc, List<String> values) {
    public WatchRow {
        values = List.copyOf(values);
    }
}
