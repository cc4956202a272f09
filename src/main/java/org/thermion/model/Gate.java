package org.thermion.model;

/**
 * A combinational cell. {@code stage} is the stage type that realizes it, or -1 for a
 * free connection (a flip-flop's complementary output), which draws and delays nothing.
 */
public record Gate(int id, GateFn fn, int[] inputs, int output, int stage, int module) {
}
