package org.thermion.tui;

/** Why the machine is not running: the reason and a short phrase for the status line. */
public record Stop(Reason reason, String detail) {

    /** The kinds of stop the session knows. */
    public enum Reason { RESET, STEPPED, PAUSED, BREAKPOINT, UNKNOWN, RELOADED }

    /** The phrase the status line shows. */
    public String text() {
        return detail.isEmpty() ? reason.name().toLowerCase() : detail;
    }
}
