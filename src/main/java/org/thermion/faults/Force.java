package org.thermion.faults;

/** One wire held at one value by a fault. */
public record Force(int slot, boolean value) {
}
