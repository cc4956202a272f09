package org.thermion.faults;

import java.nio.LongBuffer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Breadth-first search over pairs of machine states, the good machine's and one faulty
 * machine's, one whole cycle per move with every switch setting. It finds the shortest run of
 * cycles after which some lamp tells the two apart, or, when every reachable pair has been
 * visited without that, proves that no sequence of steps can (and says whether the fault's
 * wires ever took the other value on the way: if not, the fault cannot be provoked; and
 * whether a lamp the good machine shows was ever unknown in the faulty one: then the fault
 * keeps the machine from leaving its unknown power-up state there).
 * Sixty-four (pair, setting) moves are simulated at once, one per lane.
 */
final class StateSearch {
    /** How a search ended. */
    enum End { FOUND, EXHAUSTED, BUDGET }

    /** The result: how it ended, the settings cycle by cycle when found, and whether the fault was ever provoked. */
    record Result(End end, List<boolean[]> cycles, boolean provoked, boolean blurred, int visited) {
    }

    private final FaultSimulator sim;
    private final List<boolean[]> settings;
    private final boolean complete;
    private final int budget;

    /**
     * @param settings the switch settings tried at every move
     * @param complete true when {@code settings} are all there are (only then is exhaustion a proof)
     * @param budget   pairs of states visited at most
     */
    StateSearch(FaultSimulator sim, List<boolean[]> settings, boolean complete, int budget) {
        this.sim = sim;
        this.settings = settings;
        this.complete = complete;
        this.budget = budget;
    }

    /** Searches from lane {@code gl} of {@code good} and lane {@code fl} of {@code faulty} (both at a cycle start). */
    Result search(Fault fault, LaneMachine good, int gl, LaneMachine faulty, int fl) {
        return search(fault, good, gl, faulty, fl, null, null);
    }

    /**
     * The good machine alone from power-up: every slot's known values over every reachable
     * state and setting go into {@code seen0} / {@code seen1} (nonzero where seen).
     * Returns false when the budget ran out before every reachable state was visited.
     */
    boolean reach(long[] seen0, long[] seen1) {
        Fault none = new Fault(-1, FaultKind.STUCK_AT_0, -1, List.of());
        Result r = search(none, sim.machine(), 0, sim.machine(), 0, seen0, seen1);
        return r.end() == End.EXHAUSTED;
    }

    /**
     * The faulty machine alone from power-up (lane {@code fl} of {@code faulty}): true when every
     * reachable state was visited and no lamp was ever known in it, at any phase, under any
     * setting. A lamp tells a fault only where it is known in both machines, so such a fault can
     * never be detected: its machine never leaves the unknown power-up state where a lamp shows.
     */
    boolean lampsNeverKnown(Fault fault, LaneMachine faulty, int fl) {
        FaultCircuit c = sim.circuit();
        long[] seen0 = new long[c.slotCount];
        long[] seen1 = new long[c.slotCount];
        Result r = search(fault, faulty, fl, faulty, fl, seen0, seen1, true, null);
        if (r.end() != End.EXHAUSTED) {
            return false;
        }
        for (ObservedLamp l : c.lamps()) {
            if ((seen0[l.slot()] | seen1[l.slot()]) != 0L) {
                return false;
            }
        }
        return true;
    }

    private Result search(Fault fault, LaneMachine good, int gl, LaneMachine faulty, int fl, long[] seen0, long[] seen1) {
        return search(fault, good, gl, faulty, fl, seen0, seen1, false, null);
    }

    /**
     * Searches for a run of cycles that tells fault {@code a}'s machine from fault {@code b}'s,
     * starting from lane 0 of {@code withA} and {@code withB} (machines carrying them, at a cycle
     * start): FOUND with the settings, EXHAUSTED when no run of cycles ever can.
     */
    Result tellApart(Fault a, LaneMachine withA, Fault b, LaneMachine withB) {
        return tellApart(a, withA, 0, b, withB, 0);
    }

    /** As {@link #tellApart(Fault, LaneMachine, Fault, LaneMachine)} from lane {@code la} of {@code withA}, {@code lb} of {@code withB}. */
    Result tellApart(Fault a, LaneMachine withA, int la, Fault b, LaneMachine withB, int lb) {
        return search(b, withA, la, withB, lb, null, null, false, a);
    }

