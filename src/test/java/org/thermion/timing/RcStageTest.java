package org.thermion.timing;

import org.junit.jupiter.api.Test;
import org.thermion.model.Gate;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Computed delays against hand calculations with the test parts of {@link TimingMachines}. */
class RcStageTest {

    /** x -> pentode inverter (10 k load, 1 k ron, 1 pF wiring) -> triode inverter (gain 9) -> latch. */
    static final String RC = TimingMachines.PARTS + """
            stage t_pinv : not { tube PQ1; circuit none; sections 1; load 10 k from bplus; ron 1 k; wiring 1 pF; gain 12 }
            stage t_tinv : not { tube TQ1; circuit none; sections 1; load 20 k from bplus; ron 2 k; gain 9 }
            stage t_follow : buffer { tube TQ1; circuit none; sections 1; load 10 k from bias; ron 500 ohm; gain 0.9 }
            stage t_ff : latch { tube TQ1; circuit none; sections 2; load 10 k from bplus; rise 2 us; fall 0.5 us; setup 4 us }
            realize { latch t_ff }
            module top {
              in x
              out y, z
              net g1, g2, f
              g1 = t_pinv(x)
              g2 = t_tinv(g1)
              latch y on phase 1 = g2
              f = t_follow(x)
              latch z on phase 1 = f
            }
            machine rc {
              clock { phases 2; period 100 us }
              top top
              inputs x
              outputs y z
            }
            """;

    @Test
    void tenToNinetyIsLnNineRc() {
        // Millman & Taub, Pulse and Digital Circuits: 10-90 % rise = ln 9 RC, about 2.2 RC.
        assertThat(RcDelay.tenToNinety(10e3, 100e-12)).isCloseTo(Math.log(9) * 1e-6, within(1e-15));
        assertThat(RcDelay.tenToNinety(10e3, 100e-12) / 1e-6).isCloseTo(2.2, within(0.005));
    }

    @Test
    void triodeInputCapacitanceCarriesTheMillerTerm() {
        Machine m = TimingMachines.elaborate(RC);
        var tinv = m.stages().stream().filter(s -> s.name().equals("t_tinv")).findFirst().orElseThrow();
        var pinv = m.stages().stream().filter(s -> s.name().equals("t_pinv")).findFirst().orElseThrow();
        // Miller: Cin = Cgk + Cgp (1 + |A|) = 2 pF + 1 pF x (1 + 9) = 12 pF.
        assertThat(Capacitance.input(tinv, m.tubes().get(tinv.tube()))).isCloseTo(12e-12, within(1e-18));
        // A pentode input is its declared cin, whatever its gain.
        assertThat(Capacitance.input(pinv, m.tubes().get(pinv.tube()))).isCloseTo(5e-12, within(1e-18));
        // A buffer's declared gain is a cathode follower's: Cin = Cgp + Cgk (1 - A) = 1 pF + 2 pF x 0.1 = 1.2 pF
        // (Miller's rule with the cathode following the grid), not an inverter's 2 + 1 x 1.9 = 3.9 pF.
        var follow = m.stages().stream().filter(s -> s.name().equals("t_follow")).findFirst().orElseThrow();
        assertThat(Capacitance.input(follow, m.tubes().get(follow.tube()))).isCloseTo(1.2e-12, within(1e-18));
        // A triode without cout: Cpk + Cgp per section = 1.5 pF, two sections 3 pF.
        assertThat(Capacitance.output(m.tubes().get(tinv.tube()), 2)).isCloseTo(3e-12, within(1e-18));
    }

    @Test
    void singleStageRiseAndFallAreLnNineRcOfTheDrivenNode() {
        Machine m = TimingMachines.elaborate(RC);
        DelayCalculator calc = new DelayCalculator(m);
        Gate g1 = gateDriving(m, "g1");
        StageDelay d = calc.gate(g1);
        // C = own cout 4 pF + driven triode input 12 pF + wiring 1 pF x 1 connection = 17 pF.
        assertThat(d.farads()).isCloseTo(17e-12, within(1e-18));
        assertThat(d.rise()).isCloseTo(Math.log(9) * 10e3 * 17e-12, within(1e-15));
        assertThat(d.fall()).isCloseTo(Math.log(9) * 1e3 * 17e-12, within(1e-15));
        assertThat(d.riseGiven()).isFalse();

        StageDelay d2 = calc.gate(gateDriving(m, "g2"));
        // C = Cpk + Cgp = 1.5 pF + latch input (gain 1): 2 pF + 1 pF x 2 = 4 pF -> 5.5 pF.
        assertThat(d2.farads()).isCloseTo(5.5e-12, within(1e-18));
        assertThat(d2.rise()).isCloseTo(Math.log(9) * 20e3 * 5.5e-12, within(1e-15));
    }

    @Test
    void aLoadToTheNegativeRailSetsTheFall() {
        Machine m = TimingMachines.elaborate(RC);
        StageDelay d = new DelayCalculator(m).gate(gateDriving(m, "f"));
        // Cathode follower: 1.5 pF own + 4 pF latch input; tube pulls up (500 ohm), load pulls down (10 k).
        assertThat(d.rise()).isCloseTo(Math.log(9) * 500 * 5.5e-12, within(1e-15));
        assertThat(d.fall()).isCloseTo(Math.log(9) * 10e3 * 5.5e-12, within(1e-15));
    }

    @Test
    void pathThroughComputedStagesSumsTheirEdges() {
        Machine m = TimingMachines.elaborate(RC);
        PhaseTiming p1 = new StaticTiming(m).analyse().perPhase().get(0);
        double ln9 = Math.log(9);
        // x falls -> g1 rises through 10 k (17 pF) -> g2 falls through 2 k (5.5 pF).
        double expected = ln9 * 10e3 * 17e-12 + ln9 * 2e3 * 5.5e-12;
        assertThat(p1.arrival()).isCloseTo(expected, within(1e-15));
        assertThat(p1.endpoint()).isEqualTo("latch y");
        assertThat(p1.path()).extracting(PathStep::netName).containsExactly("x", "g1", "g2");
    }

    static Gate gateDriving(Machine m, String net) {
        return m.netlist().gates().stream().filter(g -> m.netlist().netName(g.output()).equals(net))
                .findFirst().orElseThrow();
    }
}
