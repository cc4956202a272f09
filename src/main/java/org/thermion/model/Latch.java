package org.thermion.model;

/**
 * A storage cell that loads {@code data} on clock {@code phase} (1-based) when
 * {@code enable} is high (-1: always). {@code output} is its Q net.
 */
public record Latch(int id, int data, int enable, int output, int phase, int stage, int module) {
}
