package org.thermion.sim;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.util.SplittableRandom;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The engine on tiny machines written for the purpose. */
class SimulatorTest {
    /** Every gate function on two inputs, and a latch loading on phase 2 when enabled. */
    static final String GATES = """
                        module top {
              in a, b, c, d, en
              out y_and, y_or, y_nand, y_nor, y_xor, y_not, q, q2, y_and3
              y_and = a & b
              y_or = a | b
              y_nand = !(a & b)
              y_nor = !(a | b)
              y_xor = a ^ b
              y_not = !a
              y_and3 = a & b & c
              latch q on phase 2 when en = d
              latch q2 on phase 1 = q
            }
            machine gates {
              clock { phases 2; period 10 us }
              top top
              inputs a b c d en
              outputs y_and y_or y_nand y_nor y_xor y_not q q2 y_and3
            }
            """;

    private static long v(Simulator s, Machine m, String net) {
        return s.value(SimMachines.net(m, net));
    }

    private static long x(Simulator s, Machine m, String net) {
        return s.unknown(SimMachines.net(m, net));
    }

    @Test
    void gatesComputeTheirFunctionsOnEveryLaneIndependently() {
        Machine m = SimMachines.fromText(GATES);
        Simulator s = new Simulator(m);
        SplittableRandom r = new SplittableRandom(7);
        for (int round = 0; round < 20; round++) {
            long a = r.nextLong();
            long b = r.nextLong();
            long c = r.nextLong();
            s.setInput(s.inputIndex("a"), a);
            s.setInput(s.inputIndex("b"), b);
            s.setInput(s.inputIndex("c"), c);
            s.settle();
            // Each lane checked on its own, as 64 separate one-bit machines.
            for (int lane = 0; lane < 64; lane++) {
                boolean la = (a >>> lane & 1) == 1;
                boolean lb = (b >>> lane & 1) == 1;
                boolean lc = (c >>> lane & 1) == 1;
                assertThat(bit(v(s, m, "y_and"), lane)).isEqualTo(la && lb);
                assertThat(bit(v(s, m, "y_or"), lane)).isEqualTo(la || lb);
                assertThat(bit(v(s, m, "y_nand"), lane)).isEqualTo(!(la && lb));
                assertThat(bit(v(s, m, "y_nor"), lane)).isEqualTo(!(la || lb));
                assertThat(bit(v(s, m, "y_xor"), lane)).isEqualTo(la ^ lb);
                assertThat(bit(v(s, m, "y_not"), lane)).isEqualTo(!la);
                assertThat(bit(v(s, m, "y_and3"), lane)).isEqualTo(la && lb && lc);
            }
        }
    }

    private static boolean bit(long word, int lane) {
        return (word >>> lane & 1) == 1;
    }

    @Test
    void latchesLoadOnlyOnTheirPhaseAndOnlyWhenEnabled() {
        Machine m = SimMachines.fromText(GATES);
        Simulator s = new Simulator(m);
        long d = 0xF0F0L;
        long en = 0xFF00L;
        s.setInput(s.inputIndex("d"), d);
        s.setInput(s.inputIndex("en"), en);
        assertThat(s.nextPhase()).isEqualTo(1);
        s.stepPhase();
        // Phase 1: q (phase 2) has not loaded yet.
        assertThat(v(s, m, "q")).isZero();
        assertThat(s.nextPhase()).isEqualTo(2);
        assertThat(s.cycle()).isZero();
        s.stepPhase();
        // Phase 2: q takes d where enabled, keeps 0 elsewhere.
        assertThat(v(s, m, "q")).isEqualTo(d & en);
        assertThat(v(s, m, "q2")).isZero();
        assertThat(s.cycle()).isEqualTo(1);
        assertThat(s.nextPhase()).isEqualTo(1);
        // Next cycle: disabled lanes keep their stored value even when d changes.
        s.setInput(s.inputIndex("d"), ~d);
        s.stepCycle();
        assertThat(v(s, m, "q")).isEqualTo((~d & en) | (d & en & ~en));
        assertThat(v(s, m, "q2")).isEqualTo(d & en);
        assertThat(s.gateEvaluations()).isEqualTo(4L * m.netlist().gates().size());
    }

