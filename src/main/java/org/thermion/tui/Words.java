package org.thermion.tui;

import java.util.List;

/** Plain words for the screen: short lists of names (counted nouns: {@link org.thermion.text.Nouns}). */
final class Words {
    /** Names listed before "and N more". */
    private static final int NAMES = 4;

    private Words() {
    }

    /** Up to four names, then how many more. */
    static String list(List<String> names) {
        List<String> shown = names.subList(0, Math.min(NAMES, names.size()));
        String s = String.join(", ", shown);
        return names.size() > NAMES ? s + " and " + (names.size() - NAMES) + " more" : s;
    }
}
