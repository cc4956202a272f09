package org.thermion.model;

/**
 * The function a combinational cell computes over its inputs, with the one fact static
 * timing needs about it: how an input's edge moves the output (its {@link Sense}).
 * The engines in {@code sim} evaluate each function in their own inner loops.
 */
public enum GateFn {
    AND(Sense.POSITIVE), OR(Sense.POSITIVE), NAND(Sense.NEGATIVE), NOR(Sense.NEGATIVE), XOR(Sense.BOTH),
    NOT(Sense.NEGATIVE), BUF(Sense.POSITIVE);

    /** Whether a rising input can make the output rise (positive), fall (negative) or either (both). */
    public enum Sense { POSITIVE, NEGATIVE, BOTH }

    private final Sense sense;

    GateFn(Sense sense) {
        this.sense = sense;
    }

    public Sense sense() {
        return sense;
    }

    /** True when an input edge (rising or not) can cause the given output edge. */
    public boolean causes(boolean inputRises, boolean outputRises) {
        return switch (sense) {
            case POSITIVE -> inputRises == outputRises;
            case NEGATIVE -> inputRises != outputRises;
            case BOTH -> true;
        };
    }

    /** The function a cell of this kind computes with {@code inputs} inputs: one input makes a NAND a NOT. */
    public GateFn withInputs(int inputs) {
        if (inputs != 1) {
            return this;
        }
        return switch (this) {
            case NAND, NOR -> NOT;
            case AND, OR, XOR -> BUF;
            default -> this;
        };
    }
}
