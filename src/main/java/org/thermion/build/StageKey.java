package org.thermion.build;

import org.thermion.model.Netlist;

/** Stage instances as one number: gate g is g, latch l is the gate count + l. */
public final class StageKey {
    private StageKey() {
    }

    public static int gate(int g) {
        return g;
    }

    public static int latch(Netlist n, int l) {
        return n.gates().size() + l;
    }

    public static boolean isLatch(Netlist n, int key) {
        return key >= n.gates().size();
    }

    public static int index(Netlist n, int key) {
        return isLatch(n, key) ? key - n.gates().size() : key;
    }
}
