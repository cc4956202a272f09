package org.thermion.model;

/** A one-bit expression over the state before an instruction. */
public sealed interface Rtl {

    /** Constant 0 or 1. */
    record Const(boolean value) implements Rtl {
    }

    /** A state bit by index. */
    record State(int index) implements Rtl {
    }

    /** A machine input by index. */
    record Input(int index) implements Rtl {
    }

    /** The bit addressed by the select field. */
    record Selected() implements Rtl {
    }

    /** Negation. */
    record Not(Rtl operand) implements Rtl {
    }

    /** AND. */
    record And(Rtl left, Rtl right) implements Rtl {
    }

    /** OR. */
    record Or(Rtl left, Rtl right) implements Rtl {
    }

    /** XOR. */
    record Xor(Rtl left, Rtl right) implements Rtl {
    }
}
