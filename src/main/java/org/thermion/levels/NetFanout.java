package org.thermion.levels;

import java.util.ArrayList;
import java.util.List;

import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;

/**
 * The machine's electrical nodes from its netlist. A free wire (a {@code BUF} cell realized by
 * no stage) joins two nets into one node; every other net is a node of its own. Each node knows
 * its driver (a gate or latch realized by a stage, or nothing: a machine input, the ROM, a
 * constant), the input pins it feeds (every gate and latch pin reading any of its nets), and the
 * name a reader knows it by: a name written in the source rather than a generated temporary.
 */
public final class NetFanout {
    /** Where a node's signal comes from. */
    public enum Source { GATE, LATCH, COMPLEMENT, OUTSIDE }

    /** One input pin a node feeds: a gate's or a latch's. */
    public record Pin(boolean latch, int index, int pin) {
    }

    /** An electrical node: its root net, the nets joined to it, its driver and the pins it feeds. */
    public record Node(int net, String name, Source source, int driver, List<Integer> nets, List<Pin> pins) {
        public Node {
            nets = List.copyOf(nets);
            pins = List.copyOf(pins);
        }
    }

    private final int[] root;
    private final List<Node> nodes;
    private final int[] nodeOfRoot;

    private NetFanout(int[] root, List<Node> nodes, int[] nodeOfRoot) {
        this.root = root;
        this.nodes = nodes;
        this.nodeOfRoot = nodeOfRoot;
    }

    /** The nodes of {@code m}'s netlist, in net order of their roots (one pass over gates and latches). */
    public static NetFanout of(Machine m) {
        Netlist nl = m.netlist();
        int n = nl.netCount();
        int[] root = new int[n];
        for (int i = 0; i < n; i++) {
            root[i] = i;
        }
        Source[] source = new Source[n];
        int[] driver = new int[n];
        java.util.Arrays.fill(source, Source.OUTSIDE);
        java.util.Arrays.fill(driver, -1);
        // gates are levelized: a free wire's input is resolved before its output is read
        for (Gate g : nl.gates()) {
            if (g.stage() < 0 && g.fn() == GateFn.BUF) {
                root[g.output()] = root[g.input(0)];
            } else if (g.stage() < 0) {
                source[g.output()] = Source.COMPLEMENT;
                driver[g.output()] = g.input(0);
            } else {
                source[g.output()] = Source.GATE;
                driver[g.output()] = g.id();
            }
        }
        for (Latch l : nl.latches()) {
            if (l.stage() >= 0) {
                source[l.output()] = Source.LATCH;
                driver[l.output()] = l.id();
            }
        }
        for (Gate g : nl.gates()) {
            // a complement read through a free wire chain: find the latch it mirrors
            if (source[g.output()] == Source.COMPLEMENT) {
                driver[g.output()] = root[driver[g.output()]];
            }
        }
        List<List<Integer>> members = new ArrayList<>(n);
        List<List<Pin>> pins = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            members.add(null);
            pins.add(null);
        }
        for (int i = 0; i < n; i++) {
            int r = root[i];
            if (members.get(r) == null) {
                members.set(r, new ArrayList<>(1));
                pins.set(r, new ArrayList<>(2));
            }
            members.get(r).add(i);
        }
        for (Gate g : nl.gates()) {
            if (g.stage() < 0) {
                continue;
            }
            for (int p = 0; p < g.arity(); p++) {
                pins.get(root[g.input(p)]).add(new Pin(false, g.id(), p));
            }
        }
        for (Latch l : nl.latches()) {
            if (l.stage() < 0) {
                continue;
            }
            pins.get(root[l.data()]).add(new Pin(true, l.id(), 0));
            if (l.enable() >= 0) {
                pins.get(root[l.enable()]).add(new Pin(true, l.id(), 1));
            }
        }
        List<Node> nodes = new ArrayList<>();
        org.thermion.model.NetLabels labels = new org.thermion.model.NetLabels(nl);
        int[] nodeOfRoot = new int[n];
        java.util.Arrays.fill(nodeOfRoot, -1);
        for (int r = 0; r < n; r++) {
            if (members.get(r) == null) {
                continue;
            }
            nodeOfRoot[r] = nodes.size();
            nodes.add(new Node(r, sourceName(nl, labels, members.get(r)), source[r], driver[r], members.get(r), pins.get(r)));
        }
        return new NetFanout(root, List.copyOf(nodes), nodeOfRoot);
    }

    /**
     * The first of the joined nets whose name the source wrote; when none was, the expression
     * that computes it and its file:line, never the elaborator's own name ("lu.$22").
     */
    static String sourceName(Netlist nl, org.thermion.model.NetLabels labels, List<Integer> nets) {
        for (int net : nets) {
            if (!generated(nl.netName(net))) {
                return nl.netName(net);
            }
        }
        return labels.label(nets.get(0));
    }

    /** True for a temporary the elaborator made up ("alu.$12"). */
    static boolean generated(String name) {
        return name.contains("$");
    }

    public List<Node> nodes() {
        return nodes;
    }

    /** The node net {@code net} belongs to. */
    public Node nodeOf(int net) {
        return nodes.get(nodeOfRoot[root[net]]);
    }
}
