package org.thermion.build;

/**
 * One connection point of a part: the part's designator, its pin or lead ("7" on a socket, "1"
 * or "2" on a resistor), what it is ("grid.1", "end 1") and whether it depends on a basing doubt.
 */
public record Lead(String ref, String pin, String what, boolean doubtful) {
    /** {@code XV3-7}: part and pin as a wire list prints them. */
    public String label() {
        return ref + "-" + pin;
    }
}
