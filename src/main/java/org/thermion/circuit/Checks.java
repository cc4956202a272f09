package org.thermion.circuit;

/** Argument checks shared by the circuit records: absurd values fail at construction. */
final class Checks {
    private Checks() {
    }

    static void positive(String what, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be finite and > 0: " + v);
        }
    }

    static void finite(String what, double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be finite: " + v);
        }
    }

    static void nonNegative(String what, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be finite and >= 0: " + v);
        }
    }
}
