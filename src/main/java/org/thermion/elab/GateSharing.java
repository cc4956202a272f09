package org.thermion.elab;

import org.thermion.model.GateFn;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

/**
 * Shares identical gates once every driver is known. Sharing while building sees nets as they
 * were named at the time, so a gate reading an inverter that later proved to be a wire, or a
 * copy of another net, missed its twin; here inputs are followed through every plain connection
 * to the net that really drives them, and a gate identical to an earlier one (function, stage,
 * module, inputs) becomes a wire from it, repeated until nothing changes. The tube count then
 * follows the logic, not the order of the statements.
 */
final class GateSharing {
    private GateSharing() {
    }

    /** {@code notStage}: the stage realizing {@code !}, or -1. */
    static void share(NetBuilder nb, int notStage) {
        boolean changed = true;
        while (changed) {
            changed = false;
            Map<NetBuilder.GateKey, Integer> first = new HashMap<>();
            for (int g = 0; g < nb.gates.size(); g++) {
                NetBuilder.GateB gate = nb.gates.get(g);
                if (gate.stage < 0) {
                    continue; // wires, and flip-flops' free second outputs
                }
                int[] in = Arrays.stream(gate.in).map(n -> root(nb, n)).distinct().toArray();
                if (in.length < gate.in.length && joins(gate.fn)) {
                    // x & y & x: the repeated input goes, as it would have had its name been driven.
                    changed = true;
                    if (in.length == 1 ? collapse(nb, g, in[0], notStage) : narrow(nb, g, in)) {
                        continue;
                    }
                    gate = nb.gates.get(g);
                    in = gate.in;
                }
                Integer twin = first.putIfAbsent(NetBuilder.keyOf(gate.fn, gate.stage, gate.module, in), gate.out);
                if (twin != null) {
                    nb.merge(g, twin);
                    changed = true;
                }
            }
        }
    }

    private static boolean joins(GateFn fn) {
        return fn == GateFn.AND || fn == GateFn.OR || fn == GateFn.NAND || fn == GateFn.NOR;
    }

    private static boolean narrow(NetBuilder nb, int g, int[] in) {
        NetBuilder.GateB gate = nb.gates.get(g);
        for (int n : in) {
            nb.read(n);
        }
        nb.gates.set(g, new NetBuilder.GateB(gate.fn, in, gate.out, gate.stage, gate.module, gate.span));
        return false;
    }

    /**
     * A gate whose inputs all proved to be one net ({@code x & x}, or {@code x | !!x} written
     * through names not yet driven): a wire for AND and OR, an inverter for NAND and NOR, as
     * the expression would have been built had the names been known.
     */
    private static boolean collapse(NetBuilder nb, int g, int x, int notStage) {
        NetBuilder.GateB gate = nb.gates.get(g);
        if (gate.fn == GateFn.AND || gate.fn == GateFn.OR) {
            nb.merge(g, x);
        } else if (nb.isLatchOutput(x)) {
            nb.merge(g, nb.complementOf(x));
        } else if (nb.complementSource.containsKey(x)) {
            nb.merge(g, nb.complementSource.get(x));
        } else if (notStage >= 0) {
            nb.gates.set(g, new NetBuilder.GateB(GateFn.NOT, new int[]{x}, gate.out, notStage, gate.module, gate.span));
            nb.read(x);
        } else {
            nb.gates.set(g, new NetBuilder.GateB(gate.fn, new int[]{x}, gate.out, gate.stage, gate.module, gate.span));
            nb.read(x);
            return false;
        }
        return true;
    }

    /** The net behind a chain of plain connections. */
    private static int root(NetBuilder nb, int net) {
        int n = net;
        for (int steps = 0; steps < nb.gates.size(); steps++) {
            int d = nb.driver.get(n);
            if (d < 0) {
                return n;
            }
            NetBuilder.GateB g = nb.gates.get(d);
            if (g.fn != GateFn.BUF || g.stage >= 0) {
                return n;
            }
            n = g.in[0];
        }
        return n; // a loop of plain connections: reported elsewhere
    }
}
