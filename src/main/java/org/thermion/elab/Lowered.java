package org.thermion.elab;

import org.thermion.text.Nouns;
import java.util.List;

/** A lowered expression: a bus of logic bits, or a number whose width comes from its use. */
sealed interface Lowered {
    /** Bits, least significant first. */
    record Bits(List<Logic> bits) implements Lowered {
    }

    /** A number not yet given a width. */
    record Num(long value) implements Lowered {
    }

    /** "1 bit", "8 bits": for messages. */
    static String bitsWord(int n) {
        return Nouns.count(n, "bit");
    }
}
