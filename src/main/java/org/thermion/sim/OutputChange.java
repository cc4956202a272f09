package org.thermion.sim;

/**
 * A machine output changing: in which cycle (0-based) and phase, and its new value: '0', '1' or
 * 'x' for a bit, hexadecimal ({@code 0x0c}, an 'x' digit where a bit is unknown) for a bus.
 */
public record OutputChange(long cycle, int phase, String output, String value) {
}
