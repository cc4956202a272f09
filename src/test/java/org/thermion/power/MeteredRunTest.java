package org.thermion.power;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * A machine whose two ROM data bits drive two 6AU6 inverters (counted_inverter, typed-in
 * figures of counted-stages.machine: 2.4 mA from bplus conducting, i.e. output low, 0.05 mA cut
 * off) and a flip-flop (counted_flipflop: 3.2 mA always). A hand count of conducting inverters per
 * word gives bplus = 3.2 mA + 2.4 mA x conducting + 0.05 mA x cut off.
 */
class MeteredRunTest {
    static String rommed(String bplusLimit) {
        return PowerMachines.COUNTED_STAGES + """
                rail bplus { voltage 48 V; source 4 ohm; limit %s }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage 12.6 V; source 0.01 ohm; limit 10 A }
                heaters on heat {
                  series 2 of 6AU6 across machine
                  parallel 12AU7 at 12.6 V
                }
                realize {
                  not counted_inverter
                  latch counted_flipflop
                }
                module top {
                  in w[2]
                  out q, jump, target[2]
                  net n[2]
                  n[0] = !w[0]
                  n[1] = !w[1]
                  latch q on phase 2 = n[0]
                  jump = 0
                  target = {0, 0}
                }
                machine rommed {
                  clock { phases 2; period 100 us }
                  top top
                  rom { words 4; width 2; data w; offboard }
                  pc { width 2; phase 2; jump jump; target target; offboard }
                  outputs q
                }
                """.formatted(bplusLimit);
    }

    @Test
    void currentFollowsTheConductingInvertersWordByWord() {
        Machine m = PowerMachines.of(rommed("800 mA"));
        int bplus = m.railIndex("bplus");
        int bias = m.railIndex("bias");
        // words 00, 01, 11, 10: 0, 1, 2, 1 inverters conducting (an input high drives its output low)
        CurrentMeter meter = CurrentMeter.ofRun(m, new long[] {0b00, 0b01, 0b11, 0b10}, null, 4, new InitMode.Zero());
        double none = 3.2e-3 + 2 * 0.05e-3;        // 3.30 mA
        double one = 3.2e-3 + 2.4e-3 + 0.05e-3;    // 5.65 mA
        double two = 3.2e-3 + 2 * 2.4e-3;          // 8.00 mA
        assertThat(meter.samples()).isEqualTo(8);
        assertThat(meter.minRail(bplus)).isCloseTo(none, within(1e-12));
        assertThat(meter.peakRail(bplus)).isCloseTo(two, within(1e-12));
        assertThat(meter.peakCycle(bplus)).isEqualTo(2);
        assertThat(meter.peakPhase(bplus)).isEqualTo(1);
        assertThat(meter.meanRail(bplus)).isCloseTo((none + one + two + one) / 4, within(1e-12));
        assertThat(meter.nowRail(bplus)).isCloseTo(one, within(1e-12));
        assertThat(meter.lastCycle()).isEqualTo(3);
        assertThat(meter.lastPhase()).isEqualTo(2);
        // bias: 0.2 mA per inverter and 0.6 mA for the flip-flop, whatever the state
        assertThat(meter.minRail(bias)).isCloseTo(1.0e-3, within(1e-12));
        assertThat(meter.peakRail(bias)).isCloseTo(1.0e-3, within(1e-12));
    }

    @Test
    void staticBoundsAndSupplyCheck() {
        Machine m = PowerMachines.of(rommed("800 mA"));
        int bplus = m.railIndex("bplus");
        int heat = m.railIndex("heat");
        Budget b = new Budget(m);
        assertThat(b.staticLowRail(bplus)).isCloseTo(3.3e-3, within(1e-12));
        assertThat(b.staticHighRail(bplus)).isCloseTo(8.0e-3, within(1e-12));
        // heaters: two 6AU6 in series, 0.3 A, plus one 12AU7 at 12.6 V 0.15 A (hb9aik.ch/notes/serparfil.htm):
        // 0.45 A at 12.6 V is 28 ohm hot; through the 0.01 ohm source the rail divides (Ohm's law) to
        // 12.6 x 28 / 28.01 V, and the heaters take 12.6 / 28.01 A
        Budget.Supply h = b.supply().get(heat);
        assertThat(h.heaterAmps()).isCloseTo(12.6 / 28.01, within(1e-9));
        assertThat(h.voltsAtPeak()).isCloseTo(12.6 * 28 / 28.01, within(1e-7)); // bisection to 1e-9 of the rail
        assertThat(h.marginAmps()).isCloseTo(10 - 12.6 / 28.01, within(1e-9));
        assertThat(b.failed()).isFalse();
    }

    @Test
    void aRailOverItsLimitFailsTheCheck() {
        Machine m = PowerMachines.of(rommed("5 mA"));
        Budget b = new Budget(m, CurrentMeter.ofRun(m, new long[] {0b00, 0b01, 0b11, 0b10}, null, 4, new InitMode.Zero()));
        Budget.Supply s = b.supply().get(m.railIndex("bplus"));
        assertThat(s.simulated()).isTrue();
        // 8 mA at 48 V is a conductance of 8 mA / 48 V; through the 4 ohm source the rail sits at
        // 48 / (1 + 4 x 8 mA / 48 V) and the load draws 8 mA scaled by that over 48 V (Ohm's law)
        double volts = 48 / (1 + 4 * 8.0e-3 / 48);
        assertThat(s.voltsAtPeak()).isCloseTo(volts, within(1e-7));
        assertThat(s.peakAmps()).isCloseTo(8.0e-3 * volts / 48, within(1e-10));
        assertThat(s.over()).isTrue();
        assertThat(s.marginAmps()).isCloseTo(5.0e-3 - 8.0e-3 * volts / 48, within(1e-10));
        assertThat(b.failed()).isTrue();
        assertThat(b.findings()).anySatisfy(f -> assertThat(f.subject()).isEqualTo("rail bplus"));
    }

    @Test
    void aProgramThatStaysLowPassesButTheWorstCaseIsWarned() {
        // 00 and 01 only: peak 5.65 mA under a 7 mA limit, while all-high would be 8 mA
        Machine m = PowerMachines.of(rommed("7 mA"));
        Budget b = new Budget(m, CurrentMeter.ofRun(m, new long[] {0b00, 0b01, 0b01, 0b00}, null, 4, new InitMode.Zero()));
        assertThat(b.failed()).isFalse();
        // stages known only by their typed-in currents are not compared with anything: the rail's warning is the only one
        assertThat(b.findings()).singleElement().satisfies(f -> {
            assertThat(f.severity()).isEqualTo(Finding.Severity.WARNING);
            assertThat(f.subject()).isEqualTo("rail bplus");
        });
    }

    @Test
    void plateDissipationFollowsTheStatedApproximation() {
        Machine m = PowerMachines.of(rommed("800 mA"));
        var inv = m.stages().stream().filter(s -> s.name().equals("counted_inverter")).findFirst().orElseThrow();
        // conducting: 2.4 mA; 48 V - 2.4 mA x 100 k is below 2.4 mA x 4.4 k (ron) = 10.56 V: 25.3 mW
        assertThat(StageDraw.of(m).plateWatts(inv, false)).isCloseTo(2.4e-3 * 2.4e-3 * 4.4e3, within(1e-12));
        // cut off: 0.05 mA; the tube drops 48 V - 0.05 mA x 100 k = 43 V: 2.15 mW
        assertThat(StageDraw.of(m).plateWatts(inv, true)).isCloseTo(0.05e-3 * (48 - 0.05e-3 * 100e3), within(1e-12));
    }
}
