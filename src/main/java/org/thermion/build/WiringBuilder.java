package org.thermion.build;

import org.thermion.model.BasePin;
import org.thermion.model.Basing;
import org.thermion.model.Electrode;
import org.thermion.model.Envelope;
import org.thermion.model.Machine;
import org.thermion.model.SoftStart;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Collects parts, nodes and socket pins while the stages, heaters and machine connections are
 * wired ({@link StageWiring}, {@link HeaterWiring}, {@link WireList}). Nodes are found by a key:
 * {@code net:N}, {@code rail:NAME} or a local name; a node is created on first use.
 */
final class WiringBuilder {
    final Machine m;
    final Boards boards;
    final List<Part> parts = new ArrayList<>();
    final List<String> problems = new ArrayList<>();
    final Aliases aliases;
    private final Map<String, Integer> nodeIndex = new HashMap<>();
    private final List<String> nodeNames = new ArrayList<>();
    private final List<Node.Kind> kinds = new ArrayList<>();
    private final List<Integer> nets = new ArrayList<>();
    private final List<List<Lead>> leads = new ArrayList<>();
    private final Map<Integer, Integer> stageOf = new HashMap<>();
    private final Map<Integer, String> pointOf = new HashMap<>();
    private final String[] socketRef;
    private final String[] tubeRef;
    private final int[][] socketNodes;
    private final List<Set<Integer>> doubts = new ArrayList<>();
    private final Set<String> missingBasing = new java.util.TreeSet<>();

    /** The module instance of the stage being wired (-1: none), for {@link #rail}. */
    int module = -1;

    private final Set<String> roles = new java.util.HashSet<>();
    private final List<Wiring.Placement> placements = new ArrayList<>();

    WiringBuilder(Machine m, Designations designations) {
        this.m = m;
        this.boards = new Boards(m, designations);
        this.aliases = new Aliases(m.netlist());
        int n = m.envelopes().size();
        socketRef = new String[n];
        tubeRef = new String[n];
        socketNodes = new int[n][];
        for (Envelope e : m.envelopes()) {
            if (e.pinned() && e.designator().matches("V[0-9]{1,6}")) {
                boards.reserve(boards.of(e.module()), "V", Integer.parseInt(e.designator().substring(1)));
            }
        }
        String[] roleOf = new String[n];
        String[] refOf = new String[n];
        for (Envelope e : m.envelopes()) {
            int board = boards.of(e.module());
            roleOf[e.id()] = role("tube " + m.tubes().get(e.tube()).name() + " for " + holds(e));
            refOf[e.id()] = e.pinned() ? boards.prefix(board) + e.designator()
                    : boards.fromFile(board, PartClass.TUBE, designations.byRole().get(roleOf[e.id()]));
        }
        // a tube whose stages changed keeps the designator of the recorded tube it shares most stages with
        for (Envelope e : m.envelopes()) {
            if (refOf[e.id()] == null) {
                refOf[e.id()] = boards.closestTube(boards.of(e.module()), roleOf[e.id()]);
            }
        }
        for (Envelope e : m.envelopes()) {
            TubeType t = m.tubes().get(e.tube());
            int board = boards.of(e.module());
            String role = roleOf[e.id()];
            String prefix = boards.prefix(board);
            String name = (refOf[e.id()] != null ? refOf[e.id()] : boards.next(board, PartClass.TUBE)).substring(prefix.length());
            tubeRef[e.id()] = prefix + name;
            socketRef[e.id()] = prefix + "X" + name;
            Basing b = t.basing();
            socketNodes[e.id()] = new int[b == null ? 0 : b.pinCount()];
            Arrays.fill(socketNodes[e.id()], -1);
            doubts.add(t.doubtfulPins());
            parts.add(new Part(tubeRef[e.id()], PartClass.TUBE, Double.NaN, t.name(), board, role, Double.NaN, -1));
            parts.add(new Part(socketRef[e.id()], PartClass.SOCKET, Double.NaN, b == null ? "base unknown" : b.base(), board,
                    "socket of " + tubeRef[e.id()], Double.NaN, -1));
            if (b == null) {
                missingBasing.add(t.name());
            }
        }
        for (String t : missingBasing) {
            problems.add("tube " + t + " has no basing data: its pins are shown as '?'; add a `basing` line to its tube block");
        }
    }

