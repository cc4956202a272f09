package org.thermion.sim;

/**
 * Watched values at the end of one cycle: the cycle (0-based), the address of the instruction
 * it ran, and one '0', '1' or 'x' per watched name.
 */
public record WatchRow(long cycle, int pc, String values) {
}
