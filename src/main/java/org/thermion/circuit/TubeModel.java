package org.thermion.circuit;

/**
 * The electrical law of one tube section: plate (and screen, grid) current from its electrode
 * voltages. Every implementation names where its parameters come from ({@link #source()}).
 * Currents are for a new tube; circuits scale them by an emission factor for wear.
 */
public sealed interface TubeModel permits KorenTriode, KorenPentode, ChildDiode, GasThyratron {

    /** Trade designation, e.g. "12AU7". */
    String name();

    /** Where the parameters come from: a publication, a fit (with its data), or "from memory". */
    String source();

    /** Stable softplus ln(1 + e^z), used by the Koren equations. */
    static double softplus(double z) {
        return z > 30 ? z : Math.log1p(Math.exp(z));
    }
}