    /** The stage instances in an envelope's sections, by their output nets (else its module, or "spare sections"). */
    private String holds(Envelope e) {
        java.util.SortedSet<String> names = new java.util.TreeSet<>();
        for (Envelope.Slot s : e.slots()) {
            if (s.index() >= 0) {
                int out = s.latch() ? m.netlist().latches().get(s.index()).output() : m.netlist().gates().get(s.index()).output();
                names.add(m.netlist().netName(out));
            }
        }
        if (names.isEmpty()) {
            // a block built outside the logic (program counter, ROM decoding, clock) has no gates in its sections
            String path = m.modules().get(e.module()).path();
            return path.isEmpty() ? "spare sections" : "the stages of " + path;
        }
        return String.join(", ", names);
    }

    /** {@code role}, made unique among the parts (a part's role is its key in the designations file). */
    String role(String role) {
        String r = role;
        for (int k = 2; !roles.add(r); k++) {
            r = role + " (" + k + ")";
        }
        return r;
    }

    String tubeRef(int env) {
        return tubeRef[env];
    }

    /** The node for a logic net. */
    int net(int net) {
        int r = aliases.of(net);
        return node("net:" + r, m.netlist().netName(r), Node.Kind.NET, r);
    }

    /**
     * The node for a rail (ground included) as the stage being wired ({@link #module}) meets it:
     * behind a soft start's resistor where that soft start covers the module, else the supply.
     */
    int rail(String name) {
        SoftStart s = module < 0 ? null : SoftStartWiring.covering(m, name, module);
        return s != null ? behind(s) : supply(name);
    }

    /** The node of a rail where its supply comes in, ahead of any soft start. */
    int supply(String name) {
        return node("rail:" + name, name, Node.Kind.RAIL, -1);
    }

    /** The node behind soft start {@code s}'s resistor: what it covers hangs there. */
    int behind(SoftStart s) {
        String name = behindName(s, m.rails().get(s.rail()).name());
        return node("rail:" + name, name, Node.Kind.RAIL, -1);
    }

    /** The name of the node behind a soft start's resistor on rail {@code rail}. */
    static String behindName(SoftStart s, String rail) {
        return rail + " behind " + s.name();
    }

    /** A node's name. */
    String name(int node) {
        return nodeNames.get(node);
    }

    /** A node inside one stage or heater string, named for people. */
    int local(String name, Node.Kind kind) {
        return node("local:" + name, name, kind, -1);
    }

    /** A node inside stage instance {@code stage} ({@link StageKey}): node {@code point} of its circuit. */
    int stageLocal(int stage, String name, String point) {
        int n = local(name + "/" + point, Node.Kind.LOCAL);
        stageOf.put(n, stage);
        pointOf.put(n, point);
        return n;
    }

    private int node(String key, String name, Node.Kind kind, int net) {
        Integer i = nodeIndex.get(key);
        if (i != null) {
            return i;
        }
        nodeIndex.put(key, nodeNames.size());
        nodeNames.add(name);
        kinds.add(kind);
        nets.add(net);
        leads.add(new ArrayList<>());
        return nodeNames.size() - 1;
    }

    void connect(int node, Lead lead) {
        leads.get(node).add(lead);
    }

    /** A two-lead part between nodes {@code a} and {@code b}; returns its designator. */
    String twoLead(PartClass cls, double ohms, String type, int board, String role, double watts, int owner, int a, int b) {
        return twoLead(cls, ohms, type, board, role, watts, Double.NaN, owner, a, b);
    }

    /** As {@link #twoLead(PartClass, double, String, int, String, double, int, int, int)}, with a declared rating. */
    String twoLead(PartClass cls, double ohms, String type, int board, String role, double watts, double declaredWatts,
                   int owner, int a, int b) {
        String key = role(role);
        String ref = boards.designate(board, cls, key);
        parts.add(new Part(ref, cls, ohms, type, board, key, watts, owner, declaredWatts));
        connect(a, new Lead(ref, "1", "end 1", false));
        connect(b, new Lead(ref, "2", "end 2", false));
        return ref;
    }

