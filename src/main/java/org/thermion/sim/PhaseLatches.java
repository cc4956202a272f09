package org.thermion.sim;

import org.thermion.model.Latch;
import org.thermion.model.Netlist;

import java.util.ArrayList;
import java.util.List;

/**
 * The latches grouped by the phase that loads them, and their loads: every latch of a phase
 * takes its data where its enable is 1, all sampling the settled values at once. Where no latch
 * of a phase reads another latch's output directly, two-valued loads commit one by one (or run
 * code supplied from outside); otherwise they are staged first. Three-valued loads keep a value
 * under an unknown enable only where data and the stored bit agree and are known.
 */
final class PhaseLatches {
    // Index 0 = phase 1.
    private final int[][] phaseLatchData;
    private final int[][] phaseLatchEnable;
    private final int[][] phaseLatchOut;
    private final int[] latchOut;
    // Per phase: no latch's data or enable is a latch output, so loads need no staging.
    private final boolean[] phaseDirect;
    private final Simulator.LatchLoad[] phaseLoad;
    private final long[] stageV;
    private final long[] stageX;

    /** @param sl where each net lies in the value words; {@code loads[p]} (may be null) loads phase p + 1 */
    PhaseLatches(Netlist nl, int phases, int[] sl, Simulator.LatchLoad[] loads) {
        int nets = nl.netCount();
        int maxPerPhase = 0;
        List<List<Latch>> byPhase = new ArrayList<>();
        for (int p = 0; p < phases; p++) {
            byPhase.add(new ArrayList<>());
        }
        for (Latch l : nl.latches()) {
            int p = l.phase() - 1;
            if (p < 0 || p >= phases) {
                throw new IllegalArgumentException("latch on net " + nl.netName(l.output()) + " loads on phase "
                        + l.phase() + " but the clock has " + phases + " phases");
            }
            byPhase.get(p).add(l);
        }
        phaseLatchData = new int[phases][];
        phaseLatchEnable = new int[phases][];
        phaseLatchOut = new int[phases][];
        for (int p = 0; p < phases; p++) {
            List<Latch> ls = byPhase.get(p);
            phaseLatchData[p] = ls.stream().mapToInt(l -> sl[l.data()]).toArray();
            phaseLatchEnable[p] = ls.stream().mapToInt(l -> l.enable() < 0 ? l.enable() : sl[l.enable()]).toArray();
            phaseLatchOut[p] = ls.stream().mapToInt(l -> sl[l.output()]).toArray();
            maxPerPhase = Math.max(maxPerPhase, ls.size());
        }
        latchOut = nl.latches().stream().mapToInt(l -> sl[l.output()]).toArray();
        phaseDirect = new boolean[phases];
        boolean[] isLatchOut = new boolean[nets];
        for (int q : latchOut) {
            isLatchOut[q] = true;
        }
        for (int p = 0; p < phases; p++) {
            boolean direct = true;
            for (int i = 0; i < phaseLatchData[p].length; i++) {
                int e = phaseLatchEnable[p][i];
                direct &= !isLatchOut[phaseLatchData[p][i]] && (e < 0 || !isLatchOut[e]);
            }
            phaseDirect[p] = direct;
        }
        phaseLoad = new Simulator.LatchLoad[phases];
        for (int p = 0; p < phases && loads != null && p < loads.length; p++) {
            phaseLoad[p] = phaseDirect[p] ? loads[p] : null;
        }
        stageV = new long[maxPerPhase];
        stageX = new long[maxPerPhase];
    }

    /** Every latch's output net, in the netlist's order. */
    int[] outputs() {
        return latchOut;
    }

    /** Phases whose two-valued loads run supplied code. */
    int suppliedPhases() {
        int n = 0;
        for (Simulator.LatchLoad l : phaseLoad) {
            n += l != null ? 1 : 0;
        }
        return n;
    }

    /** True when phase index {@code p}'s two-valued loads need no staging ({@link #loadDirect}). */
    boolean direct(int p) {
        return phaseDirect[p];
    }

    /** Two-valued loads of a direct phase; returns the lanes in which some latch changed. */
    long loadDirect(int p, long[] v) {
        Simulator.LatchLoad l = phaseLoad[p];
        return l != null ? l.load(v) : loadEach(v, phaseLatchData[p], phaseLatchEnable[p], phaseLatchOut[p]);
    }

    // Each latch commits at once: no latch of the phase reads another's output.
    private static long loadEach(long[] v, int[] data, int[] en, int[] q) {
        long changed = 0L;
        for (int i = 0, n = data.length; i < n; i++) {
            int o = q[i];
            long old = v[o];
            int ei = en[i];
            long nv = ei < 0 ? v[data[i]] : (v[data[i]] & v[ei]) | (old & ~v[ei]);
            changed |= old ^ nv;
            v[o] = nv;
        }
        return changed;
    }

    /** Stages phase index {@code p}'s two-valued loads from the settled values. */
    void stage2(int p, long[] v) {
        int[] data = phaseLatchData[p];
        int[] en = phaseLatchEnable[p];
        int[] q = phaseLatchOut[p];
        for (int i = 0, n = data.length; i < n; i++) {
            long e = en[i] < 0 ? -1L : v[en[i]];
            stageV[i] = (v[data[i]] & e) | (v[q[i]] & ~e);
        }
    }

    /** Stages phase index {@code p}'s three-valued loads. */
    void stage3(int p, long[] v, long[] x) {
        int[] data = phaseLatchData[p];
        int[] en = phaseLatchEnable[p];
        int[] q = phaseLatchOut[p];
        for (int i = 0, n = data.length; i < n; i++) {
            long dv = v[data[i]];
            long dx = x[data[i]];
            long qv = v[q[i]];
            long qx = x[q[i]];
            long ev = en[i] < 0 ? -1L : v[en[i]];
            long ex = en[i] < 0 ? 0L : x[en[i]];
            long e0 = ~ev & ~ex;
            // An unknown enable keeps the value only where data and the stored bit agree and are known.
            long same = ~(dv ^ qv) & ~dx & ~qx;
            stageV[i] = (ev & dv) | (e0 & qv) | (ex & same & qv);
            stageX[i] = (ev & dx) | (e0 & qx) | (ex & ~same);
        }
    }

    /** Commits the staged loads (and unknown marks when {@code threeValued}); returns the lanes that changed. */
    long commit(int p, long[] v, long[] x, boolean threeValued) {
        int[] q = phaseLatchOut[p];
        int n = q.length;
        long changed = 0L;
        for (int i = 0; i < n; i++) {
            changed |= v[q[i]] ^ stageV[i];
            v[q[i]] = stageV[i];
        }
        if (threeValued) {
            for (int i = 0; i < n; i++) {
                changed |= x[q[i]] ^ stageX[i];
                x[q[i]] = stageX[i];
            }
        }
        return changed;
    }
}
