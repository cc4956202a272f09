package org.thermion.power.startup;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class TungstenResistivityTest {
    private final TungstenResistivity rho = TungstenResistivity.table();

    @Test
    void passesThroughEveryTabulatedPoint() {
        // REFERENCES.md tungsten table: CRC (from memory) 293-900 K, Jones & Langmuir (from memory) 1000-1500 K,
        // tungsten.com materials page at 2000 K.
        double[][] table = {{293, 5.28}, {300, 5.44}, {400, 7.83}, {500, 10.3}, {600, 13.0}, {700, 15.7}, {800, 18.6},
                {900, 21.5}, {1000, 24.93}, {1100, 27.94}, {1200, 30.98}, {1300, 34.08}, {1400, 37.19}, {1500, 40.36},
                {2000, 55.7}};
        for (double[] p : table) {
            assertThat(rho.at(p[0])).as("rho at %s K", p[0]).isCloseTo(p[1], within(1e-9));
        }
    }

    @Test
    void risesMonotonicallyBetweenPoints() {
        double last = 0;
        for (double t = 250; t <= 2200; t += 5) {
            double v = rho.at(t);
            assertThat(v).as("rho at %s K", t).isGreaterThan(last);
            last = v;
        }
    }

    @Test
    void coldToHotRatioOfTheTableIsAboutSeven() {
        // REFERENCES.md: "the table gives about 7 between 293 K and 1400 K": 37.19 / 5.28 = 7.04 by hand.
        assertThat(rho.at(1400) / rho.at(293)).isCloseTo(7.04, within(0.01));
    }
}
