package org.thermion.levels;

/**
 * An electrical problem found at a stage use ({@code use}), a heater rule ({@code heaterRule},
 * -1 for none), a soft start's bypass ({@code softStart}, its index in the machine; -1 for
 * none) or a rail's declaration ({@code rail}, its index; -1 for none): what is wrong, with its
 * numbers, and the change that would cure it. Findings of one {@code kind} at one place in the
 * source are reported together.
 */
public record Finding(boolean error, String kind, StageUse use, int heaterRule, int softStart, int rail, String message,
                      String fix) {
    /** A finding at a stage use, a heater rule or a soft start. */
    public Finding(boolean error, String kind, StageUse use, int heaterRule, int softStart, String message, String fix) {
        this(error, kind, use, heaterRule, softStart, -1, message, fix);
    }

    /** A finding at a stage use or a heater rule. */
    public Finding(boolean error, String kind, StageUse use, int heaterRule, String message, String fix) {
        this(error, kind, use, heaterRule, -1, -1, message, fix);
    }

    /** A finding at rail {@code rail}'s declaration. */
    static Finding atRail(boolean error, String kind, int rail, String message, String fix) {
        return new Finding(error, kind, null, -1, -1, rail, message, fix);
    }
}
