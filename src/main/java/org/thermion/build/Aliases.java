package org.thermion.build;

import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Netlist;

/**
 * Free buffers of the netlist (a net named as another: {@code bits[0] = ir[0]}) are one wire: each
 * net maps to the net it is wired as, following chains of such buffers to their source.
 */
public final class Aliases {
    private final int[] root;

    public Aliases(Netlist n) {
        int[] direct = new int[n.netCount()];
        for (int i = 0; i < direct.length; i++) {
            direct[i] = i;
        }
        for (Gate g : n.gates()) {
            if (isAlias(g)) {
                direct[g.output()] = g.input(0);
            }
        }
        root = new int[direct.length];
        for (int i = 0; i < direct.length; i++) {
            int r = i;
            for (int steps = 0; direct[r] != r && steps <= direct.length; steps++) {
                r = direct[r];
            }
            root[i] = r;
        }
    }

    /** True for a free buffer: a wire, not a stage. */
    public static boolean isAlias(Gate g) {
        return g.stage() < 0 && g.fn() == GateFn.BUF && g.arity() == 1;
    }

    /** The net {@code net} is wired as. */
    public int of(int net) {
        return root[net];
    }
}
