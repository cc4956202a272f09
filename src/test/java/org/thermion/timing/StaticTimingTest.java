package org.thermion.timing;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class StaticTimingTest {

    /** Three inverters with declared delays between two latches with declared delays. */
    static final String CHAIN = TimingMachines.PARTS + """
            stage t_inv : not { tube PQ1; circuit none; sections 1; load 10 k from bplus; rise 3 us; fall 1 us }
            stage t_ff : latch { tube TQ1; circuit none; sections 2; load 10 k from bplus; rise 2 us; fall 0.5 us; setup 4 us }
            realize { not t_inv
                      latch t_ff }
            module top {
              in x
              out y
              net b, c, d, e
              b = t_inv(x)
              c = t_inv(b)
              d = t_inv(c)
              latch a on phase 1 = d
              e = t_inv(a)
              latch y on phase 2 = e
            }
            machine chain {
              clock { phases 2; period 100 us }
              top top
              inputs x
              outputs y
            }
            """;

    @Test
    void chainOfGivenDelaysSumsEdgeByEdge() {
        Machine m = TimingMachines.elaborate(CHAIN);
        TimingReport r = new StaticTiming(m).analyse();
        PhaseTiming p1 = r.perPhase().get(0);
        // Input x changes between cycles (end of phase 2) and reaches latch a on phase 1.
        // By hand: x falls; b rises 3 us; c falls 1 us (4 us); d rises 3 us (7 us).
        // (x rises; b falls 1; c rises 3; d falls 1: only 5 us.)
        assertThat(p1.launchPhase()).isEqualTo(2);
        assertThat(p1.arrival()).isCloseTo(7e-6, within(1e-12));
        assertThat(p1.path()).extracting(PathStep::netName).containsExactly("x", "b", "c", "d");
        assertThat(p1.path()).extracting(PathStep::edge).containsExactly('f', 'r', 'f', 'r');
        assertThat(p1.path()).extracting(PathStep::arrival)
                .containsExactly(0.0, 3e-6, 4e-6, 7e-6);
        // Budget: 50 us phase - 4 us set-up = 46 us.
        assertThat(p1.slack()).isCloseTo(46e-6 - 7e-6, within(1e-12));

        PhaseTiming p2 = r.perPhase().get(1);
        // Latch a launches at the end of phase 1 after its slower edge, 2 us; e rises 3 us later.
        assertThat(p2.launchPhase()).isEqualTo(1);
        assertThat(p2.arrival()).isCloseTo(5e-6, within(1e-12));

        // Shortest period: the worst (7 + 4) us per phase width, two phases: 22 us.
        assertThat(r.critical().endpoint()).isEqualTo("latch a");
        assertThat(r.minPeriodSeconds()).isCloseTo(22e-6, within(1e-12));
        assertThat(r.maxClockHertz()).isCloseTo(1 / 22e-6, within(1e-3));
        assertThat(r.passes()).isTrue();
    }

    @Test
    void aLatchFeedingALatchOfItsOwnPhaseHasAWholeCycle() {
        // y (phase 2) -> eight inverters -> w (phase 2): a whole cycle, two phase widths.
        StringBuilder chain = new StringBuilder("latch y on phase 2 = e\n  net f[8]\n  f[0] = t_inv(y)\n");
        for (int i = 1; i < 8; i++) {
            chain.append("  f[").append(i).append("] = t_inv(f[").append(i - 1).append("])\n");
        }
        chain.append("  latch w on phase 2 = f[7]");
        String text = CHAIN.replace("latch y on phase 2 = e", chain.toString())
                .replace("outputs y", "outputs y w").replace("  out y\n", "  out y, w\n");
        TimingReport r = new StaticTiming(TimingMachines.elaborate(text)).analyse();
        // By hand: y launches after its slower edge, 2 us; each inverter pair adds 3 + 1 us: 2 + 16 = 18 us.
        // It needs 2 x (18 + 4) / 2 = 22 us of period, as much as the path into latch a, 2 x (7 + 4).
        assertThat(r.minPeriodSeconds()).isCloseTo(22e-6, within(1e-12));
        PhaseTiming p2 = r.perPhase().get(1);
        // The worst slack into phase 2 is still the one-phase path into y: 46 - 5 = 41 us.
        assertThat(p2.endpoint()).isEqualTo("latch y");
        assertThat(p2.slack()).isCloseTo(41e-6, within(1e-12));
        // At 21 us: w has 21 - 4 - 18 = -1 us over its two phases, y 10.5 - 4 - 5 = +1.5 us, so w is
        // now the worst into phase 2 (a, into phase 1, has 10.5 - 4 - 7 = -0.5 us).
        TimingReport q = new StaticTiming(TimingMachines.elaborate(text)).analyse(21e-6);
        assertThat(q.perPhase().get(1).endpoint()).isEqualTo("latch w");
        assertThat(q.perPhase().get(1).span()).isEqualTo(2);
        assertThat(q.perPhase().get(1).slack()).isCloseTo(-1e-6, within(1e-12));
    }

    @Test
    void aPeriodBelowTheCriticalPathFails() {
        Machine m = TimingMachines.elaborate(CHAIN);
        TimingReport r = new StaticTiming(m).analyse(21e-6);
        assertThat(r.passes()).isFalse();
        assertThat(r.perPhase().get(0).slack()).isCloseTo(10.5e-6 - 4e-6 - 7e-6, within(1e-12));
        assertThat(new StaticTiming(m).analyse(22.01e-6).passes()).isTrue();
    }
}
