package org.thermion.power;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Static budget figures: the library's thyratron relay solved from its circuit, checked against Ohm's
 * law; the bounds' arithmetic over stages with typed-in currents (counted-stages.machine).
 */
class BudgetTest {
    @Test
    void theBypassThyratronHoldsItsRelayOnceRunning() {
        // thyratron_relay (library): once fired the 2D21 holds its arc drop (8 V, the tube block's) and the
        // 24 V relay rail drives the 53 ohm plate resistor, the 160 ohm coil and the solver's 1 ohm arc
        // resistance (Element.Arc.ARC_OHMS) in series: I = (24 - 8) / 214 = 74.8 mA (Ohm's law). It stays
        // fired, so the bypass module draws it at its lowest as at its highest.
        Machine m = PowerMachines.of(HeaterAnalysisTest.LONE_THYRATRON);
        Budget b = new Budget(m);
        int relay = m.railIndex("relay");
        int soft = m.modules().stream().filter(x -> x.type().equals("softstart")).findFirst().orElseThrow().id();
        double amps = (24 - 8.0) / (53 + 160 + 1);
        assertThat(b.staticLow(soft, relay)).isCloseTo(amps, within(1e-6 * amps));
        assertThat(b.staticHigh(soft, relay)).isCloseTo(amps, within(1e-6 * amps));
        // its plate dissipation is the voltage across the arc (drop plus I x 1 ohm) times the current
        assertThat(b.staticPlateWatts(soft, false)).isCloseTo(amps * (8 + amps * 1), within(1e-6));
        assertThat(b.drawsOn(0, relay)).isFalse();
    }

    @Test
    void staticBoundsAddEachInstancesOwnExtremes() {
        // two counted_inverter stages: each 0.05 mA (cut off) to 2.4 mA (conducting) from bplus, 0.2 mA bias always
        Machine m = PowerMachines.of(PowerMachines.COUNTED_STAGES
                + HeaterAnalysisTest.LONE_THYRATRON.replace("not pentode_inverter", "not counted_inverter"));
        Budget b = new Budget(m);
        int bplus = m.railIndex("bplus");
        int bias = m.railIndex("bias");
        // the top module holds the inverters (the soft start's thyratron, module 1, adds its own grid divider)
        assertThat(b.staticLow(0, bplus)).isCloseTo(2 * 0.05e-3, within(1e-12));
        assertThat(b.staticHigh(0, bplus)).isCloseTo(2 * 2.4e-3, within(1e-12));
        assertThat(b.staticLow(0, bias)).isCloseTo(0.4e-3, within(1e-12));
        assertThat(b.staticHigh(0, bias)).isCloseTo(0.4e-3, within(1e-12));
        // the rails add every module's: the thyratron's divider, 100 k + 100 k, carries (48 V + 24 V) / 200 k from
        // the B+ that drives its grid to the bias rail once fired (Ohm's law)
        double divider = (48 + 24) / 200e3;
        assertThat(b.staticLowRail(bplus)).isCloseTo(2 * 0.05e-3 + divider, within(1e-6 * divider));
        assertThat(b.staticHighRail(bias)).isCloseTo(0.4e-3 + divider, within(1e-6 * divider));
        // heater rail: two 6AU6 in series 0.3 A plus the lone 2D21 at twice its rating, 12.6 V / 10.5 ohm = 1.2 A:
        // 1.5 A at 12.6 V is 8.4 ohm hot; through the 0.02 ohm source (Ohm's law) 12.6 / 8.42 A
        Budget.Supply heat = b.supply().get(m.railIndex("heat"));
        assertThat(heat.heaterAmps()).isCloseTo(12.6 / 8.42, within(1e-9));
        assertThat(heat.simulated()).isFalse();
        assertThat(b.failed()).isTrue();
    }
}
