package org.thermion.power;

/**
 * One stage instance that draws plate or bias current: a gate, a latch, the thyratron
 * that holds a soft-start bypass relay, or a stage of a built block. {@code net} is the output net whose value selects
 * the low or high draw; -1 means the instance sits in a fixed state, {@code fixedHigh}.
 * {@code index} is the gate, latch, soft-start or built-block index by {@code kind}.
 */
public record DrawingInstance(Kind kind, int index, int stage, int module, int envelope, int net, boolean fixedHigh) {

    /** Where the instance comes from. */
    public enum Kind { GATE, LATCH, BYPASS, BUILT }

    /** True when the output net decides the draw. */
    public boolean followsNet() {
        return net >= 0;
    }

    /**
     * True for an instance of a built block (program counter, ROM decoding, clock generator):
     * the simulation does not model its state, so bounds take its lowest and highest draw and a
     * run counts its highest.
     */
    public boolean unsimulated() {
        return kind == Kind.BUILT;
    }
}
