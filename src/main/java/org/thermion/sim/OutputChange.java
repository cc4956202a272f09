package org.thermion.sim;

/** A machine output bit changing: in which cycle (0-based) and phase, and its new value '0', '1' or 'x'. */
public record OutputChange(long cycle, int phase, String output, char value) {
}
