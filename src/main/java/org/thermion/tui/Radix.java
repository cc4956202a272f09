package org.thermion.tui;

import java.util.List;

/** How a bus's number is written on screen; hexadecimal unless the description declares another. */
public enum Radix {
    HEX("0x", 4), DECIMAL("", 0), OCTAL("0o", 3), BINARY("0b", 1);

    private final String prefix;
    /** Bits per digit (0: not a power of two). */
    private final int bitsPerDigit;

    Radix(String prefix, int bitsPerDigit) {
        this.prefix = prefix;
        this.bitsPerDigit = bitsPerDigit;
    }

    /** The word the description uses for it. */
    String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }

    /** The radix of a base the machine declares (16, 10, 8 or 2). */
    static Radix of(int base) {
        return base == 10 ? DECIMAL : base == 8 ? OCTAL : base == 2 ? BINARY : HEX;
    }

    /**
     * The number the levels (least significant first) make, as wide as the bus. A digit with an
     * unknown bit is {@code x}; in decimal any unknown bit makes the whole number {@code x}.
     */
    String write(List<Level> bits) {
        int n = bits.size();
        if (bitsPerDigit == 0) {
            long v = 0;
            for (int i = 0; i < n; i++) {
                if (bits.get(i) == Level.UNKNOWN) {
                    return "x";
                }
                v |= bits.get(i) == Level.ON ? 1L << i : 0;
            }
            return Long.toUnsignedString(v);
        }
        int digits = Math.max(1, (n + bitsPerDigit - 1) / bitsPerDigit);
        StringBuilder b = new StringBuilder(prefix);
        for (int d = digits - 1; d >= 0; d--) {
            int value = 0;
            boolean unknown = false;
            for (int k = bitsPerDigit - 1; k >= 0; k--) {
                int i = d * bitsPerDigit + k;
                if (i < n) {
                    unknown |= bits.get(i) == Level.UNKNOWN;
                    value = value << 1 | (bits.get(i) == Level.ON ? 1 : 0);
                } else {
                    value <<= 1;
                }
            }
            b.append(unknown ? 'x' : Character.toUpperCase(Character.forDigit(value, 1 << bitsPerDigit)));
        }
        return b.toString();
    }
}
