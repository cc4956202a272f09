package org.thermion.timing;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class StaticTimingTest {

    /** Three inverters with declared delays between two latches with declared delays. */
    static final String CHAIN = TimingMachines.PARTS + """
            stage t_inv : not { tube PQ1; sections 1; load 10 k from bplus; rise 3 us; fall 1 us }
            stage t_ff : latch { tube TQ1; sections 2; load 10 k from bplus; rise 2 us; fall 0.5 us; setup 4 us }
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
    void aPeriodBelowTheCriticalPathFails() {
        Machine m = TimingMachines.elaborate(CHAIN);
        TimingReport r = new StaticTiming(m).analyse(21e-6);
        assertThat(r.passes()).isFalse();
        assertThat(r.perPhase().get(0).slack()).isCloseTo(10.5e-6 - 4e-6 - 7e-6, within(1e-12));
        assertThat(new StaticTiming(m).analyse(22.01e-6).passes()).isTrue();
    }
}
