package org.thermion.build;

/**
 * One part to fit: its designator, class, value (ohms for resistors and coils, NaN otherwise),
 * its type for the order (tube type, base, "48 V 25 mA" for a lamp), the board it sits on, what it
 * does, the most it dissipates in watts (NaN when not computed), the stage instance it belongs
 * to ({@link StageKey}, -1 for none) and the wattage rating the description declares for it (NaN:
 * none, the parts list rates it from its dissipation).
 */
public record Part(String ref, PartClass cls, double ohms, String type, int board, String role, double watts,
                   int owner, double declaredWatts) {

    /** A part whose rating comes from its dissipation. */
    public Part(String ref, PartClass cls, double ohms, String type, int board, String role, double watts, int owner) {
        this(ref, cls, ohms, type, board, role, watts, owner, Double.NaN);
    }
}
