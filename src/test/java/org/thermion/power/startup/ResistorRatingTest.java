package org.thermion.power.startup;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

@Timeout(value = 60, unit = TimeUnit.SECONDS)
class ResistorRatingTest {

    @Test
    void theShortTimeOverloadFixesTheThermalTimeConstant() {
        // 10 x rated power for 5 s (REFERENCES.md, common practice): 10 (1 - exp(-5 / tau)) = 1.
        ResistorRating r = ResistorRating.COMMON_PRACTICE;
        assertThat(10 * (1 - Math.exp(-5 / r.tau()))).isCloseTo(1.0, within(1e-12));
        assertThat(r.tau()).isCloseTo(47.46, within(0.01));
    }

    @Test
    void aPowerResistorCarryingMoreThanItsRatingForAFewSecondsIsWithinRating() {
        // Our own scenario: 88 small tubes behind 2 ohm rated 100 W, bypassed after 3 s. The resistor averages more
        // than 100 W while in circuit, which a power resistor is built to take for seconds.
        StartupNetwork net = StartupNetwork.of(StartupMachines.elaborate(
                        StartupMachines.inverters(88, "2 ohm", "after 3 s", "40 A").replace("rated 150 W", "rated 100 W")),
                ThermalAssumptions.standard(), DrawMode.HIGHEST);
        SoftStartResult s = net.solve(PowerUpOptions.defaults()).softStarts().get(0);
        assertThat(s.meanWatts()).isGreaterThan(100);
        assertThat(s.withinRating()).isTrue();
        assertThat(s.neededWatts()).isLessThan(100).isGreaterThan(0);
        // Held in circuit for the whole run, the same resistor heats past its rating.
        SoftStartResult held = net.solve(PowerUpOptions.defaults().withHoldBypass(true).withSeconds(120)).softStarts().get(0);
        assertThat(held.neededWatts()).isGreaterThan(s.neededWatts());
        assertThat(held.suggestedWatts()).isGreaterThanOrEqualTo(held.neededWatts());
    }

    @Test
    void preferredValuesComeFromTheE12AndE24Series() {
        // IEC 60063: E24 holds 1.6, 1.8, 2.0, 9.1; E12 holds 1.8, 2.2, 4.7 but not 2.0 or 9.1.
        assertThat(PreferredValues.nearestE24(1.75)).isCloseTo(1.8, within(1e-12));
        assertThat(PreferredValues.nearestE24(0.196)).isCloseTo(0.2, within(1e-12));
        assertThat(PreferredValues.nearestE24(9.4)).isCloseTo(9.1, within(1e-12));
        assertThat(PreferredValues.nearestE24(9.6)).isCloseTo(10.0, within(1e-12));
        assertThat(PreferredValues.nearestE24(470)).isCloseTo(470, within(1e-9));
        assertThat(PreferredValues.isE12(2.2)).isTrue();
        assertThat(PreferredValues.isE12(2.0)).isFalse();
        assertThat(PreferredValues.nearestE12(2.0)).isCloseTo(2.2, within(1e-12));
        assertThat(ResistorRating.commonWatts(110)).isEqualTo(150);
    }
}
