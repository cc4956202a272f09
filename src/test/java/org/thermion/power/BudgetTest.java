package org.thermion.power;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Static budget figures; stage draws are the parts library's declarations. */
class BudgetTest {
    @Test
    void theBypassThyratronHoldsItsRelayOnceRunning() {
        // thyratron_relay: draw high relay 75 mA; once fired it conducts, so lowest = highest = 75 mA.
        // Its plate dissipation is the arc drop times the current: 8 V (from memory) x 75 mA = 0.6 W.
        Machine m = PowerMachines.of(HeaterAnalysisTest.LONE_THYRATRON);
        Budget b = new Budget(m);
        int relay = m.railIndex("relay");
        int soft = m.modules().stream().filter(x -> x.type().equals("softstart")).findFirst().orElseThrow().id();
        assertThat(b.staticLow(soft, relay)).isCloseTo(0.075, within(1e-12));
        assertThat(b.staticHigh(soft, relay)).isCloseTo(0.075, within(1e-12));
        assertThat(b.staticPlateWatts(soft, false)).isCloseTo(0.6, within(1e-12));
        assertThat(b.drawsOn(0, relay)).isFalse();
    }

    @Test
    void staticBoundsAddEachInstancesOwnExtremes() {
        // two pentode_inverter stages: each 0.05 mA (cut off) to 2.4 mA (conducting) from bplus, 0.2 mA bias always
        Machine m = PowerMachines.of(HeaterAnalysisTest.LONE_THYRATRON);
        Budget b = new Budget(m);
        int bplus = m.railIndex("bplus");
        int bias = m.railIndex("bias");
        assertThat(b.staticLowRail(bplus)).isCloseTo(2 * 0.05e-3, within(1e-12));
        assertThat(b.staticHighRail(bplus)).isCloseTo(2 * 2.4e-3, within(1e-12));
        assertThat(b.staticLowRail(bias)).isCloseTo(0.4e-3, within(1e-12));
        assertThat(b.staticHighRail(bias)).isCloseTo(0.4e-3, within(1e-12));
        // heater rail: two 6AU6 in series 0.3 A plus the lone 2D21 at twice its rating, 12.6 V / 10.5 ohm = 1.2 A:
        // 1.5 A at 12.6 V is 8.4 ohm hot; through the 0.02 ohm source (Ohm's law) 12.6 / 8.42 A
        Budget.Supply heat = b.supply().get(m.railIndex("heat"));
        assertThat(heat.heaterAmps()).isCloseTo(12.6 / 8.42, within(1e-9));
        assertThat(heat.simulated()).isFalse();
        assertThat(b.failed()).isTrue();
    }
}
