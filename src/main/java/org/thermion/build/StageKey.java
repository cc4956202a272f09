package org.thermion.build;

import org.thermion.model.Netlist;

/**
 * Stage instances as one number: gate g is g, latch l is the gate count + l; then the built blocks'
 * instances in order, then soft start i's bypass ({@link #softStart}).
 */
public final class StageKey {
    private StageKey() {
    }

    public static int gate(int g) {
        return g;
    }

    public static int latch(Netlist n, int l) {
        return n.gates().size() + l;
    }

    /** The key of soft start {@code i}'s parts: past every gate, latch and counted built-block instance. */
    public static int softStart(org.thermion.model.Machine m, int i) {
        int key = m.netlist().gates().size() + m.netlist().latches().size();
        for (org.thermion.model.BuiltBlock b : m.built()) {
            if (b.counted()) {
                for (org.thermion.model.BuiltBlock.Instances u : b.stages()) {
                    key += u.count();
                }
            }
        }
        return key + i;
    }

    public static boolean isLatch(Netlist n, int key) {
        return key >= n.gates().size();
    }

    public static int index(Netlist n, int key) {
        return isLatch(n, key) ? key - n.gates().size() : key;
    }
}
