package org.thermion.sim;

import org.thermion.model.Gate;
import org.thermion.model.Netlist;

import java.util.Arrays;
import java.util.List;

/**
 * The two-valued form of a netlist's logic: gates of one shape (function and arity) gathered
 * into runs, each run one tight loop over a single packed operand array, so the engine
 * dispatches once per run rather than once per gate.
 *
 * <p>The gates are put in a new order that still evaluates every gate after the gates
 * driving its inputs, chosen to change shape as seldom as possible (see {@link #schedule}).
 * A netlist in which some gate reads a net written by itself or a later gate, or a net is
 * written by two gates, keeps its order (consecutive gates of one shape still share a run).
 *
 * <p>Packing: a gate of fixed arity k takes {@code 1 + k} ints (output, inputs); a gate of
 * a list shape takes {@code 2 + n} (output, n, inputs).
 */
final class GateProgram {
    static final int BUF = 0;
    static final int NOT = 1;
    static final int AND2 = 2;
    static final int OR2 = 3;
    static final int NAND2 = 4;
    static final int NOR2 = 5;
    static final int XOR2 = 6;
    static final int AND3 = 7;
    static final int OR3 = 8;
    static final int NAND3 = 9;
    static final int NOR3 = 10;
    static final int AND4 = 11;
    static final int OR4 = 12;
    static final int NAND4 = 13;
    static final int NOR4 = 14;
    static final int AND_N = 15;
    static final int OR_N = 16;
    static final int NAND_N = 17;
    static final int NOR_N = 18;
    static final int XOR_N = 19;
    static final int SHAPES = 20;

    /** Shape of each run. */
    final int[] runShape;
    /** Start of each run in {@link #code}; run r ends where run r + 1 starts. */
    final int[] runStart;
    final int[] code;
    /** True when the gates were put in a new order; false when the netlist's order was kept. */
    final boolean regrouped;

    GateProgram(Netlist netlist) {
        List<Gate> gates = netlist.gates();
        int n = gates.size();
        int[] shape = new int[n];
        for (int g = 0; g < n; g++) {
            shape[g] = shape(gates.get(g));
        }
        // Two rules for the next shape; the order with fewer runs is kept.
        int[] order = schedule(gates, shape, netlist.netCount(), true);
        if (order != null) {
            int[] other = schedule(gates, shape, netlist.netCount(), false);
            if (countRuns(other, shape) < countRuns(order, shape)) {
                order = other;
            }
        }
        regrouped = order != null;
        if (order == null) {
            order = new int[n];
            for (int g = 0; g < n; g++) {
                order[g] = g;
            }
        }
        int size = 0;
        int runs = 0;
        for (int i = 0; i < n; i++) {
            int g = order[i];
            size += words(shape[g], gates.get(g).arity());
            if (i == 0 || shape[order[i - 1]] != shape[g]) {
                runs++;
            }
        }
        code = new int[size];
        runShape = new int[runs];
        runStart = new int[runs + 1];
        int at = 0;
        int r = -1;
        for (int i = 0; i < n; i++) {
            int g = order[i];
            int s = shape[g];
            if (i == 0 || shape[order[i - 1]] != s) {
                r++;
                runShape[r] = s;
                runStart[r] = at;
            }
            Gate gate = gates.get(g);
            int[] ins = gate.inputs();
            code[at++] = gate.output();
            if (s >= AND_N) {
                code[at++] = ins.length;
                for (int in : ins) {
                    code[at++] = in;
                }
            } else {
                int k = arity(s);
                for (int j = 0; j < k; j++) {
                    code[at++] = j < ins.length ? ins[j] : Netlist.CONST0;
                }
            }
        }
        runStart[runs] = at;
    }

    /**
     * Gives the nets new numbers (slots): {@code leading} first, in that order, then the others
     * in the order this program first touches them, then the rest; rewrites the program in
     * slots and returns the map from net to slot. The settle then writes its values front to
     * back and mostly reads values written shortly before, which keeps a big netlist's reads
     * in the processor's nearer caches.
     */
    int[] renumber(int nets, int[] leading) {
        int[] slot = new int[nets];
        Arrays.fill(slot, -1);
        int next = 0;
        for (int n : leading) {
            if (slot[n] < 0) {
                slot[n] = next++;
            }
        }
        for (int r = 0; r < runShape.length; r++) {
            boolean list = runShape[r] >= AND_N;
            for (int p = runStart[r], e = runStart[r + 1]; p < e; ) {
                int end = list ? p + 2 + code[p + 1] : p + 1 + arity(runShape[r]);
                // Inputs before the output: a gate's inputs were touched first.
                for (int k = list ? p + 2 : p + 1; k < end; k++) {
                    next = place(code, k, slot, next);
                }
                next = place(code, p, slot, next);
                p = end;
            }
        }
        for (int n = 0; n < nets; n++) {
            if (slot[n] < 0) {
                slot[n] = next++;
            }
        }
        return slot;
    }

    // Gives the net at code[k] the next slot if it has none yet, and writes its slot there.
    private static int place(int[] code, int k, int[] slot, int next) {
        int n = code[k];
        if (slot[n] < 0) {
            slot[n] = next++;
        }
        code[k] = slot[n];
        return next;
    }

