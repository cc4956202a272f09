package org.thermion.sim;

import org.junit.jupiter.api.Test;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

class BitMatrixTest {
    @Test
    void aLaneReadsTheWordAtItsOwnIndex() {
        // Lane 5 holds index 3 (planes 0 and 1), every other lane index 0.
        long[] planes = {1L << 5, 1L << 5, 0L};
        long[] table = {0b0001, 0b0010, 0b0100, 0b1010};
        long[] out = new long[64];
        BitMatrix.lookup(planes, 3, table, 4, new long[64], out);
        assertEquals(~(1L << 5), out[0], "bit 0 of word 0 on every lane but 5");
        assertEquals(1L << 5, out[1]);
        assertEquals(0L, out[2]);
        assertEquals(1L << 5, out[3]);
    }

    @Test
    void lookupReadsEachLanesWordAsTheDefinitionSays() {
        SplittableRandom rnd = new SplittableRandom(12);
        long[] scratch = new long[64];
        for (int indexBits = 1; indexBits <= 20; indexBits++) {
            for (int dataBits = 1; dataBits <= 64; dataBits += dataBits < 17 ? 1 : 7) {
                long keep = dataBits == 64 ? -1L : (1L << dataBits) - 1;
                // Tables shorter and longer than the index range: indices past the end read 0.
                int words = 1 + rnd.nextInt(Math.min(1 << indexBits, 4096) + 40);
                long[] table = new long[words];
                for (int i = 0; i < words; i++) {
                    table[i] = rnd.nextLong() & keep;
                }
                long[] planes = new long[indexBits];
                for (int b = 0; b < indexBits; b++) {
                    planes[b] = rnd.nextLong();
                }
                long[] expected = new long[dataBits];
                for (int lane = 0; lane < 64; lane++) {
                    int index = 0;
                    for (int b = 0; b < indexBits; b++) {
                        index |= (int) (planes[b] >>> lane & 1L) << b;
                    }
                    long word = index < words ? table[index] : 0L;
                    for (int b = 0; b < dataBits; b++) {
                        expected[b] |= (word >>> b & 1L) << lane;
                    }
                }
                long[] out = new long[64];
                long[] before = planes.clone();
                BitMatrix.lookup(planes, indexBits, table, dataBits, scratch, out);
                for (int b = 0; b < dataBits; b++) {
                    assertEquals(expected[b], out[b], indexBits + "-bit index, " + dataBits + "-bit words, plane " + b);
                }
                assertArrayEquals(before, planes, "the index planes are left alone");
            }
        }
    }
}
