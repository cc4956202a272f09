package org.thermion.faults;

import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Isa;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.model.Port;
import org.thermion.model.StageFunction;
import org.thermion.model.StateBit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The machine's netlist flattened for fault simulation: one value slot per wire (each net's
 * stem, and one slot per reading pin where a net fans out), and one flat program of
 * operations over the slots in levelized order. A fault is a set of slots forced to a value,
 * so faults on stems and on fan-out branches are simulated alike.
 *
 * <p>Program layout: {@code code} holds operations {@code [op, out, n, in_1 .. in_n]}; the
 * copies that feed the branches of inputs, ROM data lines and latch outputs come first, each
 * gate is followed by the copies into its own branches.
 */
public final class FaultCircuit {
    static final int AND = 0;
    static final int OR = 1;
    static final int NAND = 2;
    static final int NOR = 3;
    static final int XOR = 4;
    static final int NOT = 5;
    static final int COPY = 6;

    final Machine machine;
    final int slotCount;
    final int[] code;
    /** Slots that are not computed by the program: inputs, ROM data lines, latch outputs. */
    final int[] sourceSlots;
    final int[] inputSlots;
    final int[] romSlots;
    final int phases;
    /** Per phase (0-based): the latches that load on it, their data/enable pins and outputs. */
    final int[][] latchIndex;
    final int[][] latchData;
    final int[][] latchEnable;
    final int[][] latchOut;
    final boolean hasPc;
    final int pcPhase;
    final int pcWidth;
    final int pcJump;
    final int[] pcTarget;
    final int[] allLatchOut;
    private final List<Site> sites;
    private final List<ObservedLamp> lamps;
    /** Per gate (netlist order): the slot each input pin reads. */
    private final int[][] gatePins;

    private FaultCircuit(Machine machine, Map<String, Integer> lampNets) {
        this.machine = machine;
        Netlist nl = machine.netlist();
        int nets = nl.netCount();
        List<Gate> gates = nl.gates();
        List<Latch> latches = nl.latches();
        int[] readers = new int[nets];
        for (Gate g : gates) {
            for (int in : g.inputs()) {
                readers[in]++;
            }
        }
        for (Latch l : latches) {
            readers[l.data()]++;
            if (l.enable() >= 0) {
                readers[l.enable()]++;
            }
        }
        hasPc = machine.pc() != null;
        if (hasPc) {
            readers[machine.pc().jumpNet()]++;
            for (int t : machine.pc().targetNets()) {
                readers[t]++;
            }
        }
        for (int net : lampNets.values()) {
            readers[net]++;
        }

        // Stems first: slot = net.
        List<Site> s = new ArrayList<>(nets * 2);
        Site.Place[] stemPlace = new Site.Place[nets];
        int[] stemIndex = new int[nets];
        Arrays.fill(stemPlace, Site.Place.GATE_OUT);
        stemPlace[Netlist.CONST0] = Site.Place.CONSTANT;
        stemPlace[Netlist.CONST1] = Site.Place.CONSTANT;
        List<Port> ins = machine.inputs();
        for (int i = 0; i < ins.size(); i++) {
            stemPlace[ins.get(i).net()] = Site.Place.INPUT;
            stemIndex[ins.get(i).net()] = i;
        }
        int[] rom = machine.rom() == null ? new int[0] : machine.rom().dataNets();
        for (int b = 0; b < rom.length; b++) {
            stemPlace[rom[b]] = Site.Place.ROM;
            stemIndex[rom[b]] = b;
        }
        for (int i = 0; i < latches.size(); i++) {
            stemPlace[latches.get(i).output()] = Site.Place.LATCH_OUT;
            stemIndex[latches.get(i).output()] = i;
        }
        for (int i = 0; i < gates.size(); i++) {
            stemIndex[gates.get(i).output()] = i;
        }
        for (int n = 0; n < nets; n++) {
            s.add(new Site(n, n, stemPlace[n], stemIndex[n], 0));
        }
        this.sites = s;

        // Branches, and the copies that feed them, grouped by the net they copy.
        List<List<Integer>> branchesOf = new ArrayList<>(nets);
        for (int n = 0; n < nets; n++) {
            branchesOf.add(null);
        }
        gatePins = new int[gates.size()][];
        for (int i = 0; i < gates.size(); i++) {
            int[] in = gates.get(i).inputs();
            gatePins[i] = new int[in.length];
            for (int k = 0; k < in.length; k++) {
                gatePins[i][k] = pin(in[k], readers, branchesOf, Site.Place.GATE_IN, i, k);
            }
        }
        phases = machine.clock().phases();
        int[] perPhase = new int[phases];
        for (Latch l : latches) {
            perPhase[l.phase() - 1]++;
        }
        latchIndex = new int[phases][];
        latchData = new int[phases][];
        latchEnable = new int[phases][];
        latchOut = new int[phases][];
        for (int p = 0; p < phases; p++) {
            latchIndex[p] = new int[perPhase[p]];
            latchData[p] = new int[perPhase[p]];
            latchEnable[p] = new int[perPhase[p]];
            latchOut[p] = new int[perPhase[p]];
        }
        int[] fill = new int[phases];
        allLatchOut = new int[latches.size()];
        for (int i = 0; i < latches.size(); i++) {
            Latch l = latches.get(i);
            int p = l.phase() - 1;
            int k = fill[p]++;
            latchIndex[p][k] = i;
            latchData[p][k] = pin(l.data(), readers, branchesOf, Site.Place.LATCH_DATA, i, 0);
            latchEnable[p][k] = l.enable() < 0 ? -1
                    : pin(l.enable(), readers, branchesOf, Site.Place.LATCH_ENABLE, i, 0);
            latchOut[p][k] = l.output();
            allLatchOut[i] = l.output();
        }
        if (hasPc) {
            pcPhase = machine.pc().phase();
            pcWidth = machine.pc().width();
            pcJump = pin(machine.pc().jumpNet(), readers, branchesOf, Site.Place.PC_JUMP, 0, 0);
            int[] t = machine.pc().targetNets();
            pcTarget = new int[t.length];
            for (int b = 0; b < t.length; b++) {
                pcTarget[b] = pin(t[b], readers, branchesOf, Site.Place.PC_TARGET, 0, b);
            }
        } else {
            pcPhase = 0;
            pcWidth = 0;
            pcJump = -1;
            pcTarget = new int[0];
        }
        List<ObservedLamp> lampList = new ArrayList<>();
        int li = 0;
        for (Map.Entry<String, Integer> e : lampNets.entrySet()) {
            int slot = pin(e.getValue(), readers, branchesOf, Site.Place.LAMP, li++, 0);
            lampList.add(new ObservedLamp(e.getKey(), e.getValue(), slot, ""));
        }
        this.lamps = List.copyOf(lampList);
        slotCount = s.size();

        inputSlots = ins.stream().mapToInt(Port::net).toArray();
        romSlots = rom.clone();
        int[] src = new int[inputSlots.length + romSlots.length + allLatchOut.length];
        System.arraycopy(inputSlots, 0, src, 0, inputSlots.length);
        System.arraycopy(romSlots, 0, src, inputSlots.length, romSlots.length);
        System.arraycopy(allLatchOut, 0, src, inputSlots.length + romSlots.length, allLatchOut.length);
        sourceSlots = src;

        Ops c = new Ops();
        for (int n : src) {
            c.copies(n, branchesOf);
        }
        for (int i = 0; i < gates.size(); i++) {
            Gate g = gates.get(i);
            int[] pins = gatePins[i];
            c.add(opOf(g.fn()));
            c.add(g.output());
            c.add(pins.length);
            for (int p : pins) {
                c.add(p);
            }
            c.copies(g.output(), branchesOf);
        }
        code = Arrays.copyOf(c.a, c.n);
    }