    /** Runs in the program. */
    int runs() {
        return runShape.length;
    }

    /**
     * An evaluation order with few shape changes, or null when the netlist's order must be
     * kept: a net written by two gates, or a gate reading a net that it or a later gate writes.
     *
     * <p>Any order that puts each gate after the gates driving its inputs computes the same
     * values (every gate-driven net has one writer, and the other nets do not change during a
     * settle). Greedy list scheduling: keep taking ready gates of the current shape, including
     * those that become ready on the way (a run is evaluated in order, so a gate may follow
     * its driver within one run); when none is left, switch to the shape with the most ready
     * gates ({@code mostReady}) or to the next shape in the fixed order that has any.
     */
    private static int[] schedule(List<Gate> gates, int[] shape, int nets, boolean mostReady) {
        int n = gates.size();
        int[] driver = new int[nets];
        Arrays.fill(driver, -1);
        for (int g = 0; g < n; g++) {
            int o = gates.get(g).output();
            if (o < 0 || o >= nets || driver[o] >= 0) {
                return null;
            }
            driver[o] = g;
        }
        // Fan-out of each gate as a flat adjacency list, and each gate's count of unscheduled drivers.
        int[] waiting = new int[n];
        int[] fanStart = new int[n + 1];
        for (int g = 0; g < n; g++) {
            for (int in : gates.get(g).inputs()) {
                int d = in >= 0 && in < nets ? driver[in] : -1;
                if (d >= g) {
                    return null;
                }
                if (d >= 0) {
                    waiting[g]++;
                    fanStart[d + 1]++;
                }
            }
        }
        for (int g = 0; g < n; g++) {
            fanStart[g + 1] += fanStart[g];
        }
        int[] fan = new int[fanStart[n]];
        int[] fill = Arrays.copyOf(fanStart, n);
        for (int g = 0; g < n; g++) {
            for (int in : gates.get(g).inputs()) {
                int d = in >= 0 && in < nets ? driver[in] : -1;
                if (d >= 0) {
                    fan[fill[d]++] = g;
                }
            }
        }
        // Ready gates per shape, first in first out (which keeps roughly the netlist's order).
        int[][] queue = new int[SHAPES][];
        int[] head = new int[SHAPES];
        int[] tail = new int[SHAPES];
        int[] perShape = new int[SHAPES];
        for (int g = 0; g < n; g++) {
            perShape[shape[g]]++;
        }
        for (int s = 0; s < SHAPES; s++) {
            queue[s] = new int[perShape[s]];
        }
        for (int g = 0; g < n; g++) {
            if (waiting[g] == 0) {
                queue[shape[g]][tail[shape[g]]++] = g;
            }
        }
        int[] order = new int[n];
        int done = 0;
        int current = -1;
        while (done < n) {
            if (current < 0 || head[current] == tail[current]) {
                int from = current < 0 ? 0 : current + 1;
                current = -1;
                for (int k = 0; k < SHAPES; k++) {
                    int s = (from + k) % SHAPES;
                    if (head[s] < tail[s] && (current < 0
                            || mostReady && tail[s] - head[s] > tail[current] - head[current])) {
                        current = s;
                    }
                }
                if (current < 0) {
                    return null;
                }
            }
            int g = queue[current][head[current]++];
            order[done++] = g;
            for (int k = fanStart[g]; k < fanStart[g + 1]; k++) {
                int r = fan[k];
                if (--waiting[r] == 0) {
                    queue[shape[r]][tail[shape[r]]++] = r;
                }
            }
        }
        return order;
    }

    private static int countRuns(int[] order, int[] shape) {
        int runs = 0;
        for (int i = 0; i < order.length; i++) {
            if (i == 0 || shape[order[i - 1]] != shape[order[i]]) {
                runs++;
            }
        }
        return runs;
    }

    private static int shape(Gate g) {
        int n = g.arity();
        return switch (g.fn()) {
            case BUF -> BUF;
            case NOT -> NOT;
            case AND -> n == 1 ? BUF : n == 2 ? AND2 : n == 3 ? AND3 : n == 4 ? AND4 : AND_N;
            case OR -> n == 1 ? BUF : n == 2 ? OR2 : n == 3 ? OR3 : n == 4 ? OR4 : OR_N;
            case NAND -> n == 1 ? NOT : n == 2 ? NAND2 : n == 3 ? NAND3 : n == 4 ? NAND4 : NAND_N;
            case NOR -> n == 1 ? NOT : n == 2 ? NOR2 : n == 3 ? NOR3 : n == 4 ? NOR4 : NOR_N;
            case XOR -> n == 1 ? BUF : n == 2 ? XOR2 : XOR_N;
        };
    }

    private static int arity(int shape) {
        if (shape <= NOT) {
            return 1;
        }
        if (shape <= XOR2) {
            return 2;
        }
        if (shape <= NOR3) {
            return 3;
        }
        return 4;
    }

    private static int words(int shape, int inputs) {
        return shape >= AND_N ? 2 + inputs : 1 + arity(shape);
    }
}
