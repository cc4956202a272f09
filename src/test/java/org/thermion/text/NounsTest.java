package org.thermion.text;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** Counted nouns agree with their numbers, by the regular rules of English plurals (common practice). */
class NounsTest {
    /** Number, noun, what a reader expects. */
    private static final Object[][] CASES = {
            {1L, "load", "1 load"}, {0L, "load", "0 loads"}, {3L, "load", "3 loads"},
            {1L, "heater string", "1 heater string"}, {126L, "heater string", "126 heater strings"},
            // -es after s, x, z, ch, sh; -ies after a consonant and y; a vowel and y takes -s
            {2L, "switch", "2 switches"}, {2L, "latch", "2 latches"}, {2L, "mismatch", "2 mismatches"},
            {2L, "bus", "2 buses"}, {2L, "box", "2 boxes"}, {2L, "assembly", "2 assemblies"},
            {2L, "relay", "2 relays"}, {2L, "phase", "2 phases"},
    };

    @Test
    void oneTakesTheSingularEveryOtherNumberThePlural() {
        for (Object[] c : CASES) {
            assertThat(Nouns.count((Long) c[0], (String) c[1])).isEqualTo(c[2]);
        }
    }

    @Test
    void agreeGivesTheNounAlone() {
        assertThat(Nouns.agree(1, "input")).isEqualTo("input");
        assertThat(Nouns.agree(4, "input")).isEqualTo("inputs");
    }
}
