package org.thermion.asm;

import java.util.ArrayList;
import java.util.List;

/**
 * The listing as text: one row per source line with the address and word in hex, the word
 * in binary (grouped by four bits from the right) and the source line as written.
 */
public final class Listing {
    private Listing() {
    }

    /** Rows of the listing for a machine with {@code wordBits}-bit words and {@code addressBits}-bit addresses. */
    public static List<String> render(Assembly a, int wordBits, int addressBits) {
        int hexDigits = Math.max(1, (wordBits + 3) / 4);
        int addrDigits = Math.max(1, (addressBits + 3) / 4);
        int binWidth = wordBits + (wordBits - 1) / 4;
        int lineWidth = Math.max(4, String.valueOf(a.listing().size()).length());
        String fmt = "%-" + (addrDigits + 2) + "s  %-" + (hexDigits + 2) + "s  %-" + binWidth + "s  %" + lineWidth + "s  %s";
        List<String> out = new ArrayList<>();
        out.add(String.format(fmt, "addr", "word", "bits", "line", "source").stripTrailing());
        for (ListingLine l : a.listing()) {
            String addr = l.hasWord() ? "0x" + hex(l.address(), addrDigits) : "";
            String word = l.hasWord() ? "0x" + hex(l.word(), hexDigits) : "";
            String bits = l.hasWord() ? binary(l.word(), wordBits) : "";
            out.add(String.format(fmt, addr, word, bits, l.sourceLine(), l.sourceText().replace('\t', ' ')).stripTrailing());
        }
        return out;
    }

    static String hex(long v, int digits) {
        String h = Long.toHexString(v).toUpperCase();
        return "0".repeat(Math.max(0, digits - h.length())) + h;
    }

    /** {@code bits} binary digits, a space between groups of four counted from bit 0. */
    static String binary(long v, int bits) {
        StringBuilder sb = new StringBuilder();
        for (int b = bits - 1; b >= 0; b--) {
            sb.append((v >>> b & 1) == 1 ? '1' : '0');
            if (b > 0 && b % 4 == 0) {
                sb.append(' ');
            }
        }
        return sb.toString();
    }
}
