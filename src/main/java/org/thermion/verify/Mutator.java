package org.thermion.verify;

import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Seeds single faults into copies of a machine's netlist: a gate's function swapped (AND and
 * OR, NAND and NOR, XOR to OR, NOT and BUF), a gate or latch input inverted (a free inverter
 * inserted), or an input wired to the neighbouring bit of its bus ({@code x[k]} to
 * {@code x[k-1]} or {@code x[k+1]}, when that net is ready before the gate is evaluated).
 * The original machine is never changed: each mutant is a new Machine with a new Netlist.
 */
public final class Mutator {
    private static final Pattern BUS_BIT = Pattern.compile("^(.*)\\[(\\d+)\\]$");

    private final Machine machine;
    private final Netlist nl;
    private final int[] driverGate;
    private final Map<String, Integer> byName = new HashMap<>();

    public Mutator(Machine machine) {
        this.machine = machine;
        this.nl = machine.netlist();
        driverGate = new int[nl.netCount()];
        Arrays.fill(driverGate, -1);
        for (Gate g : nl.gates()) {
            driverGate[g.output()] = g.id();
        }
        for (int n = 0; n < nl.netCount(); n++) {
            byName.put(nl.netName(n), n);
        }
    }

    /** Every fault this mutator can seed, in a fixed order. */
    public List<SeededFault> sites() {
        List<SeededFault> all = new ArrayList<>();
        for (Gate g : nl.gates()) {
            GateFn to = swapped(g.fn());
            if (to != null) {
                all.add(new SeededFault.SwapFunction(g.id(), g.fn(), to));
            }
            for (int pin = 0; pin < g.arity(); pin++) {
                int in = g.input(pin);
                if (in <= Netlist.CONST1) {
                    continue;
                }
                all.add(new SeededFault.InvertInput(g.id(), pin));
                for (int nb : neighbours(in)) {
                    if (driverGate[nb] < g.id()) {
                        all.add(new SeededFault.MoveWire(g.id(), pin, in, nb));
                    }
                }
            }
        }
        for (Latch l : nl.latches()) {
            if (l.data() <= Netlist.CONST1) {
                continue;
            }
            all.add(new SeededFault.InvertLatchData(l.id()));
            for (int nb : neighbours(l.data())) {
                all.add(new SeededFault.MoveLatchData(l.id(), l.data(), nb));
            }
        }
        return all;
    }

    /** {@code n} distinct faults chosen with a seeded shuffle (all of them when there are fewer). */
    public List<SeededFault> choose(int n, long seed) {
        List<SeededFault> all = new ArrayList<>(sites());
        Collections.shuffle(all, new Random(seed));
        return List.copyOf(all.subList(0, Math.min(n, all.size())));
    }

    private static GateFn swapped(GateFn fn) {
        return switch (fn) {
            case AND -> GateFn.OR;
            case OR -> GateFn.AND;
            case NAND -> GateFn.NOR;
            case NOR -> GateFn.NAND;
            case XOR -> GateFn.OR;
            case NOT -> GateFn.BUF;
            case BUF -> GateFn.NOT;
        };
    }

    private List<Integer> neighbours(int net) {
        Matcher m = BUS_BIT.matcher(nl.netName(net));
        List<Integer> out = new ArrayList<>();
        if (!m.matches()) {
            return out;
        }
        int k = Integer.parseInt(m.group(2));
        for (int d : new int[]{-1, 1}) {
            Integer nb = byName.get(m.group(1) + "[" + (k + d) + "]");
            if (nb != null && nb > Netlist.CONST1) {
                out.add(nb);
            }
        }
        return out;
    }

    /** What the fault does, in net names. */
    public String describe(SeededFault f) {
        if (f instanceof SeededFault.SwapFunction s) {
            return "gate driving " + nl.netName(nl.gates().get(s.gate()).output()) + ": " + s.from() + " -> " + s.to();
        }
        if (f instanceof SeededFault.InvertInput i) {
            Gate g = nl.gates().get(i.gate());
            return "gate driving " + nl.netName(g.output()) + ": input " + nl.netName(g.input(i.pin())) + " inverted";
        }
        if (f instanceof SeededFault.MoveWire w) {
            Gate g = nl.gates().get(w.gate());
            return "gate driving " + nl.netName(g.output()) + ": input " + nl.netName(w.from()) + " wired to "
                    + nl.netName(w.to());
        }
        if (f instanceof SeededFault.InvertLatchData i) {
            Latch l = nl.latches().get(i.latch());
            return "latch " + nl.netName(l.output()) + ": data " + nl.netName(l.data()) + " inverted";
        }
        SeededFault.MoveLatchData w = (SeededFault.MoveLatchData) f;
        Latch l = nl.latches().get(w.latch());
        return "latch " + nl.netName(l.output()) + ": data " + nl.netName(w.from()) + " wired to " + nl.netName(w.to());
    }

