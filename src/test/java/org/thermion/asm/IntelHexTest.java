package org.thermion.asm;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Intel HEX records checked from the published rule (Intel's hexadecimal object file format):
 * ":" LL AAAA TT data CC, where CC is the two's complement of the low byte of the sum of all
 * bytes before it; so the sum of all bytes of a record including CC is 0 modulo 256.
 */
class IntelHexTest {

    /** Parses one record, checks its checksum independently, and returns its bytes (LL AAAA TT data). */
    static int[] check(String rec) {
        assertThat(rec).startsWith(":").matches(":[0-9A-F]+").hasSize(1 + 2 * (5 + Integer.parseInt(rec.substring(1, 3), 16)));
        int n = (rec.length() - 1) / 2;
        int[] b = new int[n];
        int sum = 0;
        for (int i = 0; i < n; i++) {
            b[i] = Integer.parseInt(rec.substring(1 + 2 * i, 3 + 2 * i), 16);
            sum += b[i];
        }
        assertThat(sum & 0xFF).as("checksum of %s", rec).isZero();
        return b;
    }

    @Test
    void twelveBitWordsTakeTwoBytesMostSignificantFirst() {
        // Hand-computed: bytes 04 0000 00 01 23 0A BC sum to 238 = 0xEE; 0x100 - 0xEE = 0x12.
        assertThat(IntelHex.encode(new long[] {0x123, 0xABC}, 12))
                .containsExactly(":0400000001230ABC12", ":00000001FF");
    }

    @Test
    void eightBitWordsTakeOneByte() {
        // 01 0000 00 7F: sum 0x80, checksum 0x80.
        assertThat(IntelHex.encode(new long[] {0x7F}, 8)).containsExactly(":010000007F80", ":00000001FF");
    }

    @Test
    void aWholeRomImageDecodesBackToItsWords() {
        long[] rom = new long[256];
        for (int i = 0; i < rom.length; i++) {
            rom[i] = (i * 2654435761L) & 0xFFF;
        }
        List<String> recs = IntelHex.encode(rom, 12);
        assertThat(recs).hasSize(512 / 16 + 1);
        byte[] image = new byte[512];
        int expectAddr = 0;
        for (String r : recs.subList(0, recs.size() - 1)) {
            int[] b = check(r);
            assertThat(b[0]).isEqualTo(16);
            assertThat(b[3]).as("data record type").isZero();
            int addr = b[1] << 8 | b[2];
            assertThat(addr).isEqualTo(expectAddr);
            for (int i = 0; i < b[0]; i++) {
                image[addr + i] = (byte) b[4 + i];
            }
            expectAddr += 16;
        }
        int[] eof = check(recs.get(recs.size() - 1));
        assertThat(eof).containsExactly(0, 0, 0, 1, 0xFF);
        for (int i = 0; i < rom.length; i++) {
            long w = (image[2 * i] & 0xFF) << 8 | (image[2 * i + 1] & 0xFF);
            assertThat(w).as("word %d", i).isEqualTo(rom[i]);
        }
    }

    @Test
    void lastRecordMayBeShort() {
        List<String> recs = IntelHex.encode(new long[20], 8);
        assertThat(recs).hasSize(3);
        assertThat(check(recs.get(1))[0]).isEqualTo(4);
        assertThat(check(recs.get(1))[2]).isEqualTo(0x10);
    }
}
