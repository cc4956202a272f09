package org.thermion.levels;

/** A stage instance in the netlist: a gate (by its levelized id) or a latch (by its id). */
public record StageUse(boolean latch, int index) {
}
