package org.thermion.sim.run;

/** Writes levels as text: one bit as '0', '1' or 'x', several as a hexadecimal number. */
public final class Levels {
    private static final char[] HEX = "0123456789abcdef".toCharArray();

    private Levels() {
    }

    /**
     * The value of bits given LSB first: one bit as itself, a bus as {@code 0x} and one hex digit
     * per four bits (an 'x' digit where any of its bits is unknown).
     */
    public static String text(char[] lsbFirst) {
        if (lsbFirst.length == 1) {
            return String.valueOf(lsbFirst[0]);
        }
        int digits = (lsbFirst.length + 3) / 4;
        char[] out = new char[digits + 2];
        out[0] = '0';
        out[1] = 'x';
        for (int d = 0; d < digits; d++) {
            int v = 0;
            boolean unknown = false;
            for (int b = 0; b < 4 && d * 4 + b < lsbFirst.length; b++) {
                char c = lsbFirst[d * 4 + b];
                unknown |= c == 'x';
                v |= (c == '1' ? 1 : 0) << b;
            }
            out[out.length - 1 - d] = unknown ? 'x' : HEX[v];
        }
        return new String(out);
    }

    /** A number of {@code width} bits in hexadecimal, as {@link #text} writes a bus. */
    public static String hex(long value, int width) {
        char[] bits = new char[width];
        for (int b = 0; b < width; b++) {
            bits[b] = (value >>> b & 1L) != 0 ? '1' : '0';
        }
        return width == 1 ? "0x" + bits[0] : text(bits);
    }
}
