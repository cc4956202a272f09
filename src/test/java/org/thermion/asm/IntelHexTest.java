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

    @Test
    void anImageOver64KiBOpensEachFurtherSegmentWithAnExtendedLinearAddressRecord() {
        // 40,000 twelve-bit words are 80,000 bytes: segment 0 holds bytes 0..65535 and
        // segment 1 bytes 65536..79999 (14,464 bytes = 904 records of 16).
        long[] rom = new long[40_000];
        rom[32_767] = 0xABC;  // bytes 65534, 65535: the last two of segment 0
        rom[32_768] = 0x123;  // bytes 65536, 65537: the first two of segment 1
        List<String> recs = IntelHex.encode(rom, 12);
        assertThat(recs).hasSize(4096 + 1 + 904 + 1);
        // Hand-computed: 10 FFF0 00, then fourteen 00 and 0A BC; the sum 0x10+0xFF+0xF0+0x0A+0xBC = 0x2C5, checksum 0x100 - 0xC5 = 0x3B.
        assertThat(recs.get(4095)).isEqualTo(":10FFF00000000000000000000000000000000ABC3B");
        // Type 04 with upper address 0x0001: 02+00+00+04+00+01 = 0x07, checksum 0xF9.
        assertThat(recs.get(4096)).isEqualTo(":020000040001F9");
        // Back at offset 0000 within segment 1: 0x10+0x01+0x23 = 0x34, checksum 0x100 - 0x34 = 0xCC.
        assertThat(recs.get(4097)).isEqualTo(":1000000001230000000000000000000000000000CC");
        for (String r : recs) {
            check(r);
        }
        assertThat(recs.get(recs.size() - 1)).isEqualTo(":00000001FF");
    }

    @Test
    void anImageOfExactly64KiBNeedsNoExtendedRecord() {
        List<String> recs = IntelHex.encode(new long[65_536], 8);
        assertThat(recs).hasSize(4096 + 1).noneMatch(r -> r.startsWith(":02000004"));
    }
}
