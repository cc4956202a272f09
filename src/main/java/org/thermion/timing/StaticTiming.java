package org.thermion.timing;

import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Netlist;
import org.thermion.model.Port;
import org.thermion.model.ProgramCounter;
import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Static timing of a multi-phase machine.
 *
 * <p>Latches load at the end of their phase, so a latch's output changes at the end of
 * phase p, one latch delay later (the slower of its rise and fall, since either plate of a
 * flip-flop may be the one rising). Machine inputs are taken to change between cycles (at the
 * end of the last phase); the off-board ROM's data change when the program counter loads
 * (the end of {@code pc.phase()}), after the ROM access time given (0 by default). A change launched at the
 * end of phase p runs through the combinational gates, each gate adding its rise or fall
 * delay according to the edge its output makes (inverting gates turn a falling input into
 * a rising output), and must reach every latch that loads on phase q - data and enable - a
 * set-up time before the end of phase q: span = ((q - p - 1) mod N) + 1 phase widths later
 * (a latch feeding a latch of its own phase has a whole cycle). The program counter's jump
 * and target inputs are endpoints of its load phase with no set-up time.</p>
 */
public final class StaticTiming {
    private static final double NONE = Double.NEGATIVE_INFINITY;
    private static final int RISE = 0;
    private static final int FALL = 1;

    private final Machine machine;
    private final Netlist netlist;
    private final StageDelay[] gateDelay;
    private final StageDelay[] latchDelay;
    private final int[] driverGate;
    private final int[] driverLatch;
    private final int[] driverInput;
    private final boolean[] romData;
    private final double romAccess;

    public StaticTiming(Machine machine) {
        this(machine, 0);
    }

    /** {@code romAccessSeconds}: time from the PC loading until the off-board ROM's data are valid. */
    public StaticTiming(Machine machine, double romAccessSeconds) {
        this(machine, romAccessSeconds, new DelayCalculator(machine));
    }

    /** With the stage delays of {@code calc} (nominal or at the slow corner). */
    public StaticTiming(Machine machine, double romAccessSeconds, DelayCalculator calc) {
        this.machine = machine;
        this.romAccess = romAccessSeconds;
        this.netlist = machine.netlist();
        gateDelay = calc.gates();
        latchDelay = calc.latches();
        int n = netlist.netCount();
        driverGate = fill(n);
        driverLatch = fill(n);
        driverInput = fill(n);
        romData = new boolean[n];
        for (Gate g : netlist.gates()) {
            driverGate[g.output()] = g.id();
        }
        for (Latch l : netlist.latches()) {
            driverLatch[l.output()] = l.id();
        }
        for (int i = 0; i < machine.inputs().size(); i++) {
            driverInput[machine.inputs().get(i).net()] = i;
        }
        if (machine.rom() != null) {
            for (int d : machine.rom().dataNets()) {
                romData[d] = true;
            }
        }
    }

    private static int[] fill(int n) {
        int[] a = new int[n];
        java.util.Arrays.fill(a, -1);
        return a;
    }

    /** Analyses the machine at its own clock period. */
    public TimingReport analyse() {
        return analyse(machine.clock().periodSeconds());
    }

    /** Analyses the machine at clock period {@code period} seconds. */
    public TimingReport analyse(double period) {
        int phases = Math.max(1, machine.clock().phases());
        double width = period / phases;
        PhaseTiming[] worst = new PhaseTiming[phases];
        PhaseTiming critical = null;
        double criticalPeriod = 0;
        for (int launch = 1; launch <= phases; launch++) {
            Propagation p = propagate(launch, phases);
            for (Endpoint e : endpoints()) {
                double arrival = Math.max(p.arr[RISE][e.net], p.arr[FALL][e.net]);
                if (arrival == NONE) {
                    continue;
                }
                int span = Math.floorMod(e.phase - launch - 1, phases) + 1;
                double budget = span * width - e.setup;
                double slack = budget - arrival;
                int edge = p.arr[RISE][e.net] >= p.arr[FALL][e.net] ? RISE : FALL;
                PhaseTiming pt = null;
                int q = e.phase - 1;
                if (q < 0 || q >= phases) {
                    continue;
                }
                if (worst[q] == null || slack < worst[q].slack()) {
                    pt = new PhaseTiming(e.phase, launch, span, e.name, e.setup, budget, arrival, slack,
                            path(p, e.net, edge));
                    worst[q] = pt;
                }
                double need = phases * (arrival + e.setup) / span;
                if (critical == null || need > criticalPeriod) {
                    criticalPeriod = need;
                    critical = pt != null ? pt : new PhaseTiming(e.phase, launch, span, e.name, e.setup, budget,
                            arrival, slack, path(p, e.net, edge));
                }
            }
        }
        List<PhaseTiming> perPhase = new ArrayList<>();
        for (int q = 0; q < phases; q++) {
            perPhase.add(worst[q] != null ? worst[q]
                    : new PhaseTiming(q + 1, 0, 0, "", 0, width, 0, width, List.of()));
        }
        return new TimingReport(machine.name(), phases, period, width, List.copyOf(perPhase), critical,
                criticalPeriod, instances());
    }

    private record Endpoint(int net, int phase, double setup, String name) {
    }

