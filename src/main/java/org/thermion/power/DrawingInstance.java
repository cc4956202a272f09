package org.thermion.power;

/**
 * One stage instance that draws plate or bias current: a gate, a latch, or the thyratron
 * that holds a soft-start bypass relay. {@code net} is the output net whose value selects
 * the low or high draw; -1 means the instance sits in a fixed state, {@code fixedHigh}.
 * {@code index} is the gate, latch or soft-start index by {@code kind}.
 */
public record DrawingInstance(Kind kind, int index, int stage, int module, int envelope, int net, boolean fixedHigh) {

    /** Where the instance comes from. */
    public enum Kind { GATE, LATCH, BYPASS }

    /** True when the output net decides the draw. */
    public boolean followsNet() {
        return net >= 0;
    }
}
