package org.thermion.model;

/** What closes a soft-start bypass relay. */
public sealed interface BypassTrigger {

    /** A fixed delay after switch-on, in seconds. */
    record AfterDelay(double seconds) implements BypassTrigger {
    }

    /**
     * A gas thyratron that fires once its cathode reaches its emission threshold, driving the
     * relay coil through a plate resistor from a rail. {@code envelope} is the thyratron's envelope,
     * {@code stage} the relay-driver stage type named.
     */
    record ThyratronWarm(int envelope, int tube, double plateOhms, int fromRail, int stage)
            implements BypassTrigger {
    }
}
