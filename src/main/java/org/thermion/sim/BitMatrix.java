package org.thermion.sim;

/**
 * Reads a table once per lane with lanes held as bit planes (bit i of a word belongs to lane
 * i): the simulator's ROM read when the lanes' program counters differ. A 64 x 64 bit matrix
 * held as 64 {@code long} rows is transposed by block swaps: the 32 x 32 off-diagonal blocks
 * trade places, then within each quarter the 16 x 16 blocks, and so on down to single bits.
 * Each step swaps bit j of the row index with bit j of the column index; the steps commute,
 * and a transpose stopped after the steps below some width leaves the matrix in packed fields
 * of that width, which is all a narrow index or a narrow word needs.
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

    /**
     * Looks up one table word per lane, all in bit planes: bit i of {@code planes[b]} is bit b of
     * lane i's index ({@code indexBits} planes); on return bit i of {@code out[b]} is bit b of
     * lane i's word ({@code dataBits} planes, at most 64; words must fit in them). Indices past
     * the table read 0. {@code scratch} takes 64 words.
     *
     * <p>Only the swap steps below the index width are run on the way in, which leaves the
     * indices packed side by side (field k of row r is lane r + gk's index), and only those below
     * the data width on the way out, each lane's word dropped into its field of a packed row.
     */
    static void lookup(long[] planes, int indexBits, long[] table, int dataBits, long[] scratch, long[] out) {
        if (indexBits <= 8 && dataBits <= 16) {
            lookupByte(planes, indexBits, table, dataBits, scratch, out);
            return;
        }
        int g = span(indexBits);
        System.arraycopy(planes, 0, scratch, 0, indexBits);
        java.util.Arrays.fill(scratch, indexBits, g, 0L);
        swaps(scratch, g);
        long fieldMask = g == 64 ? -1L : (1L << g) - 1;
        int f = span(dataBits);
        int n = table.length;
        for (int r = 0; r < f; r++) {
            long row = 0L;
            for (int lane = r; lane < 64; lane += f) {
                long a = (scratch[lane & (g - 1)] >>> (lane & -g)) & fieldMask;
                row |= (a < n ? table[(int) a] : 0L) << (lane & -f);
            }
            out[r] = row;
        }
        swaps(out, f);
    }

    // The common shape (PC of at most 8 bits, words of at most 16) with every step written out,
    // which the JIT turns into straight code about twice as fast as the general loops.
    private static void lookupByte(long[] planes, int indexBits, long[] table, int dataBits, long[] in, long[] out) {
        System.arraycopy(planes, 0, in, 0, indexBits);
        java.util.Arrays.fill(in, indexBits, 8, 0L);
        swaps8(in);
        // Byte k of in[r] is now lane r + 8k's index.
        int n = table.length;
        if (dataBits <= 8) {
            for (int r = 0; r < 8; r++) {
                long x = in[r];
                out[r] = word(table, n, x) | word(table, n, x >>> 8) << 8 | word(table, n, x >>> 16) << 16
                        | word(table, n, x >>> 24) << 24 | word(table, n, x >>> 32) << 32
                        | word(table, n, x >>> 40) << 40 | word(table, n, x >>> 48) << 48 | word(table, n, x >>> 56) << 56;
            }
            swaps8(out);
            return;
        }
        for (int r = 0; r < 8; r++) {
            long x = in[r];
            // Row r takes lanes r, r + 16, r + 32, r + 48; row r + 8 the lanes 8 further on.
            out[r] = word(table, n, x) | word(table, n, x >>> 16) << 16 | word(table, n, x >>> 32) << 32
                    | word(table, n, x >>> 48) << 48;
            out[r + 8] = word(table, n, x >>> 8) | word(table, n, x >>> 24) << 16 | word(table, n, x >>> 40) << 32
                    | word(table, n, x >>> 56) << 48;
        }
        swaps16(out);
    }

    private static long word(long[] table, int n, long index) {
        int a = (int) index & 0xFF;
        return a < n ? table[a] : 0L;
    }

    // swaps(a, 8) and swaps(a, 16) written out.
    private static void swaps8(long[] a) {
        for (int r = 0; r < 4; r++) {
            swap(a, r, 4, MASKS[3]);
        }
        swap(a, 0, 2, MASKS[4]);
        swap(a, 1, 2, MASKS[4]);
        swap(a, 4, 2, MASKS[4]);
        swap(a, 5, 2, MASKS[4]);
        for (int r = 0; r < 8; r += 2) {
            swap(a, r, 1, MASKS[5]);
        }
    }

    private static void swaps16(long[] a) {
        for (int r = 0; r < 8; r++) {
            swap(a, r, 8, MASKS[2]);
        }
        for (int r = 0; r < 16; r += 8) {
            swap(a, r, 4, MASKS[3]);
            swap(a, r + 1, 4, MASKS[3]);
            swap(a, r + 2, 4, MASKS[3]);
            swap(a, r + 3, 4, MASKS[3]);
        }
        for (int r = 0; r < 16; r += 4) {
            swap(a, r, 2, MASKS[4]);
            swap(a, r + 1, 2, MASKS[4]);
        }
        for (int r = 0; r < 16; r += 2) {
            swap(a, r, 1, MASKS[5]);
        }
    }

    // Row r's high block (columns c + j) trades with row r + j's low block (columns c).
    private static void swap(long[] a, int r, int j, long m) {
        long t = ((a[r] >>> j) ^ a[r + j]) & m;
        a[r] ^= t << j;
        a[r + j] ^= t;
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
                swap(a, r, j, m);
            }
        }
    }
}
