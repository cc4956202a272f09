package org.thermion.circuit;

/** The outcome of solving a stage: an operating point, or the reason there is none. */
public sealed interface DcResult permits OperatingPoint, NoDcSolution {

    /** The operating point; throws with the reason when there is none (for callers that checked). */
    default OperatingPoint point() {
        if (this instanceof OperatingPoint p) {
            return p;
        }
        throw new IllegalStateException(((NoDcSolution) this).reason());
    }

    default boolean solved() {
        return this instanceof OperatingPoint;
    }
}
