package org.thermion.sim;

/**
 * Transposes a 64 x 64 bit matrix held as 64 {@code long} rows (bit c of row r is element
 * (r, c)), in place, by recursive block swaps: first the off-diagonal 32 x 32 blocks trade
 * places, then within each quarter the 16 x 16 blocks, and so on down to single bits, six
 * steps of 32 word swaps each. The simulator turns lane-major words (one per lane) into
 * bit planes (one per bit, bit i = lane i) and back this way without a per-bit loop.
 */
final class BitMatrix {
    // MASKS[s] has the bits whose column index has bit (5 - s) clear: the low half of each block.
    private static final long[] MASKS = {
        0x00000000FFFFFFFFL,
        0x0000FFFF0000FFFFL,
        0x00FF00FF00FF00FFL,
        0x0F0F0F0F0F0F0F0FL,
        0x3333333333333333L,
        0x5555555555555555L,
    };

    private BitMatrix() {
    }

    /** Transposes the 64 rows {@code a[0..63]} in place: afterwards bit r of {@code a[c]} is the former bit c of {@code a[r]}. */
    static void transpose64(long[] a) {
        for (int s = 0, j = 32; s < 6; s++, j >>>= 1) {
            long m = MASKS[s];
            for (int r = 0; r < 64; r = (r + j + 1) & ~j) {
                // Row r's high block (columns c + j) trades with row r + j's low block (columns c).
                long t = ((a[r] >>> j) ^ a[r + j]) & m;
                a[r] ^= t << j;
                a[r + j] ^= t;
            }
        }
    }
    /*
     * Each step swaps bit j of the row index with bit j of the column index; these swaps
     * commute, so they may run in any order. The narrow forms below exploit that: where a
     * step pairs a data row with an all-zero one it becomes a plain split or merge, and the
     * full swaps are confined to the few rows that carry data.
     */

    /**
     * Transposes a matrix whose rows {@code rows..63} are zero: on entry only {@code a[0..rows-1]}
     * are read, on return all 64 rows hold the transpose (only its low {@code rows} columns can be set).
     */
    static void transposeFromRows(long[] a, int rows) {
        int k = span(rows);
        java.util.Arrays.fill(a, rows, k, 0L);
        swaps(a, k);
        for (int j = k, s = 5 - Integer.numberOfTrailingZeros(k); j < 64; j <<= 1, s--) {
            long m = MASKS[s];
            for (int r = 0; r < j; r++) {
                a[r + j] = (a[r] >>> j) & m;
                a[r] &= m;
            }
        }
    }

    /**
     * Transposes a matrix in which only the low {@code cols} columns can be set: on return
     * {@code a[0..cols-1]} hold the transpose's rows (the rest of {@code a} is left as scratch).
     */
    static void transposeToRows(long[] a, int cols) {
        int k = span(cols);
        for (int j = 32; j >= k; j >>>= 1) {
            for (int r = 0; r < j; r++) {
                a[r] |= a[r + j] << j;
            }
        }
        swaps(a, k);
    }

    // Smallest power of two at least n (1..64).
    private static int span(int n) {
        return n <= 1 ? 1 : Integer.highestOneBit(n - 1) << 1;
    }

    // The full swap steps for j < k on rows 0..k-1.
    private static void swaps(long[] a, int k) {
        for (int j = k >>> 1; j >= 1; j >>>= 1) {
            long m = MASKS[5 - Integer.numberOfTrailingZeros(j)];
            for (int r = 0; r < k; r = (r + j + 1) & ~j) {
                long t = ((a[r] >>> j) ^ a[r + j]) & m;
                a[r] ^= t << j;
                a[r + j] ^= t;
            }
        }
    }
}
