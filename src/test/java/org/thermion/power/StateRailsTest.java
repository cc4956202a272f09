package org.thermion.power;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

class StateRailsTest {
    /** src/test/resources/org/thermion/power/four-inverters.machine behind {@code ohms} of source. */
    static String fourInverters(String ohms) {
        try {
            return java.nio.file.Files.readString(
                    java.nio.file.Path.of("src/test/resources/org/thermion/power/four-inverters.machine")).formatted(ohms);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void aRailSagsByWhatTheStateDrawsThroughItsSourceResistance() {
        // Four inverters of our own typed at 2 mA with the output low and 0.5 mA high, on a 48 V rail behind
        // 100 ohm, the loads as conductances (as budget takes them). Hand check, Ohm's law:
        // all low: V = 48 / (1 + 100 x 8 mA / 48 V) = 47.213 V; all high: 48 / (1 + 100 x 2 mA / 48 V) = 47.801 V.
        Machine m = PowerMachines.of(fourInverters("100 ohm"));
        StateRails rails = new StateRails(m, StageDraw.of(m));
        assertThat(rails.volts(net -> false)[0]).isCloseTo(48 / (1 + 0.8 / 48), within(1e-6));
        assertThat(rails.volts(net -> true)[0]).isCloseTo(48 / (1 + 0.2 / 48), within(1e-6));
        // no source resistance: the heater rail stands at its declared voltage in every state
        assertThat(rails.volts(net -> true)[1]).isEqualTo(6.3);
    }
}