    @Test
    void unknownFollowsTheThreeValuedRules() {
        // Truth tables of Kleene's strong three-valued logic (common practice in logic simulation).
        // Lanes 0..8 take the nine combinations of a, b in {0, 1, X}: a and b are latches that
        // power up unknown and load a known value only where their enable is 1.
        String text = """
                                module top {
                  in da, ea, db, eb
                  out y_and, y_or, y_nand, y_nor, y_xor, y_not, y_buf
                  latch a on phase 1 when ea = da
                  latch b on phase 1 when eb = db
                  y_and = a & b
                  y_or = a | b
                  y_nand = !(a & b)
                  y_nor = !(a | b)
                  y_xor = a ^ b
                  y_not = !a
                  y_buf = a
                }
                machine tri {
                  clock { phases 1; period 10 us }
                  top top
                  inputs da ea db eb
                  outputs y_and y_or y_nand y_nor y_xor y_not y_buf
                }
                """;
        Machine t = SimMachines.fromText(text);
        Simulator u = new Simulator(t);
        u.reset(new InitMode.Unknown());
        // value per lane: 0, 1, 2 = X; lane = 3 * a + b
        long da = 0, ea = 0, db = 0, eb = 0;
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                int lane = 3 * a + b;
                if (a < 2) {
                    ea |= 1L << lane;
                    da |= (long) a << lane;
                }
                if (b < 2) {
                    eb |= 1L << lane;
                    db |= (long) b << lane;
                }
            }
        }
        u.setInput(u.inputIndex("da"), da);
        u.setInput(u.inputIndex("ea"), ea);
        u.setInput(u.inputIndex("db"), db);
        u.setInput(u.inputIndex("eb"), eb);
        u.stepPhase();
        u.settle();
        // Expected tables, rows a = 0, 1, X; columns b = 0, 1, X.
        assertThat(table(u, t, "y_and")).isEqualTo("000 01X 0XX");
        assertThat(table(u, t, "y_or")).isEqualTo("01X 111 X1X");
        assertThat(table(u, t, "y_nand")).isEqualTo("111 10X 1XX");
        assertThat(table(u, t, "y_nor")).isEqualTo("10X 000 X0X");
        assertThat(table(u, t, "y_xor")).isEqualTo("01X 10X XXX");
        assertThat(table(u, t, "y_not")).isEqualTo("111 000 XXX");
        assertThat(table(u, t, "y_buf")).isEqualTo("000 111 XXX");
    }

    private static String table(Simulator s, Machine m, String net) {
        int n = SimMachines.net(m, net);
        StringBuilder sb = new StringBuilder();
        for (int lane = 0; lane < 9; lane++) {
            if (lane > 0 && lane % 3 == 0) {
                sb.append(' ');
            }
            boolean unknown = (s.unknown(n) >>> lane & 1) == 1;
            boolean one = (s.value(n) >>> lane & 1) == 1;
            assertThat(unknown && one).as("value bit is 0 where the net is X").isFalse();
            sb.append(unknown ? 'X' : one ? '1' : '0');
        }
        return sb.toString();
    }

    @Test
    void anUnknownEnableKeepsOnlyWhatDataAndStoredValueAgreeOn() {
        // q loads d when g; g is a latch that stays unknown because it is never enabled.
        String text = """
                                module top {
                  in d, s
                  out q
                  latch g on phase 1 when s = d
                  latch q on phase 2 when g = d
                }
                machine en {
                  clock { phases 2; period 10 us }
                  top top
                  inputs d s
                  outputs q
                }
                """;
        Machine m = SimMachines.fromText(text);
        Simulator sim = new Simulator(m);
        sim.reset(new InitMode.Unknown());
        int q = SimMachines.net(m, "q");
        int e = SimMachines.net(m, "g");
        // Lane 0: q forced to a known 0, d 0, g X -> q stays 0. Lane 1: q 0, d 1, g X -> q becomes X.
        sim.setLatch(m.netlist().latches().indexOf(latchOn(m, q)), 0L);
        sim.setInput(sim.inputIndex("d"), 0b10L);
        sim.setInput(sim.inputIndex("s"), 0L);
        sim.stepCycle();
        assertThat(sim.unknown(e) & 0b11L).isEqualTo(0b11L);
        assertThat(sim.unknown(q) & 0b11L).isEqualTo(0b10L);
        assertThat(sim.value(q) & 0b11L).isEqualTo(0L);
    }

    private static org.thermion.model.Latch latchOn(Machine m, int net) {
        return m.netlist().latches().stream().filter(l -> l.output() == net).findFirst().orElseThrow();
    }

    @Test
    void randomInitIsRepeatableAndDiffersBetweenLanes() {
        Machine m = SimMachines.fromText(GATES);
        Simulator s = new Simulator(m);
        s.reset(new InitMode.Random(42));
        long first = v(s, m, "q");
        s.reset(new InitMode.Zero());
        assertThat(v(s, m, "q")).isZero();
        s.reset(new InitMode.Random(42));
        assertThat(v(s, m, "q")).isEqualTo(first);
        assertThat(first).isNotIn(0L, -1L);
        s.reset(new InitMode.Random(43));
        assertThat(v(s, m, "q")).isNotEqualTo(first);
    }

    @Test
    void initModesParse() {
        assertThat(InitMode.parse("zero")).isEqualTo(new InitMode.Zero());
        assertThat(InitMode.parse("random:-5")).isEqualTo(new InitMode.Random(-5));
        assertThat(InitMode.parse("unknown")).isEqualTo(new InitMode.Unknown());
        assertThatThrownBy(() -> InitMode.parse("random:abc")).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("random:42");
        assertThatThrownBy(() -> InitMode.parse("ones")).hasMessageContaining("expected zero, random:SEED or unknown");
    }
}
