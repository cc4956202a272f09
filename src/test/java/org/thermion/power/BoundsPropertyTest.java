package org.thermion.power;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;

import java.nio.file.Path;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The static lowest and highest bound every state, so on any program the simulated
 * min, mean and peak lie between them, per module and per rail, and the module figures
 * add up to the rail figures. Random ROM images on the demo machine, seeded.
 */
class BoundsPropertyTest {
    private static final double EPS = 1e-12;

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void simulatedCurrentsStayWithinTheStaticBounds() {
        Machine m = PowerMachines.file(Path.of("examples/pumpstation/pumpstation.machine"));
        for (long seed = 1; seed <= 6; seed++) {
            Random rnd = new Random(seed);
            long[] rom = new long[m.rom().words()];
            for (int i = 0; i < rom.length; i++) {
                rom[i] = rnd.nextLong() & ((1L << m.rom().width()) - 1);
            }
            CurrentMeter meter = CurrentMeter.ofRun(m, rom, null, 150, new InitMode.Random(seed));
            Budget b = new Budget(m, meter);
            String where = "seed " + seed;
            for (int r = 0; r < m.rails().size(); r++) {
                double min = 0, mean = 0, now = 0;
                for (int mod = 0; mod < m.modules().size(); mod++) {
                    assertThat(meter.minModule(mod, r)).as(where).isGreaterThanOrEqualTo(b.staticLow(mod, r) - EPS);
                    assertThat(meter.peakModule(mod, r)).as(where).isLessThanOrEqualTo(b.staticHigh(mod, r) + EPS);
                    assertThat(meter.meanModule(mod, r)).as(where)
                            .isBetween(meter.minModule(mod, r) - EPS, meter.peakModule(mod, r) + EPS);
                    mean += meter.meanModule(mod, r);
                    now += meter.nowModule(mod, r);
                    min += meter.minModule(mod, r);
                }
                assertThat(meter.meanRail(r)).as(where).isCloseTo(mean, within(1e-9));
                assertThat(meter.nowRail(r)).as(where).isCloseTo(now, within(1e-9));
                // the rail's minimum is no lower than the sum of the module minima
                assertThat(meter.minRail(r)).as(where).isGreaterThanOrEqualTo(min - EPS);
                assertThat(meter.minRail(r)).as(where).isGreaterThanOrEqualTo(b.staticLowRail(r) - EPS);
                assertThat(meter.peakRail(r)).as(where).isLessThanOrEqualTo(b.staticHighRail(r) + EPS);
            }
        }
    }
}
