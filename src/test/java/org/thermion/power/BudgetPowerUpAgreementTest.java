package org.thermion.power;

import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.power.startup.PowerUpOptions;
import org.thermion.power.startup.PowerUpResult;
import org.thermion.power.startup.PowerUpSolver;
import org.thermion.power.startup.RailTransient;
import org.thermion.power.startup.SteadyHeaters;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * {@code budget} and {@code powerup} give one figure for one rail and state: the budget's supply
 * check (every stage at its highest draw, heaters in equilibrium at the loaded rail) is the
 * power-up transient's end state once everything has warmed (600 s; highest draws, the default),
 * on the bundled examples. Both take the same stage figures ({@link StageDraw}), the same heater
 * physics ({@link SteadyHeaters}) and the rail's source resistance; what is left is the transient's
 * settling (it still moves a little at 600 s), so 0.5 % is asked. Currents are magnitudes in both,
 * rail volts signed as declared (the bias rail negative).
 */
class BudgetPowerUpAgreementTest {
    @ParameterizedTest
    @ValueSource(strings = {"examples/pumpstation/pumpstation.machine", "examples/decoder-board/decoder-board.machine"})
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void theSupplyCheckIsThePowerUpsSteadyState(String file) {
        Machine m = PowerMachines.file(Path.of(file));
        Budget b = new Budget(StageDraw.of(m), null, SteadyHeaters.of(m));
        PowerUpResult pu = PowerUpSolver.solve(m, PowerUpOptions.defaults().withSeconds(600).withSampleSeconds(1));
        int compared = 0;
        for (int r = 0; r < m.rails().size(); r++) {
            Rail rail = m.rails().get(r);
            Budget.Supply s = b.supply().get(r);
            RailTransient t = pu.rail(r);
            assertThat(t.volts()).as("powerup's volts of %s, signed as declared", rail.name()).isEqualTo(rail.volts());
            assertThat(s.peakAmps()).as("budget's current of %s, a magnitude", rail.name()).isGreaterThanOrEqualTo(0);
            assertThat(t.finalAmps()).as("powerup's current of %s, a magnitude", rail.name()).isGreaterThanOrEqualTo(0);
            if (!t.hasLoad()) {
                continue;
            }
            assertThat(s.peakAmps()).as("%s: budget peak against powerup's end", rail.name())
                    .isCloseTo(t.finalAmps(), within(0.005 * t.finalAmps()));
            double bus = Math.abs(t.busVolts()[t.busVolts().length - 1]);
            assertThat(s.voltsAtPeak()).as("%s: loaded volts", rail.name()).isCloseTo(bus, within(0.005 * bus));
            compared++;
        }
        assertThat(compared).isGreaterThanOrEqualTo(3);
    }
}