    private List<Endpoint> endpoints() {
        List<Endpoint> list = new ArrayList<>();
        for (Latch l : netlist.latches()) {
            double setup = 0;
            if (l.stage() >= 0) {
                double s = machine.stages().get(l.stage()).setup();
                setup = Double.isNaN(s) ? 0 : s;
            }
            String name = "latch " + netlist.netName(l.output());
            list.add(new Endpoint(l.data(), l.phase(), setup, name));
            if (l.enable() >= 0) {
                list.add(new Endpoint(l.enable(), l.phase(), setup, name + " (enable)"));
            }
        }
        ProgramCounter pc = machine.pc();
        if (pc != null) {
            if (pc.jumpNet() >= 0) {
                list.add(new Endpoint(pc.jumpNet(), pc.phase(), 0, "pc (jump)"));
            }
            int[] targets = pc.targetNets();
            for (int i = 0; i < targets.length; i++) {
                list.add(new Endpoint(targets[i], pc.phase(), 0, "pc (target bit " + i + ")"));
            }
        }
        return list;
    }

    /** Arrival times for changes launched at the end of one phase, with the input each came through. */
    private static final class Propagation {
        final double[][] arr;
        final int[][] fromNet;
        final int[][] fromEdge;

        Propagation(int n) {
            arr = new double[2][n];
            fromNet = new int[2][n];
            fromEdge = new int[2][n];
            for (int e = 0; e < 2; e++) {
                java.util.Arrays.fill(arr[e], NONE);
                java.util.Arrays.fill(fromNet[e], -1);
            }
        }
    }

    private Propagation propagate(int launch, int phases) {
        Propagation p = new Propagation(netlist.netCount());
        for (Latch l : netlist.latches()) {
            if (l.phase() == launch) {
                // Either plate of a flip-flop may be the one rising through its load: both
                // edges of Q (and of its free complement) count the slower edge.
                p.arr[RISE][l.output()] = latchDelay[l.id()].worst();
                p.arr[FALL][l.output()] = latchDelay[l.id()].worst();
            }
        }
        if (launch == phases) {
            for (Port in : machine.inputs()) {
                p.arr[RISE][in.net()] = 0;
                p.arr[FALL][in.net()] = 0;
            }
        }
        if (machine.pc() != null && machine.rom() != null && launch == machine.pc().phase()) {
            for (int d : machine.rom().dataNets()) {
                p.arr[RISE][d] = romAccess;
                p.arr[FALL][d] = romAccess;
            }
        }
        for (Gate g : netlist.gates()) {
            StageDelay d = gateDelay[g.id()];
            for (int out = RISE; out <= FALL; out++) {
                double best = NONE;
                int bestNet = -1;
                int bestEdge = -1;
                for (int in : g.inputs()) {
                    for (int edge = RISE; edge <= FALL; edge++) {
                        if (!g.fn().causes(edge == RISE, out == RISE)) {
                            continue;
                        }
                        double a = p.arr[edge][in];
                        if (a > best) {
                            best = a;
                            bestNet = in;
                            bestEdge = edge;
                        }
                    }
                }
                if (best != NONE) {
                    p.arr[out][g.output()] = best + (out == RISE ? d.rise() : d.fall());
                    p.fromNet[out][g.output()] = bestNet;
                    p.fromEdge[out][g.output()] = bestEdge;
                }
            }
        }
        return p;
    }

    private List<PathStep> path(Propagation p, int net, int edge) {
        List<PathStep> steps = new ArrayList<>();
        int n = net;
        int e = edge;
        while (n >= 0) {
            double arrival = p.arr[e][n];
            int from = p.fromNet[e][n];
            int fromEdge = p.fromEdge[e][n];
            double delay = from >= 0 ? arrival - p.arr[fromEdge][from] : arrival;
            steps.add(step(n, e, delay, arrival));
            n = from;
            e = fromEdge;
        }
        Collections.reverse(steps);
        return List.copyOf(steps);
    }

    private PathStep step(int net, int edge, double delay, double arrival) {
        char c = edge == RISE ? 'r' : 'f';
        String netName = netlist.netName(net);
        String module = module(netlist.netModule(net));
        if (driverGate[net] >= 0) {
            Gate g = netlist.gates().get(driverGate[net]);
            if (g.stage() < 0) {
                return new PathStep("free", g.id(), "", c, delay, arrival, net, netName, module);
            }
            return new PathStep("gate", g.id(), machine.stages().get(g.stage()).name(), c, delay, arrival, net,
                    netName, module);
        }
        if (driverLatch[net] >= 0) {
            Latch l = netlist.latches().get(driverLatch[net]);
            String stage = l.stage() >= 0 ? machine.stages().get(l.stage()).name() : "";
            return new PathStep("latch", l.id(), stage, c, delay, arrival, net, netName, module);
        }
        if (driverInput[net] >= 0) {
            return new PathStep("input", driverInput[net], "", c, delay, arrival, net, netName, module);
        }
        return new PathStep(romData[net] ? "rom" : "net", -1, "", c, delay, arrival, net, netName, module);
    }

    private String module(int m) {
        if (m < 0 || m >= machine.modules().size()) {
            return "";
        }
        ModuleInstance mi = machine.modules().get(m);
        return mi.path().isEmpty() ? "(top) " + mi.type() : mi.path() + " (" + mi.type() + ")";
    }

    private List<InstanceDelay> instances() {
        List<InstanceDelay> list = new ArrayList<>();
        for (Latch l : netlist.latches()) {
            if (l.stage() >= 0) {
                StageType st = machine.stages().get(l.stage());
                list.add(new InstanceDelay("latch", l.id(), st.name(), module(l.module()),
                        netlist.netName(l.output()), latchDelay[l.id()]));
            }
        }
        for (Gate g : netlist.gates()) {
            if (g.stage() >= 0) {
                StageType st = machine.stages().get(g.stage());
                list.add(new InstanceDelay("gate", g.id(), st.name(), module(g.module()),
                        netlist.netName(g.output()), gateDelay[g.id()]));
            }
        }
        return List.copyOf(list);
    }
}
