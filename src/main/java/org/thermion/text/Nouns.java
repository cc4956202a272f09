package org.thermion.text;

/**
 * Counted nouns that agree with their numbers, for every line a builder reads ("1 load",
 * "3 loads", "2 switches", "2 assemblies"). The one place a plural is made: reports, messages
 * and the screen all call it, so no line says "1 loads" or "load(s)".
 */
public final class Nouns {
    private Nouns() {
    }

    /** {@code n} and the noun in the number it calls for: "1 switch", "0 switches". */
    public static String count(long n, String noun) {
        return n + " " + (n == 1 ? noun : plural(noun));
    }

    /** The noun alone in the number {@code n} calls for: "input" for 1, else "inputs". */
    public static String agree(long n, String noun) {
        return n == 1 ? noun : plural(noun);
    }

    /**
     * The regular English plural: -es after s, x, z, ch and sh ("bus", "switch"), -ies after a
     * consonant and y ("assembly"), else -s. Irregular words are not asked for.
     */
    public static String plural(String noun) {
        int n = noun.length();
        if (n == 0) {
            return noun;
        }
        if (noun.endsWith("s") || noun.endsWith("x") || noun.endsWith("z") || noun.endsWith("ch") || noun.endsWith("sh")) {
            return noun + "es";
        }
        if (n > 1 && noun.charAt(n - 1) == 'y' && "aeiou".indexOf(noun.charAt(n - 2)) < 0) {
            return noun.substring(0, n - 1) + "ies";
        }
        return noun + "s";
    }
}
