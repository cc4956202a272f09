package org.thermion.model;

import java.util.ArrayList;
import java.util.List;

/**
 * A tube's base and which pin carries what, as one source gives it. A tube with several
 * basings has sources that disagree: the first is the one wired, the others are recorded so
 * that every pin they differ on can be flagged.
 *
 * @param base    {@code miniature7}, {@code noval} or {@code octal}
 * @param pinCount pins of that base
 */
public record Basing(String base, int pinCount, List<BasePin> pins, String source) {
    public Basing {
        pins = List.copyOf(pins);
    }

    /** Pins of a base word, or 0 for an unknown word. */
    public static int pinsOf(String base) {
        switch (base) {
            case "miniature7":
                return 7;
            case "noval":
                return 9;
            case "octal":
                return 8;
            default:
                return 0;
        }
    }

    /** The pins carrying {@code e} of section {@code section} (0 for heater and spare pins). */
    public List<Integer> pinsFor(Electrode e, int section) {
        List<Integer> out = new ArrayList<>();
        for (BasePin p : pins) {
            if (p.electrode() == e && p.section() == section) {
                out.add(p.pin());
            }
        }
        return out;
    }

    /** What pin {@code pin} carries, or null when the basing leaves it out. */
    public BasePin at(int pin) {
        for (BasePin p : pins) {
            if (p.pin() == pin) {
                return p;
            }
        }
        return null;
    }
}
