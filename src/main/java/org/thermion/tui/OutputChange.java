package org.thermion.tui;

/** A machine output that changed, with the cycle and phase after which it was seen. */
public record OutputChange(long cycle, int phase, String name, Level level) {
}
