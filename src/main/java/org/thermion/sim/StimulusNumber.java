package org.thermion.sim;

/** A stimulus value as people write it: decimal, {@code 0x...} or {@code 0b...}, with {@code _} between digits. */
final class StimulusNumber {
    private StimulusNumber() {
    }

    /** The value of {@code text}, or -1 when it is no number or does not fit 62 bits. */
    static long parse(String text) {
        String t = text.toLowerCase(java.util.Locale.ROOT);
        int radix = 10;
        if (t.startsWith("0x")) {
            radix = 16;
            t = t.substring(2);
        } else if (t.startsWith("0b")) {
            radix = 2;
            t = t.substring(2);
        }
        if (t.isEmpty() || t.startsWith("_") || t.endsWith("_")) {
            return -1;
        }
        long v = 0;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c == '_') {
                continue;
            }
            int d = Character.digit(c, radix);
            if (d < 0) {
                return -1;
            }
            v = v * radix + d;
            if (v >= (1L << 62)) {
                return -1;
            }
        }
        return v;
    }
}
