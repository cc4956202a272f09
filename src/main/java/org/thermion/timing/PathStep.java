package org.thermion.timing;

/**
 * One step of a timing path: what drives {@code net} ({@code kind} is "latch", "gate",
 * "free", "input" or "rom"; {@code index} its latch, gate or port index), the stage name
 * (empty for inputs and ROM data), the edge of the net ('r' rising, 'f' falling), the
 * step's own delay and the arrival time at the net, counted from the launching clock edge.
 */
public record PathStep(String kind, int index, String stage, char edge, double delay, double arrival,
                       int net, String netName, String module) {
}
