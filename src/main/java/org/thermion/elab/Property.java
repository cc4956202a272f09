package org.thermion.elab;

import java.util.List;

/**
 * One entry of a {@link PropertyTable}: a key, the slots of its values, its default and
 * where the default or the limits come from. Built one line per property with the
 * factory {@link #of} and the withers below, so adding a property is one line.
 *
 * @param key        the word that starts the line
 * @param meaning    what it sets, for the reference and for messages about a missing value
 * @param slots      the values after the key, read left to right
 * @param dflt       the default in SI units (NaN: none, or the rule in {@code defaultRule})
 * @param defaultRule the default in words when it is worked out from other values
 * @param example    a line to suggest when the property is required and missing (null: optional)
 * @param repeatable true when the line may be given more than once
 * @param block      the table of the nested block the line opens, or null
 * @param source     where the default and the limits come from
 */
record Property(String key, String meaning, List<Slot> slots, double dflt, String defaultRule, String example,
                boolean repeatable, PropertyTable block, String source) {

    static Property of(String key, String meaning, Slot... slots) {
        return new Property(key, meaning, List.of(slots), Double.NaN, "", null, false, null, "");
    }

    Property byDefault(double value) {
        return new Property(key, meaning, slots, value, defaultRule, example, repeatable, block, source);
    }

    Property byDefault(String rule) {
        return new Property(key, meaning, slots, dflt, rule, example, repeatable, block, source);
    }

    Property required(String exampleLine) {
        return new Property(key, meaning, slots, dflt, defaultRule, exampleLine, repeatable, block, source);
    }

    /** The same property, allowed on several lines. */
    Property many() {
        return new Property(key, meaning, slots, dflt, defaultRule, example, true, block, source);
    }

    Property opens(PropertyTable nested) {
        return new Property(key, meaning, slots, dflt, defaultRule, example, repeatable, nested, source);
    }

    Property source(String text) {
        return new Property(key, meaning, slots, dflt, defaultRule, example, repeatable, block, text);
    }

    boolean isRequired() {
        return example != null;
    }
}
