package org.thermion.sim;

import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Netlist;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Writes a value change dump (IEEE 1364-2005 clause 18) of chosen nets on one lane: one
 * {@code $scope module} per module instance (the top scope is named after the machine), a bus
 * of a module (two or more dumped bits {@code name[k]} over one run of indices, all loaded alike)
 * as one vector {@code $var wire N id name [hi:lo]}, any other net as a one-bit
 * {@code $var wire}, and the program counter as a vector in the top scope.
 *
 * <p>Time follows the clock: the logic settles at the start of each phase and the latches
 * load at its end, so gate-driven nets change at phase starts and latch outputs at phase ends.
 */
public final class VcdWriter {
    private static final Pattern BUS_BIT = Pattern.compile("([A-Za-z_][A-Za-z0-9_]*)\\[(\\d+)]");
    private static final Pattern PLAIN = Pattern.compile("[A-Za-z_][A-Za-z0-9_$]*");

    /** One declared variable: its nets LSB first (one for a scalar), where it is and what it is called. */
    private record Var(String id, int[] nets, boolean latched, int module, String reference) {
    }

    private final Machine machine;
    private final Writer out;
    private final int lane;
    private final VcdTimebase time;
    private final List<Var> vars = new ArrayList<>();
    private final String[] last;
    private final boolean withPc;
    private final String pcId;
    private String lastPc;
    private long now = -1;

    /**
     * @param nets the nets to dump, in the order they are declared within their scopes
     * @param lane the lane whose values are dumped
     */
    public VcdWriter(Machine machine, List<Integer> nets, int lane, Writer out) {
        this.machine = machine;
        this.out = out;
        this.lane = lane;
        this.time = VcdTimebase.of(machine.clock());
        int[] dumped = nets.stream().distinct().filter(n -> n > Netlist.CONST1).mapToInt(Integer::intValue).toArray();
        BitSet latchNets = new BitSet();
        for (Latch l : machine.netlist().latches()) {
            latchNets.set(l.output());
        }
        declare(dumped, latchNets);
        this.last = new String[vars.size()];
        this.withPc = machine.pc() != null;
        this.pcId = identifier(vars.size());
    }

    /** Groups each module's bus bits into vectors where they form one run of indices; the rest stay bits. */
    private void declare(int[] dumped, BitSet latchNets) {
        int[] netModule = machine.netlist().netModule();
        Map<Integer, String> prefixes = new java.util.HashMap<>();
        for (ModuleInstance mod : machine.modules()) {
            prefixes.put(mod.id(), mod.path().isEmpty() ? "" : mod.path() + ".");
        }
        Map<String, TreeMap<Integer, Integer>> buses = new LinkedHashMap<>();
        List<Object> order = new ArrayList<>();
        for (int n : dumped) {
            String local = local(n, prefixes);
            Matcher mt = BUS_BIT.matcher(local);
            if (mt.matches()) {
                String key = netModule[n] + "/" + mt.group(1);
                TreeMap<Integer, Integer> bits = buses.get(key);
                if (bits == null) {
                    bits = new TreeMap<>();
                    buses.put(key, bits);
                    order.add(key);
                }
                bits.put(Integer.parseInt(mt.group(2)), n);
            } else {
                order.add(n);
            }
        }
        for (Object o : order) {
            if (o instanceof Integer n) {
                scalar(n, latchNets, netModule, prefixes);
                continue;
            }
            TreeMap<Integer, Integer> bits = buses.get((String) o);
            int lo = bits.firstKey();
            int hi = bits.lastKey();
            boolean latched = latchNets.get(bits.firstEntry().getValue());
            boolean alike = true;
            for (int n : bits.values()) {
                alike &= latchNets.get(n) == latched;
            }
            if (bits.size() < 2 || hi - lo + 1 != bits.size() || !alike) {
                bits.values().forEach(n -> scalar(n, latchNets, netModule, prefixes));
                continue;
            }
            int first = bits.firstEntry().getValue();
            String base = ((String) o).substring(((String) o).indexOf('/') + 1);
            int[] lsbFirst = bits.values().stream().mapToInt(Integer::intValue).toArray();
            vars.add(new Var(identifier(vars.size()), lsbFirst, latched, netModule[first],
                    base + " [" + hi + ":" + lo + "]"));
        }
    }

