package org.thermion.sim;

import org.junit.jupiter.api.Test;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

class BitMatrixTest {
    @Test
    void transposeMatchesTheBitByBitDefinition() {
        SplittableRandom rnd = new SplittableRandom(11);
        for (int trial = 0; trial < 20; trial++) {
            long[] a = new long[64];
            for (int r = 0; r < 64; r++) {
                a[r] = rnd.nextLong();
            }
            long[] expected = new long[64];
            for (int r = 0; r < 64; r++) {
                for (int c = 0; c < 64; c++) {
                    if ((a[r] >>> c & 1L) != 0) {
                        expected[c] |= 1L << r;
                    }
                }
            }
            long[] t = a.clone();
            BitMatrix.transpose64(t);
            assertArrayEquals(expected, t);
            BitMatrix.transpose64(t);
            assertArrayEquals(a, t, "transposing twice gives the matrix back");
        }
    }

    @Test
    void aSingleBitMovesToTheMirroredPlace() {
        long[] a = new long[64];
        a[3] = 1L << 50;
        BitMatrix.transpose64(a);
        for (int r = 0; r < 64; r++) {
            assertEquals(r == 50 ? 1L << 3 : 0L, a[r], "row " + r);
        }
    }

    @Test
    void narrowFormsAgreeWithTheFullTranspose() {
        SplittableRandom rnd = new SplittableRandom(12);
        for (int n = 1; n <= 64; n++) {
            long keep = n == 64 ? -1L : (1L << n) - 1;
            long[] rows = new long[64];
            long[] cols = new long[64];
            for (int r = 0; r < 64; r++) {
                rows[r] = r < n ? rnd.nextLong() : 0L;
                cols[r] = rnd.nextLong() & keep;
            }
            long[] full = rows.clone();
            BitMatrix.transpose64(full);
            long[] narrow = rows.clone();
            // Rows past n hold garbage on entry: they must not be read.
            for (int r = n; r < 64; r++) {
                narrow[r] = rnd.nextLong();
            }
            BitMatrix.transposeFromRows(narrow, n);
            assertArrayEquals(full, narrow, "from " + n + " rows");

            long[] fullCols = cols.clone();
            BitMatrix.transpose64(fullCols);
            long[] narrowCols = cols.clone();
            BitMatrix.transposeToRows(narrowCols, n);
            for (int r = 0; r < n; r++) {
                assertEquals(fullCols[r], narrowCols[r], "to " + n + " rows, row " + r);
            }
        }
    }
}
