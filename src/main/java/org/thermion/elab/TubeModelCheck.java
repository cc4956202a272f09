package org.thermion.elab;

import org.thermion.model.TubeType;

/**
 * Builds a tube's declared model the way the circuits will (fitting it to its points) and says
 * why it cannot be built, so that a fit which runs away is an error at the tube's {@code fit} line
 * rather than a failure later. Elaboration knows no circuits: the caller supplies the check.
 */
@FunctionalInterface
public interface TubeModelCheck {
    /** Accepts every model (for callers that solve no circuits). */
    TubeModelCheck NONE = t -> null;

    /** Why the model of {@code tube} (which has curves) cannot be built; null when it can. */
    String problem(TubeType tube);
}
