package org.thermion.sim;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.elab.Elaborator;
import org.thermion.model.Clock;
import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Port;
import org.thermion.model.Netlist;
import org.thermion.synth.SyntheticMachine;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The regrouped two-valued gate program settles to exactly what the netlist's own order gives. */
public class GateProgramTest {
    @Test
    void demoSettlesLikeTheNetlistOrder() {
        Machine m = SimMachines.demo();
        GateProgram p = new GateProgram(m.netlist());
        assertTrue(p.regrouped, "the demo's netlist is levelized, so its gates may be regrouped");
        assertTrue(p.runs() < m.netlist().gates().size() / 2, "runs " + p.runs() + " gather several gates each");
        compareWithNetlistOrder(m, 31);
    }

    @Test
    void renumberingIsAPermutationWithTheLeadingNetsFirst() {
        Machine m = SimMachines.demo();
        int nets = m.netlist().netCount();
        int[] data = m.rom().dataNets();
        int[] leading = {Netlist.CONST0, Netlist.CONST1, data[3], data[0]};
        int[] slot = new GateProgram(m.netlist()).renumber(nets, leading);
        assertEquals(0, slot[Netlist.CONST0]);
        assertEquals(1, slot[Netlist.CONST1]);
        assertEquals(2, slot[data[3]]);
        assertEquals(3, slot[data[0]]);
        boolean[] taken = new boolean[nets];
        for (int n = 0; n < nets; n++) {
            assertFalse(taken[slot[n]], "slot " + slot[n] + " given twice");
            taken[slot[n]] = true;
        }
    }

    @Test
    void syntheticMachineSettlesLikeTheNetlistOrder() {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d)
                .elaborateText(Path.of("synth.machine"), SyntheticMachine.ofSize(1000).text());
        assertNotNull(m);
        compareWithNetlistOrder(m, 32);
    }

    @Test
    void everyFunctionAndWidthInTwoLayers() {
        Machine m = handMachine(false);
        assertTrue(new GateProgram(m.netlist()).regrouped);
        compareWithNetlistOrder(m, 33);
    }

    @Test
    void aGateReadingALaterGateKeepsTheNetlistOrder() {
        Machine m = handMachine(true);
        assertFalse(new GateProgram(m.netlist()).regrouped, "the first gate reads the last gate's old value");
        compareWithNetlistOrder(m, 34);
    }

    /**
     * Nets 0, 1, latches 2..6, then gates of every function with 0 to 5 inputs on the latches,
     * and a second layer of the same on the first layer's outputs. {@code backward}: a first
     * gate that reads the net of the netlist's last gate.
     */
    private static Machine handMachine(boolean backward) {
        List<String> names = new ArrayList<>(List.of("0", "1", "a", "b", "c", "d", "e"));
        List<Latch> latches = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            latches.add(new Latch(i, 2 + i, -1, 2 + i, 1, -1, 0));
        }
        List<Gate> gates = new ArrayList<>();
        int total = 2 * GateFn.values().length * 6 + (backward ? 1 : 0);
        int lastNet = names.size() + total - 1;
        if (backward) {
            names.add("back");
            gates.add(new Gate(0, GateFn.XOR, new int[] {2, lastNet}, names.size() - 1, -1, 0));
        }
        int[] layer = {2, 3, 4, 5, 6};
        for (int pass = 0; pass < 2; pass++) {
            int[] next = new int[5];
            int made = 0;
            for (GateFn fn : GateFn.values()) {
                for (int w = 0; w <= 5; w++) {
                    int[] in = new int[w];
                    for (int k = 0; k < w; k++) {
                        in[k] = layer[(k + made) % layer.length];
                    }
                    int out = names.size();
                    names.add("g" + pass + "_" + fn.name().toLowerCase() + w);
                    gates.add(new Gate(gates.size(), fn, in, out, -1, 0));
                    if (w >= 2) {
                        next[made++ % 5] = out;
                    }
                }
            }
            layer = next;
        }
        int[] module = new int[names.size()];
        module[0] = -1;
        module[1] = -1;
        Netlist nl = new Netlist(names.toArray(String[]::new), module, gates, latches);
        return new Machine("hand", new Clock(1, 1e-5), List.of(), List.of(), List.of(), List.of(), List.of(),
                List.of(new ModuleInstance(0, "", "top", -1)), nl, null, null, List.<Port>of(), List.of(), List.of(),
                List.of(), null, new int[gates.size()], new int[latches.size()]);
    }

    /** Random inputs, latches and ROM words on every lane; every net after a settle against a plain in-order evaluation. */
    private static void compareWithNetlistOrder(Machine m, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        Simulator sim = new Simulator(m);
        Netlist nl = m.netlist();
        for (int trial = 0; trial < 20; trial++) {
            for (int i = 0; i < m.inputs().size(); i++) {
                sim.setInput(i, rnd.nextLong());
            }
            for (int l = 0; l < nl.latches().size(); l++) {
                sim.setLatch(l, rnd.nextLong());
            }
            if (m.rom() != null) {
                long[] word = new long[m.rom().dataNets().length];
                for (int b = 0; b < word.length; b++) {
                    word[b] = rnd.nextLong();
                }
                sim.forceRomWord(word);
            }
            long[] v = new long[nl.netCount()];
            for (int n = 0; n < v.length; n++) {
                v[n] = sim.value(n);
            }
            sim.settle();
            if (m.rom() != null) {
                for (int n : m.rom().dataNets()) {
                    v[n] = sim.value(n);
                }
            }
            List<Gate> gates = nl.gates();
            for (Gate g : gates) {
                v[g.output()] = eval(g, v);
            }
            for (int n = 0; n < v.length; n++) {
                assertEquals(v[n], sim.value(n), "net " + nl.netName(n) + ", trial " + trial);
            }
        }
    }

    /** Each gate by its definition over 64 lanes (the engines' tests check against it). */
    public static long eval(Gate g, long[] v) {
        int[] in = g.inputs();
        long and = -1L;
        long or = 0L;
        long xor = 0L;
        for (int n : in) {
            and &= v[n];
            or |= v[n];
            xor ^= v[n];
        }
        long first = in.length > 0 ? v[in[0]] : 0L;
        return switch (g.fn()) {
            case BUF -> first;
            case NOT -> ~first;
            case AND -> and;
            case OR -> or;
            case NAND -> ~and;
            case NOR -> ~or;
            case XOR -> xor;
        };
    }
}