    private void scalar(int n, BitSet latchNets, int[] netModule, Map<Integer, String> prefixes) {
        vars.add(new Var(identifier(vars.size()), new int[] {n}, latchNets.get(n), netModule[n],
                reference(local(n, prefixes))));
    }

    /** The net's name within its module's scope ({@code prefixes}: each module's path and a dot, by id). */
    private String local(int net, Map<Integer, String> prefixes) {
        String name = machine.netlist().netName(net);
        String prefix = prefixes.getOrDefault(machine.netlist().netModule(net), "");
        return name.startsWith(prefix) ? name.substring(prefix.length()) : name;
    }

    /** The dump as a run observer on {@code sim}: header at the run's start, changes each phase, the end. */
    public org.thermion.sim.run.RunObserver observer(Simulator sim, String date, String version) {
        return new org.thermion.sim.run.RunObserver() {
            @Override
            public void begin(long cycle) {
                VcdWriter.this.begin(sim, date, version);
            }

            @Override
            public void phaseRan(long cycle, int phase) {
                // Before any second settle: the dump stamps gate values at the phase's start.
                afterPhase(sim, cycle, phase);
            }

            @Override
            public void end(long cycles, org.thermion.sim.run.Halt halt) {
                finish(cycles);
            }
        };
    }

    /** The nets {@code --vcd-all} dumps: every net except the constants and the elaborator's temporaries. */
    public static List<Integer> allNamedNets(Machine m) {
        List<Integer> all = new ArrayList<>();
        String[] names = m.netlist().netNames();
        for (int n = Netlist.CONST1 + 1; n < names.length; n++) {
            if (!NetLookup.temporary(names[n])) {
                all.add(n);
            }
        }
        return all;
    }

    /** A short identifier from the printable characters 33..126, unique per index. */
    static String identifier(int index) {
        StringBuilder sb = new StringBuilder();
        int n = index;
        do {
            sb.append((char) (33 + n % 94));
            n /= 94;
        } while (n > 0);
        return sb.toString();
    }

    /** Writes the header and the initial values ({@code $dumpvars} at time 0) from the simulator's present state. */
    public void begin(Simulator sim, String date, String version) {
        StringBuilder sb = new StringBuilder();
        sb.append("$date\n  ").append(date).append("\n$end\n");
        sb.append("$version\n  ").append(version).append("\n$end\n");
        sb.append("$timescale 1 ").append(time.unit()).append(" $end\n");
        List<ModuleInstance> mods = machine.modules();
        Tree tree = new Tree();
        for (ModuleInstance top : mods) {
            if (top.parent() < 0) {
                scope(sb, tree, top, machine.name(), top == firstTop(mods));
            }
        }
        sb.append("$enddefinitions $end\n");
        sb.append("#0\n$dumpvars\n");
        for (int i = 0; i < last.length; i++) {
            last[i] = value(sim, vars.get(i));
            sb.append(text(vars.get(i), last[i])).append('\n');
        }
        if (withPc) {
            lastPc = pcBits(sim);
            sb.append('b').append(lastPc).append(' ').append(pcId).append('\n');
        }
        sb.append("$end\n");
        now = 0;
        write(sb);
    }

    private static ModuleInstance firstTop(List<ModuleInstance> mods) {
        for (ModuleInstance m : mods) {
            if (m.parent() < 0) {
                return m;
            }
        }
        return null;
    }

    /** The module tree once: each module's variables and children, and whether anything is dumped under it. */
    private final class Tree {
        final Map<Integer, List<Var>> varsOf = new java.util.HashMap<>();
        final Map<Integer, List<ModuleInstance>> children = new java.util.HashMap<>();
        final java.util.Set<Integer> dumped = new java.util.HashSet<>();

        Tree() {
            for (Var v : vars) {
                varsOf.computeIfAbsent(v.module(), k -> new ArrayList<>()).add(v);
            }
            Map<Integer, Integer> parent = new java.util.HashMap<>();
            for (ModuleInstance m : machine.modules()) {
                children.computeIfAbsent(m.parent(), k -> new ArrayList<>()).add(m);
                parent.put(m.id(), m.parent());
            }
            for (Integer m : varsOf.keySet()) {
                // Mark the module and its ancestors; stop where a mark already stands.
                Integer p = m;
                while (p != null && p >= 0 && dumped.add(p)) {
                    p = parent.get(p);
                }
            }
        }
    }

