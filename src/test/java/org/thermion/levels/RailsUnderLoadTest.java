package org.thermion.levels;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.MachineCircuits;
import org.thermion.model.Machine;

class RailsUnderLoadTest {
    /** src/test/resources/org/thermion/power/four-inverters.machine behind {@code ohms} of source. */
    private static Machine four(String ohms) {
        try {
            return LevelAnalysisTest.load(java.nio.file.Files.readString(
                    java.nio.file.Path.of("src/test/resources/org/thermion/power/four-inverters.machine")).formatted(ohms))
                    .machine();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void theLevelsStandAtTheHeaviestLoadsVoltageAndReachUpToTheLightestLoads() {
        // Hand check (Ohm's law, the loads as conductances, as budget takes them): heaviest 4 x 2 mA at
        // 48 V behind 100 ohm, V = 48 / (1 + 100 x 8 mA / 48 V) = 47.213 V; lightest 4 x 0.5 mA: 47.801 V.
        Machine m = four("100 ohm");
        RailsUnderLoad r = RailsUnderLoad.of(m, MachineCircuits.of(m), 0.05);
        assertThat(r.problem()).isNull();
        assertThat(r.volts("bplus")).isCloseTo(48 / (1 + 0.8 / 48), within(1e-6));
        assertThat(r.lightRise().get("bplus")).isCloseTo((1 + 0.8 / 48) / (1 + 0.2 / 48), within(1e-9));
        // no source resistance: the heater rail stands at its declared voltage and does not rise
        assertThat(r.volts("heat")).isEqualTo(6.3);
        assertThat(r.lightRise()).doesNotContainKey("heat");
    }

    @Test
    void aRailSaggingPastItsToleranceLeavesTheLevelsAtTheDeclaredVoltagesAndSaysWhy() {
        // 8 mA behind 1 k: 48 / (1 + 8 / 48) = 41.1 V, 14.3 % down, past 5 %
        Machine m = four("1 k");
        RailsUnderLoad r = RailsUnderLoad.of(m, MachineCircuits.of(m), 0.05);
        assertThat(r.problem()).contains("rail bplus sags 14.3 %", "past its ±5 %");
        assertThat(r.volts("bplus")).isEqualTo(48);
        assertThat(r.lightRise()).isEmpty();
    }
}
