package org.thermion.power.startup;

import org.junit.jupiter.api.Test;
import org.thermion.model.HeaterRating;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The budget's steady heater law is the power-up model's equilibrium. */
class SteadyHeatersTest {
    private static final Machine M = StartupMachines.elaborate(StartupMachines.inverters(4, "2 ohm", "after 5 s", "40 A"));

    private static int tube(String name) {
        for (int i = 0; i < M.tubes().size(); i++) {
            if (M.tubes().get(i).name().equals(name)) {
                return i;
            }
        }
        throw new AssertionError(name);
    }

    @Test
    void ratedCurrentGivesTheHotResistance() {
        // the model balances rated power at its hot temperature, so rated current settles there: 6.3 V / 0.3 A = 21 ohm
        HeaterRating r = new HeaterRating(6.3, 0.3);
        SteadyHeaters law = SteadyHeaters.of(M);
        assertThat(law.ohms(tube("6AU6"), r, 0.3)).isCloseTo(21.0, within(1e-6));
    }

    @Test
    void belowRatingTheWireRunsCoolerAndItsCurrentFallsLessThanTheVoltage() {
        // Tungsten filaments near their rating: current goes as about the 0.55th power of voltage
        // (incandescent-lamp exponents, from memory: lighting handbooks give 0.55 to 0.6).
        // Solve I R(I) = 0.9 x 6.3 V by bisection and compare with 0.3 A x 0.9^0.55 within 3 %.
        HeaterRating r = new HeaterRating(6.3, 0.3);
        SteadyHeaters law = SteadyHeaters.of(M);
        int t = tube("6AU6");
        double lo = 0, hi = 0.6;
        for (int k = 0; k < 100; k++) {
            double i = 0.5 * (lo + hi);
            if (i * law.ohms(t, r, i) > 0.9 * 6.3) {
                hi = i;
            } else {
                lo = i;
            }
        }
        double amps = 0.5 * (lo + hi);
        assertThat(amps).isCloseTo(0.3 * Math.pow(0.9, 0.55), within(0.03 * 0.3 * Math.pow(0.9, 0.55)));
        assertThat(amps).isGreaterThan(0.9 * 0.3); // cooler wire, lower resistance: more than Ohm's law at hot R
    }
}
