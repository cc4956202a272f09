package org.thermion.faults;

/** What went wrong, as a builder would name it. */
public enum FaultKind {
    /** A wire stuck at 0 (a short to ground, an open grid pulled low). */
    STUCK_AT_0("stuck-at-0"),
    /** A wire stuck at 1. */
    STUCK_AT_1("stuck-at-1"),
    /** A tube that lost its emission: every section in it non-conducting. */
    DEAD_ENVELOPE("dead tube"),
    /** An open heater in a series string: every tube of the string dark. */
    OPEN_HEATER("open heater"),
    /** A relay that never pulls in. */
    RELAY_OPEN("relay never pulls in"),
    /** A burnt-out lamp: it stays dark whatever its net does. */
    LAMP_BURNT("burnt-out lamp"),
    /** A solder bridge between neighbouring socket pins joining two nets. */
    BRIDGE("solder bridge");

    public final String words;

    FaultKind(String words) {
        this.words = words;
    }

    public boolean stuckAt() {
        return this == STUCK_AT_0 || this == STUCK_AT_1;
    }
}
