package org.thermion.asm;

import java.util.ArrayList;
import java.util.List;

/**
 * Writes a ROM image as Intel HEX (I8HEX): data records (type 00) of up to 16 bytes and an
 * end-of-file record (type 01); each record's checksum is the two's complement of the sum of
 * its bytes. Words of up to 8 bits take one byte at the word's address; wider words take
 * {@code ceil(bits / 8)} bytes, most significant byte first, at byte address
 * {@code bytesPerWord * wordAddress} (a 12-bit word at address A: bytes 2A and 2A+1).
 */
public final class IntelHex {
    /** Data bytes per record. */
    public static final int RECORD_BYTES = 16;

    private IntelHex() {
    }

    public static int bytesPerWord(int wordBits) {
        return Math.max(1, (wordBits + 7) / 8);
    }

    /** The records, one string per line without line ending, for the whole image. */
    public static List<String> encode(long[] words, int wordBits) {
        int per = bytesPerWord(wordBits);
        long total = (long) words.length * per;
        if (total > 0x10000) {
            throw new IllegalArgumentException("a " + total + "-byte image does not fit I8HEX's 64 KiB address space");
        }
        byte[] data = new byte[(int) total];
        for (int a = 0; a < words.length; a++) {
            for (int k = 0; k < per; k++) {
                data[a * per + k] = (byte) (words[a] >>> (8 * (per - 1 - k)));
            }
        }
        List<String> out = new ArrayList<>();
        for (int at = 0; at < data.length; at += RECORD_BYTES) {
            int n = Math.min(RECORD_BYTES, data.length - at);
            byte[] rec = new byte[4 + n];
            rec[0] = (byte) n;
            rec[1] = (byte) (at >>> 8);
            rec[2] = (byte) at;
            rec[3] = 0x00;
            System.arraycopy(data, at, rec, 4, n);
            out.add(record(rec));
        }
        out.add(record(new byte[] {0, 0, 0, 0x01}));
        return out;
    }

    private static String record(byte[] rec) {
        StringBuilder sb = new StringBuilder(":");
        int sum = 0;
        for (byte b : rec) {
            sb.append(String.format("%02X", b & 0xFF));
            sum += b & 0xFF;
        }
        sb.append(String.format("%02X", (-sum) & 0xFF));
        return sb.toString();
    }
}
