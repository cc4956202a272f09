package org.thermion.model;

/** What a tube's base pin carries (the words a {@code basing} line uses). */
public enum Electrode {
    PLATE("plate"), GRID("grid"), SCREEN("screen"), SUPPRESSOR("suppressor"), SHIELD("shield"), CATHODE("cathode"),
    HEATER("heater"), TAP("tap"), INTERNAL("ic"), NONE("nc"),
    /** The source does not say (allowed in a second basing only). */
    UNKNOWN("?");

    private final String word;

    Electrode(String word) {
        this.word = word;
    }

    /** The word in a basing line and in reports. */
    public String word() {
        return word;
    }

    /** True for a pin that belongs to one section (plate, grids, cathode), false for the tube's shield, heater and spare pins. */
    public boolean perSection() {
        return this != SHIELD && this != HEATER && this != TAP && this != INTERNAL && this != NONE && this != UNKNOWN;
    }

    /** The electrode a word names, or null. */
    public static Electrode of(String word) {
        for (Electrode e : values()) {
            if (e.word.equals(word)) {
                return e;
            }
        }
        return null;
    }
}
