package org.thermion.faults;

import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Port;

import java.util.Arrays;
import java.util.List;

/**
 * The reference the fast fault simulator must agree with: one fault at a time, one machine,
 * one byte per net (0, 1, 2 = unknown), walking the model's netlist gate by gate. It reads a
 * fault's forces through the wire each slot stands for (a stem, or one reader's pin), never
 * through the flat program. Kept beside the fast one as the tests' reference and the bench's
 * yardstick ({@code bench}'s fault rows).
 */
public final class OneFaultSimulator {
    private static final byte X = FaultSimulator.UNKNOWN;

    private final FaultCircuit c;
    private final Machine m;
    private final List<long[]> programs;

    public OneFaultSimulator(FaultCircuit c, long[] rom) {
        this(c, java.util.Collections.singletonList(rom));
    }

    /** A reference whose machine runs {@code programs.get(0)}; a restarting step fits another. */
    public static OneFaultSimulator running(FaultCircuit c, List<long[]> programs) {
        return new OneFaultSimulator(c, programs);
    }

    private OneFaultSimulator(FaultCircuit c, List<long[]> programs) {
        this.c = c;
        this.m = c.machine();
        this.programs = new java.util.ArrayList<>();
        for (long[] p : programs) {
            this.programs.add(p == null ? new long[0] : p);
        }
    }

    /** Lamps after every step, {@code [step * lamps + lamp]}, with {@code fault} in (null: none). */
    public byte[] run(Fault fault, List<Step> steps) {
        Run r = new Run(fault, programs.get(0));
        int lamps = c.lamps().size();
        byte[] out = new byte[steps.size() * lamps];
        for (int s = 0; s < steps.size(); s++) {
            Step st = steps.get(s);
            if (st.restarts()) {
                // switched off and on with another program: a machine fresh from power-up
                r = new Run(fault, programs.get(st.program()));
            }
            List<Port> ins = m.inputs();
            for (int i = 0; i < ins.size(); i++) {
                r.val[ins.get(i).net()] = (byte) (st.input(i) ? 1 : 0);
                r.switches[ins.get(i).net()] = r.val[ins.get(i).net()];
            }
            for (int k = 0; k < st.cycles() * m.clock().phases(); k++) {
                r.phase();
            }
            r.settle();
            for (int i = 0; i < lamps; i++) {
                ObservedLamp lamp = c.lamps().get(i);
                out[s * lamps + i] = r.pin(Site.Place.LAMP, i, 0, lamp.net());
            }
        }
        return out;
    }

    private final class Run {
        final byte[] val = new byte[m.netlist().netCount()];
        final byte[] stem = new byte[val.length];
        final byte[] switches = new byte[val.length];
        final Fault fault;
        final Bridge bridge;
        // A bridge's joined value, and what each of its two nets' drivers gives on its own.
        byte joined;
        byte ownA;
        byte ownB;
        boolean walking;
        int pc;
        boolean pcUnknown;
        int nextPhase = 1;

        final long[] rom;

        Run(Fault fault, long[] rom) {
            this.fault = fault;
            this.rom = rom;
            this.bridge = fault == null ? null : fault.bridge();
            Arrays.fill(stem, (byte) -1);
            if (fault != null) {
                for (Force f : fault.forces()) {
                    Site s = c.sites().get(f.slot());
                    if (s.place().stem()) {
                        stem[s.net()] = (byte) (f.value() ? 1 : 0);
                    }
                }
            }
            for (Latch l : m.netlist().latches()) {
                val[l.output()] = X;
            }
            val[1] = 1;
        }

        /** What a reader sees on a pin: the net, unless the fault holds that very pin. */
        byte pin(Site.Place place, int index, int pin, int net) {
            if (fault != null) {
                for (Force f : fault.forces()) {
                    Site s = c.sites().get(f.slot());
                    if (s.place() == place && s.index() == index && s.pin() == pin) {
                        return (byte) (f.value() ? 1 : 0);
                    }
                }
            }
            return val[net];
        }

        void hold(int net) {
            if (stem[net] >= 0) {
                val[net] = stem[net];
            }
            if (walking && bridge != null && (net == bridge.slotA() || net == bridge.slotB())) {
                if (net == bridge.slotA()) {
                    ownA = val[net];
                } else {
                    ownB = val[net];
                }
                val[net] = joined;
            }
        }

