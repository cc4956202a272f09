package org.thermion.lang;

import java.util.Collection;

/** Suggests the nearest known name for a misspelt one (edit distance). */
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

    /** A "did you mean" hint or null. */
    public static String didYouMean(String name, Collection<String> candidates) {
        String n = nearest(name, candidates);
        return n == null ? null : "did you mean '" + n + "'?";
    }

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
