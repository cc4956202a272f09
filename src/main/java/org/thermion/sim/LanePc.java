package org.thermion.sim;

import org.thermion.model.ProgramCounter;

import java.util.Arrays;

/**
 * The off-board program counter of all 64 lanes. While every lane holds one PC it is a single
 * number ({@link #uniform()}, {@link #address()}): a load is an add or a copy, and the planes may
 * lag. When lanes part it is kept as bit planes (bit i of plane b is bit b of lane i's PC), so a
 * load is a few word operations per PC bit whatever the lanes do. Three-valued loads also track
 * the lanes whose PC is unknown.
 */
final class LanePc {
    private final int jumpNet;
    private final int[] targetNets;
    private final long[] planes;
    private final int mask;
    private long unknown;
    private boolean uniform;
    // Lane 0's PC, kept beside uniform; while every lane holds it, it alone is current and the
    // planes may lag (planesStale).
    private int address;
    private boolean planesStale;

    /** @param sl where each net lies in the value words */
    LanePc(ProgramCounter pc, int[] sl) {
        if (pc.width() < 1 || pc.width() > 30) {
            throw new IllegalArgumentException("program counter width " + pc.width() + " is outside 1..30");
        }
        jumpNet = sl[pc.jumpNet()];
        targetNets = Arrays.stream(pc.targetNets()).limit(31).map(n -> sl[n]).toArray();
        planes = new long[pc.width()];
        mask = (int) ((1L << planes.length) - 1);
        reset();
    }

    /** Every lane at address 0, known. */
    void reset() {
        Arrays.fill(planes, 0L);
        unknown = 0;
        uniform = true;
        address = 0;
        planesStale = false;
    }

    int width() {
        return planes.length;
    }

    /** True while every lane holds one known PC, {@link #address()}. */
    boolean uniform() {
        return uniform;
    }

    /** Lane 0's PC (every lane's while {@link #uniform()}). */
    int address() {
        return address;
    }

    /** Lanes whose PC is unknown. */
    long unknown() {
        return unknown;
    }

    /** The PC as bit planes, brought up to date. */
    long[] planes() {
        freshPlanes();
        return planes;
    }

    /** The PC of one lane. */
    int pc(int lane) {
        if (planesStale) {
            return address;
        }
        int a = 0;
        for (int b = 0; b < planes.length; b++) {
            a |= (int) ((planes[b] >>> lane) & 1L) << b;
        }
        return a;
    }

    /** Sets one lane's PC (taken mod 2^width); the lane's PC becomes known. */
    void set(int lane, int pc) {
        freshPlanes();
        long bit = 1L << lane;
        for (int b = 0; b < planes.length; b++) {
            if ((pc >>> b & 1) != 0) {
                planes[b] |= bit;
            } else {
                planes[b] &= ~bit;
            }
        }
        unknown &= ~bit;
        updateUniform();
    }

    // Three-valued load: an unknown jump or target leaves lanes' PCs unknown.
    void load3(long[] val, long[] unk) {
        freshPlanes();
        long j = val[jumpNet];
        long jx = unk[jumpNet];
        long carry = -1L;
        long diff = 0L;
        long tx = 0L;
        int tn = targetNets.length;
        for (int b = 0; b < planes.length; b++) {
            long p = planes[b];
            // PC + 1 by ripple carry, all lanes at once; the carry out of the top bit wraps away.
            long inc = p ^ carry;
            carry &= p;
            long t = 0L;
            if (b < tn) {
                t = val[targetNets[b]];
                tx |= unk[targetNets[b]];
            }
            diff |= t ^ inc;
            // j is 0 on lanes where the jump is unknown, so those take PC + 1 here.
            planes[b] = (j & t) | (~j & inc);
        }
        long nu = (unknown & ~j) | (j & tx);
        // An unknown jump leaves the PC known only where target and PC + 1 agree.
        nu |= jx & (tx | diff);
        unknown = nu;
        updateUniform();
    }

    // Two-valued load: no X anywhere, so unknown stays 0. Where every lane holds one PC and
    // jumps alike, a scalar step; otherwise the planes, finding on the way whether every lane
    // holds the same PC, and lane 0's PC (what updateUniform would find).
    void load2(long[] v) {
        final int[] tg = targetNets;
        long j = v[jumpNet];
        if (uniform && (j == 0L || j == -1L)) {
            if (j == 0L) {
                address = (address + 1) & mask;
                planesStale = true;
                return;
            }
            int target = 0;
            long spread = 0L;
            for (int b = 0, tn = Math.min(tg.length, planes.length); b < tn; b++) {
                long t = v[tg[b]];
                spread |= t ^ (t >> 63);
                target |= ((int) t & 1) << b;
            }
            if (spread == 0L) {
                address = target;
                planesStale = true;
                return;
            }
        }
        loadParted(v, j);
    }

    private void loadParted(long[] v, long j) {
        freshPlanes();
        final int[] tg = targetNets;
        final long[] pl = planes;
        long nj = ~j;
        long carry = -1L;
        long spread = 0L;
        int a = 0;
        int w = pl.length;
        int tn = Math.min(tg.length, w);
        int b = 0;
        for (; b < tn; b++) {
            long p = pl[b];
            long np = (j & v[tg[b]]) | (nj & (p ^ carry));
            carry &= p;
            pl[b] = np;
            spread |= np ^ (np >> 63);
            a |= ((int) np & 1) << b;
        }
        for (; b < w; b++) {
            long p = pl[b];
            long np = nj & (p ^ carry);
            carry &= p;
            pl[b] = np;
            spread |= np ^ (np >> 63);
            a |= ((int) np & 1) << b;
        }
        uniform = spread == 0L && unknown == 0L;
        address = a;
    }

    // Brings the planes up to the scalar PC that every lane holds.
    private void freshPlanes() {
        if (planesStale) {
            for (int b = 0; b < planes.length; b++) {
                planes[b] = -(long) ((address >>> b) & 1);
            }
            planesStale = false;
        }
    }

    private void updateUniform() {
        boolean u = unknown == 0;
        for (int b = 0; b < planes.length && u; b++) {
            u = planes[b] == 0L || planes[b] == -1L;
        }
        uniform = u;
        address = pc(0);
    }
}