    private void scope(StringBuilder sb, Tree tree, ModuleInstance mod, String name, boolean withPcHere) {
        if (!tree.dumped.contains(mod.id()) && !withPcHere) {
            return;
        }
        sb.append("$scope module ").append(name).append(" $end\n");
        for (Var v : tree.varsOf.getOrDefault(mod.id(), List.of())) {
            sb.append("$var wire ").append(v.nets().length).append(' ').append(v.id()).append(' ')
                    .append(v.reference()).append(" $end\n");
        }
        if (withPcHere && withPc) {
            sb.append("$var reg ").append(machine.pc().width()).append(' ').append(pcId).append(" pc [")
                    .append(machine.pc().width() - 1).append(":0] $end\n");
        }
        for (ModuleInstance child : tree.children.getOrDefault(mod.id(), List.of())) {
            scope(sb, tree, child, child.leaf(), false);
        }
        sb.append("$upscope $end\n");
    }

    /** A reference as IEEE 1364 writes it: {@code name}, {@code bus [3]}, or an escaped identifier. */
    static String reference(String local) {
        Matcher m = BUS_BIT.matcher(local);
        if (m.matches()) {
            return m.group(1) + " [" + m.group(2) + "]";
        }
        if (PLAIN.matcher(local).matches()) {
            return local;
        }
        return "\\" + local.replaceAll("\\s", "_");
    }

    private String pcBits(Simulator sim) {
        int w = machine.pc().width();
        if ((sim.pcUnknown() >>> lane & 1L) != 0) {
            return "x".repeat(w);
        }
        String s = Integer.toBinaryString(sim.pc(lane));
        return s.length() >= w ? s : "0".repeat(w - s.length()) + s;
    }

    /**
     * Records the state after phase {@code phase} of cycle {@code cycle} has run: gate-driven nets
     * at the phase's start, latch outputs and the PC at its end.
     */
    public void afterPhase(Simulator sim, long cycle, int phase) {
        StringBuilder sb = new StringBuilder();
        long start = time.phaseStart(cycle, phase);
        long end = time.phaseEnd(cycle, phase);
        for (int i = 0; i < last.length; i++) {
            if (!vars.get(i).latched()) {
                change(sb, i, sim, start);
            }
        }
        for (int i = 0; i < last.length; i++) {
            if (vars.get(i).latched()) {
                change(sb, i, sim, end);
            }
        }
        if (withPc) {
            String pc = pcBits(sim);
            if (!pc.equals(lastPc)) {
                stamp(sb, end);
                sb.append('b').append(pc).append(' ').append(pcId).append('\n');
                lastPc = pc;
            }
        }
        write(sb);
    }

    private void change(StringBuilder sb, int i, Simulator sim, long t) {
        String v = value(sim, vars.get(i));
        if (!v.equals(last[i])) {
            stamp(sb, t);
            sb.append(text(vars.get(i), v)).append('\n');
            last[i] = v;
        }
    }

    /** A variable's value: one level for a bit, the bits MSB first for a vector. */
    private String value(Simulator sim, Var v) {
        int[] nets = v.nets();
        if (nets.length == 1) {
            return String.valueOf(org.thermion.sim.run.LogicLane.level(sim, nets[0], lane));
        }
        char[] bits = new char[nets.length];
        for (int b = 0; b < nets.length; b++) {
            bits[nets.length - 1 - b] = org.thermion.sim.run.LogicLane.level(sim, nets[b], lane);
        }
        return new String(bits);
    }

    /** A value change as the dump writes it: {@code 1!} for a bit, {@code b0101 !} for a vector. */
    private static String text(Var v, String value) {
        return v.nets().length == 1 ? value + v.id() : "b" + value + " " + v.id();
    }

    private void stamp(StringBuilder sb, long t) {
        if (t != now) {
            if (t < now) {
                throw new IllegalStateException("VCD time would go back from " + now + " to " + t);
            }
            sb.append('#').append(t).append('\n');
            now = t;
        }
    }

    /** Ends the dump at the end of cycle {@code cycles - 1}, so the last values have a duration. */
    public void finish(long cycles) {
        StringBuilder sb = new StringBuilder();
        stamp(sb, Math.max(now, time.phaseStart(cycles, 1)));
        write(sb);
        try {
            out.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void write(StringBuilder sb) {
        try {
            out.write(sb.toString());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
