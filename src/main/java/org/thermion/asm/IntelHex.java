package org.thermion.asm;

import java.util.ArrayList;
import java.util.List;

/**
 * Writes a ROM image as Intel HEX: data records (type 00) of up to 16 bytes and an
 * end-of-file record (type 01); each record's checksum is the two's complement of the sum of
 * its bytes. An image of up to 64 KiB is plain I8HEX. A larger one is I32HEX: an extended
 * linear address record (type 04, two data bytes holding the upper 16 bits of the 32-bit
 * address) opens each 64 KiB segment from the second one on, so images up to
 * {@link #MAX_BYTES} (4 GiB) can be written. Words of up to 8 bits take one byte at the
 * word's address; wider words take {@code ceil(bits / 8)} bytes, most significant byte first,
 * at byte address {@code bytesPerWord * wordAddress} (a 12-bit word at address A: bytes 2A and 2A+1).
 */
public final class IntelHex {
    /** Data bytes per record; divides 64 KiB, so no record straddles a segment. */
    public static final int RECORD_BYTES = 16;
    /** The largest image: 32-bit addresses. */
    public static final long MAX_BYTES = 1L << 32;

    private IntelHex() {
    }

    public static int bytesPerWord(int wordBits) {
        return Math.max(1, (wordBits + 7) / 8);
    }

    /** The records, one string per line without line ending, for the whole image. */
    public static List<String> encode(long[] words, int wordBits) {
        int per = bytesPerWord(wordBits);
        long total = (long) words.length * per;
        if (total > MAX_BYTES) {
            throw new IllegalArgumentException("a " + total + "-byte image does not fit Intel HEX's 4 GiB (32-bit) address space");
        }
        List<String> out = new ArrayList<>();
        byte[] rec = new byte[4 + RECORD_BYTES];
        long segment = 0;
        for (long at = 0; at < total; at += RECORD_BYTES) {
            if (at >>> 16 != segment) {
                segment = at >>> 16;
                out.add(record(new byte[] {2, 0, 0, 0x04, (byte) (segment >>> 8), (byte) segment}, 6));
            }
            int n = (int) Math.min(RECORD_BYTES, total - at);
            rec[0] = (byte) n;
            rec[1] = (byte) (at >>> 8);
            rec[2] = (byte) at;
            rec[3] = 0x00;
            for (int k = 0; k < n; k++) {
                long b = at + k;
                int word = (int) (b / per);
                int index = (int) (b % per);
                rec[4 + k] = (byte) (words[word] >>> (8 * (per - 1 - index)));
            }
            out.add(record(rec, 4 + n));
        }
        out.add(record(new byte[] {0, 0, 0, 0x01}, 4));
        return out;
    }

    private static String record(byte[] rec, int length) {
        StringBuilder sb = new StringBuilder(1 + 2 * (length + 1)).append(':');
        int sum = 0;
        for (int i = 0; i < length; i++) {
            int b = rec[i] & 0xFF;
            sb.append(Character.toUpperCase(Character.forDigit(b >>> 4, 16))).append(Character.toUpperCase(Character.forDigit(b & 15, 16)));
            sum += b;
        }
        int c = (-sum) & 0xFF;
        sb.append(Character.toUpperCase(Character.forDigit(c >>> 4, 16))).append(Character.toUpperCase(Character.forDigit(c & 15, 16)));
        return sb.toString();
    }
}
