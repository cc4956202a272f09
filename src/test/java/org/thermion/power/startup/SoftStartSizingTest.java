package org.thermion.power.startup;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.Machine;

import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

@Timeout(value = 120, unit = TimeUnit.SECONDS)
class SoftStartSizingTest {
    /** The 88-inverter machine of StartupMachines with its soft start taken out. */
    private static Machine bare() {
        String text = StartupMachines.inverters(88, "2 ohm", "after 10 s", "40 A");
        int from = text.indexOf("softstart heat_soft");
        int to = text.indexOf("}", from) + 1;
        return StartupMachines.elaborate(text.substring(0, from) + text.substring(to));
    }

    private static int heatRail(Machine m) {
        return m.railIndex("heat");
    }

    @Test
    void oneHeldTrajectoryGivesWhatAFullRunWithThatBypassGives() {
        Machine m = bare();
        StartupNetwork net = StartupNetwork.of(m, ThermalAssumptions.standard(), DrawMode.HIGHEST);
        SoftStartSizing.Table t = SoftStartSizing.run(net, PowerUpOptions.defaults(), heatRail(m), new double[] {1.5, 3},
                new double[] {4, 10}, 1);
        // The same machine with that soft start declared, bypassed after (t - 10 ms operate): the full solve.
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                double r = t.ohms()[i], s = t.seconds()[j];
                Machine declared = StartupMachines.elaborate(StartupMachines.inverters(88, r + " ohm",
                        "after " + (s - 0.01) + " s", "40 A"));
                RailTransient full = PowerUpSolver.solve(declared, PowerUpOptions.defaults().withSampleSeconds(0))
                        .rails().get(heatRail(declared));
                SoftStartSizing.Cell c = t.cells()[i][j];
                assertThat(c.switchOnPeak()).as(r + " ohm, " + s + " s").isCloseTo(full.switchOnPeak(), within(0.005 * full.switchOnPeak()));
                assertThat(c.bypassPeak()).as(r + " ohm, " + s + " s").isCloseTo(full.bypassPeak(), within(0.01 * full.bypassPeak()));
            }
        }
    }

    @Test
    void theBalancePointAtTenSecondsLiesNearTwoOhmsAndThreadsChangeNothing() {
        Machine m = bare();
        StartupNetwork net = StartupNetwork.of(m, ThermalAssumptions.standard(), DrawMode.HIGHEST);
        double[] ohms = ResistorSweep.range(0.5, 4, 0.25), times = {6, 8, 10, 12};
        SoftStartSizing.Table one = SoftStartSizing.run(net, PowerUpOptions.defaults(), heatRail(m), ohms, times, 1);
        SoftStartSizing.Table two = SoftStartSizing.run(net, PowerUpOptions.defaults(), heatRail(m), ohms, times, 2);
        for (int i = 0; i < ohms.length; i++) {
            for (int j = 0; j < times.length; j++) {
                assertThat(two.cells()[i][j]).isEqualTo(one.cells()[i][j]);
            }
        }
        // At a 10 s bypass the balance of the two peaks lies between 1.5 and 2.25 ohm (PowerUpSolverTest's sweep).
        int j10 = 2;
        int bi = 0;
        for (int i = 1; i < ohms.length; i++) {
            if (one.cells()[i][j10].worstPeak() < one.cells()[bi][j10].worstPeak()) {
                bi = i;
            }
        }
        assertThat(ohms[bi]).isBetween(1.5, 2.25);
        // Over both axes, a later bypass lets a smaller resistor balance: the best cell is no worse than at 10 s.
        assertThat(one.best()).isNotNull();
        assertThat(one.best().worstPeak()).isLessThanOrEqualTo(one.cells()[bi][j10].worstPeak());
        assertThat(one.preferredOhms()).isCloseTo(PreferredValues.nearestE24(ohms[one.bestOhm()]), within(1e-12));
    }
}
