package org.thermion.faults;

/**
 * Which slots can influence some lamp at all, by the structure alone: a slot reaches a lamp
 * through the operations that read it, the latches it loads or enables, and the program
 * counter (whose address selects every program-memory line).
 */
final class Observability {
    private Observability() {
    }

    static boolean[] of(FaultCircuit c) {
        boolean[] all = new boolean[c.lamps().size()];
        java.util.Arrays.fill(all, true);
        return of(c, all);
    }

    /** As {@link #of(FaultCircuit)}, counting only the lamps marked in {@code useful}. */
    static boolean[] of(FaultCircuit c, boolean[] useful) {
        int n = c.slotCount;
        int[][] readers = new int[n][];
        int[] count = new int[n];
        int[] code = c.code;
        for (int at = 0; at < code.length; at += 3 + code[at + 2]) {
            for (int k = 0; k < code[at + 2]; k++) {
                count[code[at + 3 + k]]++;
            }
        }
        for (int p = 0; p < c.phases; p++) {
            for (int k = 0; k < c.latchData[p].length; k++) {
                count[c.latchData[p][k]]++;
                if (c.latchEnable[p][k] >= 0) {
                    count[c.latchEnable[p][k]]++;
                }
            }
        }
        for (int s = 0; s < n; s++) {
            readers[s] = new int[count[s]];
        }
        int[] fill = new int[n];
        for (int at = 0; at < code.length; at += 3 + code[at + 2]) {
            for (int k = 0; k < code[at + 2]; k++) {
                int in = code[at + 3 + k];
                readers[in][fill[in]++] = code[at + 1];
            }
        }
        for (int p = 0; p < c.phases; p++) {
            for (int k = 0; k < c.latchData[p].length; k++) {
                int d = c.latchData[p][k];
                readers[d][fill[d]++] = c.latchOut[p][k];
                int e = c.latchEnable[p][k];
                if (e >= 0) {
                    readers[e][fill[e]++] = c.latchOut[p][k];
                }
            }
        }
        boolean[] reach = new boolean[n];
        boolean changed = true;
        for (int i = 0; i < useful.length; i++) {
            if (useful[i]) {
                reach[c.lamps().get(i).slot()] = true;
            }
        }
        // Iterate to a fixed point: latch feedback makes the graph cyclic.
        while (changed) {
            changed = false;
            boolean romSeen = false;
            for (int r : c.romSlots) {
                romSeen |= reach[r];
            }
            for (int s = n - 1; s >= 0; s--) {
                if (reach[s]) {
                    continue;
                }
                boolean r = false;
                for (int t : readers[s]) {
                    r |= reach[t];
                }
                if (!r && romSeen && c.hasPc && (s == c.pcJump || contains(c.pcTarget, s))) {
                    r = true;
                }
                if (r) {
                    reach[s] = true;
                    changed = true;
                }
            }
        }
        return reach;
    }

    private static boolean contains(int[] a, int v) {
        for (int x : a) {
            if (x == v) {
                return true;
            }
        }
        return false;
    }
}