        /**
         * Without a bridge, one walk of the netlist. With one, walks again and again from the joined
         * value unknown until it stays the same; a latch starts every walk from what it held.
         */
        void settle() {
            if (bridge == null) {
                walk();
                return;
            }
            walking = true;
            byte heldA = val[bridge.slotA()];
            byte heldB = val[bridge.slotB()];
            joined = X;
            while (true) {
                val[bridge.slotA()] = source(bridge.slotA(), heldA);
                val[bridge.slotB()] = source(bridge.slotB(), heldB);
                walk();
                byte j = bridge.join(ownA, ownB);
                if (j == joined) {
                    walking = false;
                    return;
                }
                joined = j;
            }
        }

        // What a net that no gate drives shows before the walk: a switch its setting, a latch what it held.
        private byte source(int net, byte held) {
            for (Port p : m.inputs()) {
                if (p.net() == net) {
                    return switches[net];
                }
            }
            return held;
        }

        void walk() {
            if (m.rom() != null) {
                int[] d = m.rom().dataNets();
                long word = pc < rom.length ? rom[pc] : 0L;
                for (int b = 0; b < d.length; b++) {
                    val[d[b]] = pcUnknown ? X : (byte) ((word >>> b) & 1L);
                }
                for (int n : d) {
                    hold(n);
                }
            }
            for (Port p : m.inputs()) {
                hold(p.net());
            }
            for (Latch l : m.netlist().latches()) {
                hold(l.output());
            }
            List<Gate> gates = m.netlist().gates();
            for (int g = 0; g < gates.size(); g++) {
                Gate gate = gates.get(g);
                byte[] in = new byte[gate.inputs().length];
                for (int k = 0; k < in.length; k++) {
                    in[k] = pin(Site.Place.GATE_IN, g, k, gate.inputs()[k]);
                }
                val[gate.output()] = eval(gate, in);
                hold(gate.output());
            }
        }

        void phase() {
            settle();
            List<Latch> latches = m.netlist().latches();
            byte[] next = new byte[latches.size()];
            for (int i = 0; i < latches.size(); i++) {
                Latch l = latches.get(i);
                byte q = val[l.output()];
                next[i] = q;
                if (l.phase() != nextPhase) {
                    continue;
                }
                byte d = pin(Site.Place.LATCH_DATA, i, 0, l.data());
                byte e = l.enable() < 0 ? 1 : pin(Site.Place.LATCH_ENABLE, i, 0, l.enable());
                if (e == 1) {
                    next[i] = d;
                } else if (e == X) {
                    next[i] = d == q && d != X ? q : X;
                }
            }
            if (m.pc() != null && m.pc().phase() == nextPhase) {
                loadPc();
            }
            for (int i = 0; i < latches.size(); i++) {
                val[latches.get(i).output()] = next[i];
                hold(latches.get(i).output());
            }
            nextPhase = nextPhase == m.clock().phases() ? 1 : nextPhase + 1;
        }

        void loadPc() {
            int width = m.pc().width();
            int mask = width >= 31 ? -1 : (1 << width) - 1;
            int[] t = m.pc().targetNets();
            int target = 0;
            boolean targetX = false;
            for (int b = 0; b < Math.min(width, t.length); b++) {
                byte tb = pin(Site.Place.PC_TARGET, 0, b, t[b]);
                targetX |= tb == X;
                target |= (tb == 1 ? 1 : 0) << b;
            }
            byte j = pin(Site.Place.PC_JUMP, 0, 0, m.pc().jumpNet());
            int inc = (pc + 1) & mask;
            if (j == 1) {
                pc = target;
                pcUnknown = targetX;
            } else if (j == 0) {
                pc = inc;
            } else {
                pcUnknown = pcUnknown || targetX || target != inc;
                pc = inc;
            }
            if (pcUnknown) {
                pc = 0;
            }
        }
    }

    static byte eval(Gate g, byte[] in) {
        switch (g.fn()) {
            case BUF:
                return in[0];
            case NOT:
                return in[0] == X ? X : (byte) (1 - in[0]);
            case AND:
                return and(in);
            case NAND:
                return not(and(in));
            case OR:
                return or(in);
            case NOR:
                return not(or(in));
            default: {
                int r = 0;
                for (byte b : in) {
                    if (b == X) {
                        return X;
                    }
                    r ^= b;
                }
                return (byte) r;
            }
        }
    }

    private static byte not(byte b) {
        return b == X ? X : (byte) (1 - b);
    }

    private static byte and(byte[] in) {
        boolean unknown = false;
        for (byte b : in) {
            if (b == 0) {
                return 0;
            }
            unknown |= b == X;
        }
        return unknown ? X : 1;
    }

    private static byte or(byte[] in) {
        boolean unknown = false;
        for (byte b : in) {
            if (b == 1) {
                return 1;
            }
            unknown |= b == X;
        }
        return unknown ? X : 0;
    }
}