    /** A part with named leads, each to its node; returns its designator. */
    String multiLead(PartClass cls, String type, int board, String role, int owner, String[] pins, int[] nodes) {
        return multiLead(cls, Double.NaN, type, board, role, owner, pins, nodes);
    }

    /** As {@link #multiLead(PartClass, String, int, String, int, String[], int[])}, with a value in ohms (a relay's coil). */
    String multiLead(PartClass cls, double ohms, String type, int board, String role, int owner, String[] pins, int[] nodes) {
        String key = role(role);
        String ref = boards.designate(board, cls, key);
        parts.add(new Part(ref, cls, ohms, type, board, key, Double.NaN, owner));
        for (int i = 0; i < pins.length; i++) {
            connect(nodes[i], new Lead(ref, pins[i], pins[i], false));
        }
        return ref;
    }

    /** Wires every pin of envelope {@code env} that carries {@code e} of {@code section} (0: the tube's) to {@code node}. */
    void pin(int env, int section, Electrode e, int node) {
        Envelope en = m.envelopes().get(env);
        TubeType t = m.tubes().get(en.tube());
        Basing b = t.basing();
        String what = e.perSection() ? e.word() + "." + section : e.word();
        if (b == null) {
            connect(node, new Lead(socketRef[env], "?", what, false));
            return;
        }
        List<Integer> pins = b.pinsFor(e, e.perSection() ? section : 0);
        for (int p : pins) {
            connect(node, new Lead(socketRef[env], String.valueOf(p), what, doubts.get(env).contains(p)));
            if (socketNodes[env][p - 1] < 0) {
                socketNodes[env][p - 1] = node;
            }
        }
    }

    /** Wires pin {@code pin} of envelope {@code env} (known to carry {@code what}) to {@code node}. */
    void pinNumber(int env, int pin, String what, int node) {
        connect(node, new Lead(socketRef[env], String.valueOf(pin), what, doubts.get(env).contains(pin)));
        if (socketNodes[env][pin - 1] < 0) {
            socketNodes[env][pin - 1] = node;
        }
    }

    /** Records the tube sections ({envelope, section}) stage instance {@code name} is wired in. */
    void place(String name, List<int[]> sections) {
        List<String> at = new ArrayList<>(sections.size());
        for (int[] s : sections) {
            at.add(tubeRef[s[0]] + "." + s[1]);
        }
        placements.add(new Wiring.Placement(name, at));
    }

    String socketRef(int env) {
        return socketRef[env];
    }

    /** True when the envelope's basing has {@code e} for the section (suppressor, shield: not every tube has one). */
    boolean has(int env, int section, Electrode e) {
        Basing b = m.tubes().get(m.envelopes().get(env).tube()).basing();
        return b != null && !b.pinsFor(e, e.perSection() ? section : 0).isEmpty();
    }

    Wiring build() {
        List<Node> nodes = new ArrayList<>(nodeNames.size());
        for (int i = 0; i < nodeNames.size(); i++) {
            nodes.add(new Node(nodeNames.get(i), kinds.get(i), nets.get(i), leads.get(i), stageOf.getOrDefault(i, -1),
                    pointOf.get(i)));
        }
        List<Wiring.Socket> sockets = new ArrayList<>();
        for (Envelope e : m.envelopes()) {
            TubeType t = m.tubes().get(e.tube());
            Basing b = t.basing();
            List<String> electrodes = new ArrayList<>();
            boolean[] doubtful = new boolean[socketNodes[e.id()].length];
            if (b != null) {
                for (int p = 1; p <= b.pinCount(); p++) {
                    BasePin bp = b.at(p);
                    electrodes.add(bp == null ? "?" : bp.label());
                    doubtful[p - 1] = doubts.get(e.id()).contains(p);
                }
            }
            sockets.add(new Wiring.Socket(e.id(), socketRef[e.id()], tubeRef[e.id()], t.name(), b == null ? "?" : b.base(),
                    boards.of(e.module()), electrodes, socketNodes[e.id()], doubtful));
        }
        return new Wiring(boards.names(), parts, nodes, sockets, problems, placements);
    }
}
