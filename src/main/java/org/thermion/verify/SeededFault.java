package org.thermion.verify;

import org.thermion.model.GateFn;

/** One seeded fault in the logic. */
public sealed interface SeededFault {

    /** Gate {@code gate} computes {@code to} instead of its own function. */
    record SwapFunction(int gate, GateFn from, GateFn to) implements SeededFault {
    }

    /** Input {@code pin} of gate {@code gate} is inverted. */
    record InvertInput(int gate, int pin) implements SeededFault {
    }

    /** Input {@code pin} of gate {@code gate} is wired to {@code to} instead of {@code from}. */
    record MoveWire(int gate, int pin, int from, int to) implements SeededFault {
    }

    /** The data input of latch {@code latch} is inverted. */
    record InvertLatchData(int latch) implements SeededFault {
    }

    /** The data input of latch {@code latch} is wired to {@code to} instead of {@code from}. */
    record MoveLatchData(int latch, int from, int to) implements SeededFault {
    }
}