    /**
     * {@code faultyAlone}: both machines carry the fault (one machine's reach; nothing is ever found);
     * {@code other}: the first machine carries that fault instead of none.
     */
    private Result search(Fault fault, LaneMachine good, int gl, LaneMachine faulty, int fl, long[] seen0, long[] seen1,
                          boolean faultyAlone, Fault other) {
        FaultCircuit c = sim.circuit();
        LaneMachine g = sim.machine();
        LaneMachine b = sim.machine();
        // The state keys leave the program out: the search runs the one each start has fitted.
        g.fitProgramOf(good);
        b.fitProgramOf(faulty);
        b.inject(fault, -1L);
        if (faultyAlone) {
            g.inject(fault, -1L);
        } else if (other != null) {
            g.inject(other, -1L);
        }
        int kw = g.keyWords();
        List<long[]> nodes = new ArrayList<>();
        List<int[]> parent = new ArrayList<>();
        Map<LongBuffer, Integer> seen = new HashMap<>();
        long[] start = new long[2 * kw];
        long[] key = new long[kw];
        good.stateKey(gl, key);
        System.arraycopy(key, 0, start, 0, kw);
        faulty.stateKey(fl, key);
        System.arraycopy(key, 0, start, kw, kw);
        nodes.add(start);
        parent.add(new int[] {-1, -1});
        seen.put(LongBuffer.wrap(start), 0);
        boolean provoked = false;
        boolean blurred = false;
        int ns = settings.size();
        long[] kg = new long[kw];
        long[] kf = new long[kw];
        for (int head = 0; head < nodes.size(); ) {
            int layerEnd = nodes.size();
            // Moves of this layer, 64 at a time: move = node * settings + setting.
            long moves = (long) (layerEnd - head) * ns;
            for (long m0 = 0; m0 < moves; m0 += LaneMachine.LANES) {
                int lanes = (int) Math.min(LaneMachine.LANES, moves - m0);
                long[] in = new long[c.inputCount()];
                for (int l = 0; l < lanes; l++) {
                    long mv = m0 + l;
                    int node = head + (int) (mv / ns);
                    boolean[] s = settings.get((int) (mv % ns));
                    long[] k = nodes.get(node);
                    System.arraycopy(k, 0, kg, 0, kw);
                    System.arraycopy(k, kw, kf, 0, kw);
                    g.loadState(l, kg);
                    b.loadState(l, kf);
                    for (int i = 0; i < in.length; i++) {
                        if (s[i]) {
                            in[i] |= 1L << l;
                        }
                    }
                }
                for (int i = 0; i < in.length; i++) {
                    g.setInput(i, in[i]);
                    b.setInput(i, in[i]);
                }
                long live = lanes == 64 ? -1L : (1L << lanes) - 1;
                do {
                    g.settle();
                    provoked |= (provoked(fault, g) & live) != 0L;
                    if (seen0 != null) {
                        see(g, live, seen0, seen1);
                    }
                    g.load();
                    b.phase();
                } while (g.nextPhase() != 1);
                g.settle();
                b.settle();
                if (faultyAlone) {
                    // The lamps as the cycle leaves them count too.
                    see(g, live, seen0, seen1);
                }
                provoked |= (provoked(fault, g) & live) != 0L;
                long det = differs(c, g, b) & live;
                blurred |= (blurs(c, g, b) & live) != 0L;
                if (det != 0L) {
                    int l = Long.numberOfTrailingZeros(det);
                    long mv = m0 + l;
                    List<boolean[]> path = new ArrayList<>();
                    path.add(settings.get((int) (mv % ns)));
                    for (int n = head + (int) (mv / ns); parent.get(n)[0] >= 0; n = parent.get(n)[0]) {
                        path.add(settings.get(parent.get(n)[1]));
                    }
                    java.util.Collections.reverse(path);
                    return new Result(End.FOUND, path, true, blurred, nodes.size());
                }
                for (int l = 0; l < lanes; l++) {
                    long mv = m0 + l;
                    long[] k = new long[2 * kw];
                    g.stateKey(l, kg);
                    b.stateKey(l, kf);
                    System.arraycopy(kg, 0, k, 0, kw);
                    System.arraycopy(kf, 0, k, kw, kw);
                    LongBuffer p = LongBuffer.wrap(k);
                    if (!seen.containsKey(p)) {
                        if (nodes.size() >= budget) {
                            return new Result(End.BUDGET, List.of(), provoked, blurred, nodes.size());
                        }
                        seen.put(p, nodes.size());
                        nodes.add(k);
                        parent.add(new int[] {head + (int) (mv / ns), (int) (mv % ns)});
                    }
                }
            }
            head = layerEnd;
        }
        return new Result(complete ? End.EXHAUSTED : End.BUDGET, List.of(), provoked, blurred, nodes.size());
    }

    private static void see(LaneMachine g, long live, long[] seen0, long[] seen1) {
        for (int s = 0; s < seen0.length; s++) {
            seen0[s] |= ~g.v[s] & ~g.x[s] & live;
            seen1[s] |= g.v[s] & live;
        }
    }

    /** Lanes where some wire of the fault holds a known value other than the one the fault forces. */
    static long provoked(Fault fault, LaneMachine good) {
        long p = 0L;
        Bridge br = fault.bridge();
        if (br != null) {
            // the two nets known and different: the bridge joins unlike levels
            int a = br.slotA();
            int b = br.slotB();
            p |= ~good.x[a] & ~good.x[b] & (good.v[a] ^ good.v[b]);
        }
        for (Force f : fault.forces()) {
            long v = good.v[f.slot()];
            p |= ~good.x[f.slot()] & (f.value() ? ~v : v);
        }
        return p;
    }

    /** Lanes where a lamp is known in both machines and differs. */
    static long differs(FaultCircuit c, LaneMachine g, LaneMachine b) {
        long d = 0L;
        for (ObservedLamp l : c.lamps()) {
            int s = l.slot();
            d |= (g.v[s] ^ b.v[s]) & ~g.x[s] & ~b.x[s];
        }
        return d;
    }

    /** Lanes where a lamp is known in the good machine and unknown in the faulty one. */
    static long blurs(FaultCircuit c, LaneMachine g, LaneMachine b) {
        long d = 0L;
        for (ObservedLamp l : c.lamps()) {
            d |= ~g.x[l.slot()] & b.x[l.slot()];
        }
        return d;
    }
}
