package org.thermion.sim;

import org.junit.jupiter.api.Test;
import org.thermion.model.Clock;
import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Netlist;
import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Three-input gates of every function on all 27 combinations of 0, 1 and X, against
 * Kleene's strong three-valued logic (common practice in logic simulation): a controlling
 * value decides (0 for AND/NAND, 1 for OR/NOR), otherwise any X gives X; XOR is X with any X.
 * The netlist is built by hand, so gates wider than any stage of the parts library are covered.
 */
class ThreeValuedWideGateTest {
    static final GateFn[] FNS = {GateFn.AND, GateFn.OR, GateFn.NAND, GateFn.NOR, GateFn.XOR};

    /** Nets: 0, 1, inputs d0 e0 d1 e1 d2 e2 (2..7), latches a b c (8..10), then one output per function. */
    static Machine wideGates() {
        List<String> names = new ArrayList<>(List.of("0", "1", "d0", "e0", "d1", "e1", "d2", "e2", "a", "b", "c"));
        List<Latch> latches = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            latches.add(new Latch(i, 2 + 2 * i, 3 + 2 * i, 8 + i, 1, -1, 0));
        }
        List<Gate> gates = new ArrayList<>();
        for (GateFn fn : FNS) {
            int out = names.size();
            names.add("y_" + fn.name().toLowerCase());
            gates.add(new Gate(gates.size(), fn, new int[] {8, 9, 10}, out, -1, 0));
        }
        // Four-input forms, the fourth input repeating a (AND, OR and their complements do not care).
        for (int k = 0; k < 4; k++) {
            int out = names.size();
            names.add("y4_" + FNS[k].name().toLowerCase());
            gates.add(new Gate(gates.size(), FNS[k], new int[] {8, 9, 10, 8}, out, -1, 0));
        }
        int[] module = new int[names.size()];
        module[0] = -1;
        module[1] = -1;
        List<Port> inputs = new ArrayList<>();
        for (int n = 2; n <= 7; n++) {
            inputs.add(new Port(names.get(n), n));
        }
        Netlist nl = new Netlist(names.toArray(String[]::new), module, gates, latches);
        return new Machine("wide", new Clock(1, 1e-5), List.of(), List.of(), List.of(), List.of(), List.of(),
                List.of(new ModuleInstance(0, "", "top", -1)), nl, null, null, inputs, List.of(), List.of(),
                List.of(), null, new int[gates.size()], new int[latches.size()]);
    }

    /** 0, 1 or 2 (X) of variable k in combination lane. */
    static int digit(int lane, int k) {
        return lane / (k == 0 ? 1 : k == 1 ? 3 : 9) % 3;
    }

    static char kleene(GateFn fn, int a, int b, int c) {
        int[] v = {a, b, c};
        boolean anyX = a == 2 || b == 2 || c == 2;
        switch (fn) {
            case AND, NAND -> {
                char r = (a == 0 || b == 0 || c == 0) ? '0' : anyX ? 'X' : '1';
                return fn == GateFn.AND ? r : invert(r);
            }
            case OR, NOR -> {
                char r = (a == 1 || b == 1 || c == 1) ? '1' : anyX ? 'X' : '0';
                return fn == GateFn.OR ? r : invert(r);
            }
            default -> {
                return anyX ? 'X' : ((v[0] ^ v[1] ^ v[2]) == 1 ? '1' : '0');
            }
        }
    }

    static char invert(char c) {
        return c == 'X' ? 'X' : c == '1' ? '0' : '1';
    }

    @Test
    void everyCombinationOfZeroOneAndUnknown() {
        Machine m = wideGates();
        Simulator sim = new Simulator(m);
        sim.reset(new InitMode.Unknown());
        long[] d = new long[3];
        long[] e = new long[3];
        for (int lane = 0; lane < 27; lane++) {
            for (int k = 0; k < 3; k++) {
                int v = digit(lane, k);
                if (v < 2) {
                    e[k] |= 1L << lane;
                    d[k] |= (long) v << lane;
                }
            }
        }
        for (int k = 0; k < 3; k++) {
            sim.setInput(2 * k, d[k]);
            sim.setInput(2 * k + 1, e[k]);
        }
        sim.stepCycle();
        sim.settle();
        for (int g = 0; g < FNS.length + 4; g++) {
            int net = 11 + g;
            GateFn fn = FNS[g % FNS.length];
            for (int lane = 0; lane < 27; lane++) {
                boolean x = (sim.unknown(net) >>> lane & 1) == 1;
                boolean one = (sim.value(net) >>> lane & 1) == 1;
                char got = x ? 'X' : one ? '1' : '0';
                assertThat(got).as("%s(%d,%d,%d) net %d", fn, digit(lane, 0), digit(lane, 1), digit(lane, 2), net)
                        .isEqualTo(kleene(fn, digit(lane, 0), digit(lane, 1), digit(lane, 2)));
                assertThat(x && one).isFalse();
            }
        }
    }

    @Test
    void twoValuedModeGivesTheSameAnswersWhereNothingIsUnknown() {
        Machine m = wideGates();
        Simulator sim = new Simulator(m);
        sim.reset(new InitMode.Zero());
        // Lanes 0..7: the eight combinations of a, b, c.
        for (int k = 0; k < 3; k++) {
            long bits = 0;
            for (int lane = 0; lane < 8; lane++) {
                bits |= (long) (lane >> k & 1) << lane;
            }
            sim.setInput(2 * k, bits);
            sim.setInput(2 * k + 1, -1L);
        }
        sim.stepCycle();
        sim.settle();
        for (int g = 0; g < FNS.length + 4; g++) {
            GateFn fn = FNS[g % FNS.length];
            for (int lane = 0; lane < 8; lane++) {
                char got = (sim.value(11 + g) >>> lane & 1) == 1 ? '1' : '0';
                assertThat(got).isEqualTo(kleene(fn, lane & 1, lane >> 1 & 1, lane >> 2 & 1));
            }
        }
    }
}
