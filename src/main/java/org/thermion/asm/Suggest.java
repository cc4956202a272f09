package org.thermion.asm;

import java.util.Collection;

/**
 * The nearest known word for a misspelt one: fewest single-letter edits (case ignored), and
 * among equally near words the one sharing the longest beginning, so {@code STOR} suggests
 * {@code ST} rather than {@code OR}.
 */
final class Suggest {
    private Suggest() {
    }

    static String nearest(String word, Collection<String> known, int maxEdits) {
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
