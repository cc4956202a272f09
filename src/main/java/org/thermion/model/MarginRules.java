package org.thermion.model;

/**
 * How a machine's noise margins are judged: each rail within ± {@code rail} and each resistor
 * within ± {@code resistor} (fractions), a worn tube's emission {@code endOfLife} of a new one's,
 * and the margin in volts below which {@code check} warns. The defaults and their sources are
 * declared with the {@code margins} block's properties.
 */
public record MarginRules(double rail, double resistor, double endOfLife, double minMargin) {
    /** ±5 % rails, ±5 % resistors, 70 % emission, 1 V minimum margin. */
    public static final MarginRules DEFAULT = new MarginRules(0.05, 0.05, 0.70, 1.0);
}