    /** The circuit with the default lamps: see {@link #defaultLamps}. */
    public static FaultCircuit of(Machine machine) {
        return new FaultCircuit(machine, defaultLamps(machine));
    }

    /** The circuit with the given lamps, name to net, in the order given. */
    public static FaultCircuit of(Machine machine, Map<String, Integer> lamps) {
        return new FaultCircuit(machine, new LinkedHashMap<>(lamps));
    }

    /**
     * What a builder sees without declaring anything: the machine's outputs, its ISA state
     * bits, and every lamp and relay stage (a relay's armature is visible). One lamp per net.
     */
    public static Map<String, Integer> defaultLamps(Machine m) {
        Map<String, Integer> byName = new LinkedHashMap<>();
        java.util.Set<Integer> seen = new java.util.HashSet<>();
        for (Port p : m.outputs()) {
            if (seen.add(p.net())) {
                byName.put(p.name(), p.net());
            }
        }
        Isa isa = m.isa();
        if (isa != null) {
            for (StateBit b : isa.state()) {
                if (seen.add(b.net())) {
                    byName.put(b.name(), b.net());
                }
            }
        }
        for (Gate g : m.netlist().gates()) {
            if (g.stage() >= 0) {
                StageFunction f = m.stages().get(g.stage()).function();
                if (f.isDriver() && seen.add(g.output())) {
                    byName.put(m.netlist().netName(g.output()), g.output());
                }
            }
        }
        return byName;
    }

    private int pin(int net, int[] readers, List<List<Integer>> branchesOf, Site.Place place, int index, int pin) {
        if (readers[net] < 2 || net == Netlist.CONST0 || net == Netlist.CONST1) {
            return net;
        }
        int slot = sites.size();
        sites.add(new Site(slot, net, place, index, pin));
        if (branchesOf.get(net) == null) {
            branchesOf.set(net, new ArrayList<>(readers[net]));
        }
        branchesOf.get(net).add(slot);
        return slot;
    }

    /** A growing operation buffer. */
    private static final class Ops {
        int[] a = new int[256];
        int n;

        void add(int v) {
            if (n == a.length) {
                a = Arrays.copyOf(a, n * 2);
            }
            a[n++] = v;
        }

        void copies(int net, List<List<Integer>> branchesOf) {
            List<Integer> b = branchesOf.get(net);
            if (b != null) {
                for (int slot : b) {
                    add(COPY);
                    add(slot);
                    add(1);
                    add(net);
                }
            }
        }
    }

    private static int opOf(GateFn fn) {
        switch (fn) {
            case AND: return AND;
            case OR: return OR;
            case NAND: return NAND;
            case NOR: return NOR;
            case XOR: return XOR;
            case NOT: return NOT;
            default: return COPY;
        }
    }

    public Machine machine() {
        return machine;
    }

    /** Every slot's wire, slot order (stems are slots 0 .. nets-1). */
    public List<Site> sites() {
        return sites;
    }

    public List<ObservedLamp> lamps() {
        return lamps;
    }

    public int slotCount() {
        return slotCount;
    }

    /** The slot gate {@code gate} (netlist order) reads on input pin {@code pin}. */
    public int gatePin(int gate, int pin) {
        return gatePins[gate][pin];
    }

    /** Number of operations in the flat program (gates and branch copies). */
    public int operations() {
        int n = 0;
        for (int at = 0; at < code.length; at += 3 + code[at + 2]) {
            n++;
        }
        return n;
    }

    public int inputCount() {
        return inputSlots.length;
    }
}
