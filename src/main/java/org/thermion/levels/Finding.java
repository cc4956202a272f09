package org.thermion.levels;

/**
 * An electrical problem found at a stage use ({@code use}), a heater rule ({@code heaterRule},
 * -1 for none) or a soft start's bypass ({@code softStart}, its index in the machine; -1 for
 * none): what is wrong, with its numbers, and the change that would cure it. Findings of one
 * {@code kind} at one place in the source are reported together.
 */
public record Finding(boolean error, String kind, StageUse use, int heaterRule, int softStart, String message,
                      String fix) {
    /** A finding at a stage use or a heater rule. */
    public Finding(boolean error, String kind, StageUse use, int heaterRule, String message, String fix) {
        this(error, kind, use, heaterRule, -1, message, fix);
    }
}
