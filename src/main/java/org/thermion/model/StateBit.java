package org.thermion.model;

/**
 * An architectural state bit: its name and the latch output net that holds it.
 * {@code output} is the machine output it drives, or null for internal state.
 */
public record StateBit(String name, int net, String output) {
}
