package org.thermion.tui;

import java.util.List;

/** Plain words for the screen: counted nouns that agree with their numbers, short lists of names. */
final class Words {
    /** Names listed before "and N more". */
    private static final int NAMES = 4;

    private Words() {
    }

    /** A counted noun that agrees with its number ("1 switch", "2 switches", "3 steps"). */
    static String count(long n, String noun) {
        return n + " " + (n == 1 ? noun : plural(noun));
    }

    /** The plural of a noun with a plain -s or -es plural. */
    static String plural(String noun) {
        return noun.endsWith("h") || noun.endsWith("s") ? noun + "es" : noun + "s";
    }

    /** Up to four names, then how many more. */
    static String list(List<String> names) {
        List<String> shown = names.subList(0, Math.min(NAMES, names.size()));
        String s = String.join(", ", shown);
        return names.size() > NAMES ? s + " and " + (names.size() - NAMES) + " more" : s;
    }
}
