package org.thermion.levels;

/**
 * An electrical problem found at a stage use ({@code use}) or a heater rule ({@code heaterRule},
 * -1 for none): what is wrong, with its numbers, and the change that would cure it. Findings of
 * one {@code kind} at one place in the source are reported together.
 */
public record Finding(boolean error, String kind, StageUse use, int heaterRule, String message, String fix) {
}
