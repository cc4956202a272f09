package org.thermion.verify;

import org.thermion.model.Gate;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.NetLabels;
import org.thermion.model.Netlist;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Where a counterexample's nets go wrong: the gates feeding a latch's pins with their values,
 * the fan-in cone of the pins, and the first nets where two runs' per-phase snapshots differ.
 */
final class NetTrace {
    private final Machine machine;
    private final int maxNets;
    // Per net: the gate driving it, or -1.
    private final int[] driver;
    /** Generated nets ("u.$4") shown as the expression that computes them and its file:line. */
    private final NetLabels labels;

    /** @param maxNets nets listed per counterexample (the trace lists three times as many gates) */
    NetTrace(Machine machine, int maxNets) {
        this.machine = machine;
        this.maxNets = maxNets;
        Netlist nl = machine.netlist();
        this.labels = new NetLabels(nl);
        this.driver = new int[nl.netCount()];
        java.util.Arrays.fill(driver, -1);
        for (Gate g : nl.gates()) {
            driver[g.output()] = g.id();
        }
    }

    /**
     * The gates feeding {@code pins}, breadth first from the pins (free wires followed without
     * counting), each with its input values in the failing lane, at most {@code 3 x maxNets}.
     */
    List<TraceLine> trace(int[] pins, long[] at, int lane) {
        Netlist nl = machine.netlist();
        List<TraceLine> out = new ArrayList<>();
        boolean[] seen = new boolean[nl.netCount()];
        java.util.ArrayDeque<int[]> todo = new java.util.ArrayDeque<>();
        for (int p : pins) {
            if (p >= 0) {
                todo.add(new int[]{p, 0});
            }
        }
        int limit = 3 * Math.max(1, maxNets);
        while (!todo.isEmpty() && out.size() < limit) {
            int[] e = todo.poll();
            int n = e[0];
            if (seen[n] || driver[n] < 0) {
                continue;
            }
            seen[n] = true;
            Gate g = nl.gates().get(driver[n]);
            StringBuilder ins = new StringBuilder();
            for (int i : g.inputs()) {
                ins.append(ins.length() == 0 ? "" : " ").append(name(i, false)).append('=').append(b01(bit(at[i], lane)));
                todo.add(new int[]{i, g.stage() < 0 ? e[1] : e[1] + 1});
            }
            String fn = g.stage() < 0 ? (g.fn() == org.thermion.model.GateFn.NOT ? "complement" : "wire")
                    : g.fn().name().toLowerCase(Locale.ROOT);
            out.add(new TraceLine(e[1], name(n, true), module(nl.netModule(n)), fn, ins.toString(), bit(at[n], lane)));
        }
        return List.copyOf(out);
    }

    /**
     * A net as the builder wrote it: its name, or for a net the elaborator made ("u.$4") the
     * expression in brackets, with the file:line of its statement where {@code place} asks.
     */
    private String name(int n, boolean place) {
        Netlist nl = machine.netlist();
        if (!nl.isGenerated(n)) {
            return nl.netName(n);
        }
        String where = nl.netPlace(n);
        return "[" + labels.expression(n, 2) + "]" + (place && where != null ? " (" + where + ")" : "");
    }

    /** Nets in the fan-in of {@code pins}, back to latches, inputs and ROM data. */
    boolean[] cone(int[] pins) {
        Netlist nl = machine.netlist();
        boolean[] in = new boolean[nl.netCount()];
        java.util.ArrayDeque<Integer> todo = new java.util.ArrayDeque<>();
        for (int p : pins) {
            if (p >= 0) {
                todo.add(p);
            }
        }
        while (!todo.isEmpty()) {
            int n = todo.pop();
            if (in[n]) {
                continue;
            }
            in[n] = true;
            if (driver[n] >= 0) {
                for (int i : nl.gates().get(driver[n]).inputs()) {
                    todo.add(i);
                }
            }
        }
        return in;
    }

    /**
     * The first nets, in levelized order phase by phase (latch outputs, inputs and ROM data
     * first, then gate outputs in evaluation order), where lane {@code la} of {@code a} and
     * lane {@code lb} of {@code b} differ; only nets below {@code netLimit} and in {@code only},
     * and only at {@code onlyPhase} unless it is 0.
     */
    List<NetDiff> firstDifferences(BatchRun.Result a, BatchRun.Result b, int la, int lb, int netLimit,
                                           boolean[] only, int onlyPhase) {
        Netlist nl = machine.netlist();
        int[] order = levelOrder(nl);
        List<NetDiff> out = new ArrayList<>();
        for (int p = 1; p < a.atPhase.length && out.size() < maxNets; p++) {
            if (onlyPhase != 0 && p != onlyPhase) {
                continue;
            }
            for (int n : order) {
                if (n >= netLimit || n <= Netlist.CONST1 || (only != null && !only[n])) {
                    continue;
                }
                boolean va = bit(a.atPhase[p][n], la);
                boolean vb = bit(b.atPhase[p][n], lb);
                if (va != vb) {
                    out.add(new NetDiff(n, name(n, true), module(nl.netModule(n)), p, va, vb));
                    if (out.size() >= maxNets) {
                        break;
                    }
                }
            }
        }
        return List.copyOf(out);
    }

    private static int[] levelOrder(Netlist nl) {
        boolean[] gateOut = new boolean[nl.netCount()];
        for (Gate g : nl.gates()) {
            gateOut[g.output()] = true;
        }
        int[] order = new int[nl.netCount()];
        int k = 0;
        for (int n = 0; n < nl.netCount(); n++) {
            if (!gateOut[n]) {
                order[k++] = n;
            }
        }
        for (Gate g : nl.gates()) {
            order[k++] = g.output();
        }
        return java.util.Arrays.copyOf(order, k);
    }

    private String module(int m) {
        if (m < 0 || m >= machine.modules().size()) {
            return "";
        }
        ModuleInstance mi = machine.modules().get(m);
        return mi.path().isEmpty() ? "(top) " + mi.type() : mi.path() + " (" + mi.type() + ")";
    }

    private static boolean bit(long v, int lane) {
        return (v >>> lane & 1L) != 0;
    }

    private static String b01(boolean v) {
        return v ? "1" : "0";
    }
}