    /** The net whose value the fault changes first: the faulty gate's or latch's output. */
    public int site(SeededFault f) {
        if (f instanceof SeededFault.SwapFunction s) {
            return nl.gates().get(s.gate()).output();
        }
        if (f instanceof SeededFault.InvertInput i) {
            return nl.gates().get(i.gate()).output();
        }
        if (f instanceof SeededFault.MoveWire w) {
            return nl.gates().get(w.gate()).output();
        }
        if (f instanceof SeededFault.InvertLatchData i) {
            return nl.latches().get(i.latch()).output();
        }
        return nl.latches().get(((SeededFault.MoveLatchData) f).latch()).output();
    }

    /** A copy of the machine with the fault in its netlist; the original nets keep their numbers. */
    public Machine apply(SeededFault f) {
        List<String> names = new ArrayList<>(Arrays.asList(nl.netNames()));
        List<Integer> modules = new ArrayList<>();
        for (int m : nl.netModule()) {
            modules.add(m);
        }
        List<Gate> gates = new ArrayList<>(nl.gates());
        List<Latch> latches = new ArrayList<>(nl.latches());
        List<Integer> envelope = new ArrayList<>();
        for (int e : machine.gateEnvelope()) {
            envelope.add(e);
        }
        if (f instanceof SeededFault.SwapFunction s) {
            Gate g = gates.get(s.gate());
            gates.set(s.gate(), new Gate(g.id(), s.to(), g.inputs(), g.output(), g.stage(), g.module()));
        } else if (f instanceof SeededFault.InvertInput i) {
            Gate g = gates.get(i.gate());
            int inv = addNet(names, modules, nl.netName(g.input(i.pin())) + "~", g.module());
            int[] ins = g.inputs().clone();
            Gate not = new Gate(-1, GateFn.NOT, new int[]{ins[i.pin()]}, inv, -1, g.module());
            ins[i.pin()] = inv;
            gates.set(i.gate(), new Gate(g.id(), g.fn(), ins, g.output(), g.stage(), g.module()));
            gates.add(i.gate(), not);
            envelope.add(Math.min(i.gate(), envelope.size()), -1);
        } else if (f instanceof SeededFault.MoveWire w) {
            Gate g = gates.get(w.gate());
            int[] ins = g.inputs().clone();
            ins[w.pin()] = w.to();
            gates.set(w.gate(), new Gate(g.id(), g.fn(), ins, g.output(), g.stage(), g.module()));
        } else if (f instanceof SeededFault.InvertLatchData i) {
            Latch l = latches.get(i.latch());
            int inv = addNet(names, modules, nl.netName(l.data()) + "~", l.module());
            gates.add(new Gate(-1, GateFn.NOT, new int[]{l.data()}, inv, -1, l.module()));
            envelope.add(-1);
            latches.set(i.latch(), new Latch(l.id(), inv, l.enable(), l.output(), l.phase(), l.stage(), l.module()));
        } else if (f instanceof SeededFault.MoveLatchData w) {
            Latch l = latches.get(w.latch());
            latches.set(w.latch(), new Latch(l.id(), w.to(), l.enable(), l.output(), l.phase(), l.stage(), l.module()));
        }
        List<Gate> renumbered = new ArrayList<>();
        for (int i = 0; i < gates.size(); i++) {
            Gate g = gates.get(i);
            renumbered.add(new Gate(i, g.fn(), g.inputs(), g.output(), g.stage(), g.module()));
        }
        Netlist mutated = new Netlist(names.toArray(new String[0]), modules.stream().mapToInt(Integer::intValue).toArray(),
                List.copyOf(renumbered), List.copyOf(latches));
        Machine m = machine;
        return new Machine(m.name(), m.clock(), m.tubes(), m.stages(), m.rails(), m.heaterRules(), m.softStarts(),
                m.modules(), mutated, m.rom(), m.pc(), m.inputs(), m.outputs(), m.envelopes(), m.heaterStrings(), m.isa(),
                envelope.stream().mapToInt(Integer::intValue).toArray(), m.latchEnvelope(), m.built(), m.radixes());
    }

    private static int addNet(List<String> names, List<Integer> modules, String name, int module) {
        names.add(name);
        modules.add(module);
        return names.size() - 1;
    }
}
