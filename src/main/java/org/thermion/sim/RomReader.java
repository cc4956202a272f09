package org.thermion.sim;

/**
 * The off-board ROM driving its data nets from ROM[PC] on every lane. While every lane holds one
 * PC the read is one array copy from a table of every word as the values its data nets take (0 or
 * -1 a bit), where the data nets are consecutive and the table is small; else one word spread
 * over the nets. When lanes' PCs differ, a read per lane through partial bit transposes
 * ({@link BitMatrix#lookup}). A forced word (verify's instruction per lane) replaces ROM[PC].
 */
final class RomReader {
    private static final int PLANE_TABLE_MAX = 1 << 16;

    private final int[] dataNets;
    private final int dataBase;
    private final int words;
    private long[] romWords;
    private long[] romPlanes;
    // True when the last read may have left X on the data nets.
    private boolean unknownShown;
    private long[] forced;
    // Scratch for the per-lane read: 64 rows of a bit matrix.
    private final long[] laneMatrix = new long[Simulator.LANES];
    private final long[] laneScratch = new long[Simulator.LANES];

    /** @param dataNets the data nets where they lie in the value words, LSB first */
    RomReader(int[] dataNets, int words) {
        this.dataNets = dataNets.clone();
        this.words = Math.max(0, words);
        this.dataBase = consecutive(dataNets) ? dataNets[0] : -1;
        this.romWords = new long[this.words];
        this.romPlanes = planes(romWords);
    }

    /** Loads the same image into every lane; words past the end read 0. */
    void load(long[] image) {
        long[] w = new long[words];
        long mask = dataNets.length >= 64 ? -1L : (1L << dataNets.length) - 1;
        for (int i = 0; i < w.length && i < image.length; i++) {
            w[i] = image[i] & mask;
        }
        romWords = w;
        romPlanes = planes(w);
    }

    /** Drives the data nets with {@code bitLanes[b]} for data bit b instead of ROM[PC]; null returns to ROM[PC]. */
    void force(long[] bitLanes) {
        forced = bitLanes == null ? null : bitLanes.clone();
    }

    private long[] planes(long[] image) {
        int width = dataNets.length;
        if (dataBase < 0 || (long) image.length * width > PLANE_TABLE_MAX) {
            return null;
        }
        long[] p = new long[image.length * width];
        for (int a = 0; a < image.length; a++) {
            for (int b = 0; b < width; b++) {
                p[a * width + b] = -((image[a] >>> b) & 1L);
            }
        }
        return p;
    }

    private static boolean consecutive(int[] nets) {
        for (int i = 1; i < nets.length; i++) {
            if (nets[i] != nets[0] + i) {
                return false;
            }
        }
        return nets.length > 0;
    }

    private long word(int address) {
        return address >= 0 && address < romWords.length ? romWords[address] : 0L;
    }

    /**
     * Drives the data nets in {@code val} (and their unknown marks in {@code unk}) for the PC
     * ({@code pc} null: address 0). Kept small, so the JIT inlines it; the rarer reads are
     * methods of their own.
     */
    void read(long[] val, long[] unk, LanePc pc) {
        int w = dataNets.length;
        boolean uniform = pc == null || pc.uniform();
        int address = pc == null ? 0 : pc.address();
        if (forced != null) {
            readForced(val, unk, w);
        } else if (!uniform) {
            readPerLane(val, unk, w, pc);
        } else if (romPlanes != null && !unknownShown && address < romWords.length) {
            // Every lane reads one word, and no X is left on the data nets from an unknown PC.
            System.arraycopy(romPlanes, address * w, val, dataBase, w);
        } else {
            readShared(val, unk, w, address);
        }
    }

    private void readForced(long[] val, long[] unk, int w) {
        for (int b = 0; b < w; b++) {
            val[dataNets[b]] = b < forced.length ? forced[b] : 0L;
            unk[dataNets[b]] = 0L;
        }
    }

    // Every lane reads one word; the X words are already 0 unless the last read had an unknown PC.
    private void readShared(long[] val, long[] unk, int w, int address) {
        long word = word(address);
        final int[] d = dataNets;
        for (int b = 0; b < w; b++) {
            val[d[b]] = -((word >>> b) & 1L);
        }
        if (unknownShown) {
            for (int b = 0; b < w; b++) {
                unk[d[b]] = 0L;
            }
            unknownShown = false;
        }
    }

    // A read per lane, from PC planes to data planes through partial bit transposes.
    private void readPerLane(long[] val, long[] unk, int w, LanePc pc) {
        long[] m = laneMatrix;
        long[] planes = pc.planes();
        BitMatrix.lookup(planes, planes.length, romWords, Math.min(w, Simulator.LANES), laneScratch, m);
        long pcUnknown = pc.unknown();
        long known = ~pcUnknown;
        for (int b = 0; b < w; b++) {
            unk[dataNets[b]] = pcUnknown;
            val[dataNets[b]] = b < Simulator.LANES ? m[b] & known : 0L;
        }
        unknownShown |= pcUnknown != 0L;
    }
}
