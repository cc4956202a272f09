package org.thermion.power;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.util.HashMap;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Draws are typed-in figures (counted-stages.machine): counted_inverter low 2.4 mA / high 0.05 mA
 * from bplus plus 0.2 mA bias always; counted_flipflop 3.2 mA bplus and 0.6 mA bias always.
 */
class CurrentMeterTest {
    static final String SMALL = PowerMachines.COUNTED_STAGES + """
            rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
            rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
            rail heat  { voltage 12.6 V; source 0.1 ohm; limit 10 A }
            heaters on heat {
              series 2 of 6AU6 across machine
              parallel 12AU7 at 12.6 V
            }
            realize {
              not counted_inverter
              latch counted_flipflop
            }
            module top {
              in a
              out y
              net n
              n = !a
              latch y on phase 1 = n
            }
            machine small {
              clock { phases 2; period 100 us }
              top top
              inputs a
              outputs y
            }
            """;

    @Test
    void stageDrawAddsAlwaysToTheStateDraw() {
        Machine m = PowerMachines.of(SMALL);
        var inv = m.stages().stream().filter(s -> s.name().equals("counted_inverter")).findFirst().orElseThrow();
        int bplus = m.railIndex("bplus");
        int bias = m.railIndex("bias");
        StageDraw d = StageDraw.of(m);
        assertThat(d.origin(inv)).isEqualTo(StageDraw.Origin.DECLARED);
        assertThat(d.amps(inv, bplus, false)).isCloseTo(2.4e-3, within(1e-12));
        assertThat(d.amps(inv, bplus, true)).isCloseTo(0.05e-3, within(1e-12));
        assertThat(d.amps(inv, bias, true)).isCloseTo(0.2e-3, within(1e-12));
        assertThat(d.amps(inv, m.railIndex("heat"), true)).isZero();
    }

    @Test
    void meterFollowsTheOutputNetsPhaseByPhase() {
        Machine m = PowerMachines.of(SMALL);
        int bplus = m.railIndex("bplus");
        int bias = m.railIndex("bias");
        Map<Integer, Long> nets = new HashMap<>();
        int n = PowerMachines.net(m, "n");
        int y = PowerMachines.net(m, "y");
        CurrentMeter meter = new CurrentMeter(m);
        assertThat(meter.peakRail(bplus)).isNaN();

        // cycle 0 phase 1: a = 0, so the inverter output n is high (cut off): 0.05 + 3.2 mA
        nets.put(n, 1L);
        nets.put(y, 0L);
        meter.sample(k -> nets.getOrDefault(k, 0L), 0, 0, 1);
        assertThat(meter.nowRail(bplus)).isCloseTo(3.25e-3, within(1e-12));
        assertThat(meter.nowRail(bias)).isCloseTo(0.8e-3, within(1e-12));

        // cycle 0 phase 2: a = 1 on lane 0, n low (conducting): 2.4 + 3.2 mA
        nets.put(n, 0b10L);
        meter.sample(k -> nets.getOrDefault(k, 0L), 0, 0, 2);
        assertThat(meter.nowRail(bplus)).isCloseTo(5.6e-3, within(1e-12));
        // lane 1 still sees n high
        CurrentMeter lane1 = new CurrentMeter(m);
        lane1.sample(k -> nets.getOrDefault(k, 0L), 1, 0, 2);
        assertThat(lane1.nowRail(bplus)).isCloseTo(3.25e-3, within(1e-12));

        // cycle 1 phase 1: back to n high; the flip-flop's state changes nothing (it draws always)
        nets.put(n, 1L);
        nets.put(y, 1L);
        meter.sample(k -> nets.getOrDefault(k, 0L), 0, 1, 1);
        assertThat(meter.samples()).isEqualTo(3);
        assertThat(meter.minRail(bplus)).isCloseTo(3.25e-3, within(1e-12));
        assertThat(meter.peakRail(bplus)).isCloseTo(5.6e-3, within(1e-12));
        assertThat(meter.meanRail(bplus)).isCloseTo((3.25e-3 * 2 + 5.6e-3) / 3, within(1e-12));
        assertThat(meter.peakCycle(bplus)).isEqualTo(0);
        assertThat(meter.peakPhase(bplus)).isEqualTo(2);
        assertThat(meter.peakModule(0, bplus)).isCloseTo(5.6e-3, within(1e-12));
        assertThat(meter.minRail(bias)).isCloseTo(meter.peakRail(bias), within(1e-15));
        assertThat(meter.nowRail(m.railIndex("heat"))).isZero();
    }
}
