package org.thermion.lang;

import java.util.Collection;

/** Suggests the nearest known name for a misspelt one (edit distance, case ignored). */
public final class Names {
    private Names() {
    }

    /** The closest candidate within a distance that makes sense for the name's length, or null. */
    public static String nearest(String name, Collection<String> candidates) {
        String best = null;
        int bestD = Integer.MAX_VALUE;
        int allowed = Math.max(1, Math.min(3, name.length() / 3 + 1));
        for (String c : candidates) {
            int d = distance(name.toLowerCase(), c.toLowerCase());
            if (d < bestD || (d == bestD && best != null && c.compareTo(best) < 0)) {
                bestD = d;
                best = c;
            }
        }
        return bestD <= allowed ? best : null;
    }

    /**
     * The nearest of a short list of short words (mnemonics, directives), or null: at most
     * {@code maxEdits} edits and at most half the word's length; among equally near words
     * the one sharing the longest beginning, then the first alphabetically, so {@code STOR}
     * suggests {@code ST} rather than {@code OR}.
     */
    public static String nearestWord(String word, Collection<String> known, int maxEdits) {
        String w = word.toLowerCase();
        String best = null;
        int bestD = Integer.MAX_VALUE;
        int bestP = -1;
        for (String k : known) {
            String c = k.toLowerCase();
            int d = distance(w, c);
            int p = commonPrefix(w, c);
            if (d < bestD || (d == bestD && (p > bestP || (p == bestP && k.compareTo(best) < 0)))) {
                best = k;
                bestD = d;
                bestP = p;
            }
        }
        return bestD <= Math.min(maxEdits, Math.max(1, w.length() / 2)) ? best : null;
    }

    /** A "did you mean" hint or null. */
    public static String didYouMean(String name, Collection<String> candidates) {
        String n = nearest(name, candidates);
        return n == null ? null : "did you mean '" + n + "'?";
    }

    private static int commonPrefix(String a, String b) {
        int n = 0;
        while (n < a.length() && n < b.length() && a.charAt(n) == b.charAt(n)) {
            n++;
        }
        return n;
    }

    /** Levenshtein distance. */
    static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
