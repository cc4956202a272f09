package org.thermion.elab;

import java.util.List;
import java.util.Map;

/**
 * One piece of a property line's values as the property table declares it. A line is read
 * left to right, one slot after another; slots that carry a value name it with an id.
 */
sealed interface Slot {

    /** A number with a unit word (or glued, {@code 47k}), in SI, within {@code range}. */
    record Quantity(String id, String what, Unit unit, Range range) implements Slot {
    }

    /** A number without unit within {@code range}. */
    record Plain(String id, String what, Range range) implements Slot {
    }

    /** A whole number from {@code min} to {@code max}. */
    record Whole(String id, String what, long min, long max) implements Slot {
    }

    /** A name (a rail, a tube type, a stage); one of {@code choices} unless that list is empty. */
    record Name(String id, String what, List<String> choices) implements Slot {
    }

    /** Names up to the end of the line or the first word that starts an option after it. */
    record Names(String id, String what) implements Slot {
    }

    /** A text in quotes. */
    record Text(String id, String what) implements Slot {
    }

    /** A fixed word, such as {@code from} in {@code load 22 k from bplus}. */
    record Word(String word) implements Slot {
    }

    /** Present when the line goes on with {@code word}; then {@code then} follows. Its id is the word. */
    record Optional(String word, List<Slot> then) implements Slot {
    }

    /**
     * One of several words, each followed by its own slots; when none is written, the
     * {@code otherwise} slots are read instead (null: one of the words is required).
     * The word chosen is the value of {@code id}.
     */
    record Choice(String id, Map<String, List<Slot>> branches, List<Slot> otherwise) implements Slot {
    }

    /** Options that may follow in any order, each at most once. */
    record AnyOrder(List<Optional> options) implements Slot {
    }

    /** An allowed interval of a number in SI units: {@code min} (included or not) to {@code max} (included). */
    record Range(double min, boolean minIncluded, double max) {
        static Range above(double min, double max) {
            return new Range(min, false, max);
        }

        static Range from(double min, double max) {
            return new Range(min, true, max);
        }

        boolean contains(double v) {
            return (minIncluded ? v >= min : v > min) && v <= max;
        }
    }
}
