package org.thermion.build;

/**
 * One part to fit: its designator, class, value (ohms for resistors and coils, NaN otherwise),
 * its type for the order (tube type, base, "48 V 25 mA" for a lamp), the board it sits on, what it
 * does, the most it dissipates in watts (NaN when not computed) and the stage instance it belongs
 * to ({@link StageKey}, -1 for none).
 */
public record Part(String ref, PartClass cls, double ohms, String type, int board, String role, double watts,
                   int owner) {
}
