package org.thermion.power.startup;

import org.junit.jupiter.api.Test;
import org.thermion.model.Relay;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class RelayDriverCheckTest {
    // 12 V automotive-style relay: coil about 100 ohm, pick-up <= 7.2 V (dtsheet.com/doc/683071), operate <= 10 ms.
    private static final Relay RELAY = new Relay(100, 12, 7.2, 1.2, 0.010, Double.NaN);

    @Test
    void a2D21From24VoltsThroughFiftyOhmsBringsTheCoilNearItsRating() {
        // 2D21 drop about 8 V (from memory; 8-12 V on the vacuumtubes.io 2D21W page); 100 mA average, 500 mA peak.
        RelayDriverCheck c = RelayDriverCheck.of("2D21", "relay", 24, 0, 8, 50, RELAY, 0.100, 0.500, Double.NaN, 10);
        // By hand: (24 - 8) / (50 + 100) = 0.1067 A; 10.67 V on the coil.
        assertThat(c.coilAmps()).isCloseTo(16.0 / 150.0, within(1e-12));
        assertThat(c.coilVolts()).isCloseTo(10.667, within(0.001));
        assertThat(c.ratedRatio()).isBetween(0.85, 1.0);
        assertThat(c.picksUp()).isTrue();
        assertThat(c.coilNotOverdriven()).isTrue();
        assertThat(c.peakOk()).isTrue();
        // ... but 107 mA continuous is just over the 2D21's 100 mA average rating: flagged.
        assertThat(c.averageOk()).isFalse();
        assertThat(c.ok()).isFalse();
    }

    @Test
    void theUpperEndOfTheDropStillPicksUp() {
        // 12 V drop (the top of the 8-12 V range): (24 - 12) / 150 = 80 mA, 8.0 V on the coil, above 7.2 V pick-up.
        RelayDriverCheck c = RelayDriverCheck.of("2D21", "relay", 24, 0, 12, 50, RELAY, 0.100, 0.500, Double.NaN, 10);
        assertThat(c.coilVolts()).isCloseTo(8.0, within(1e-9));
        assertThat(c.picksUp()).isTrue();
        assertThat(c.averageOk()).isTrue();
    }

    @Test
    void aLargePlateResistorLeavesTheRelayOut() {
        RelayDriverCheck c = RelayDriverCheck.of("2D21", "relay", 24, 0, 8, 150, RELAY, 0.100, 0.500, Double.NaN, 10);
        // (24 - 8) / 250 * 100 = 6.4 V, below the 7.2 V pick-up.
        assertThat(c.coilVolts()).isCloseTo(6.4, within(1e-9));
        assertThat(c.picksUp()).isFalse();
    }

    @Test
    void firingBeforeTheCathodeHeatingTimeIsFlagged() {
        // 2D21: cathode heating >= 10 s before anode voltage (from memory, REFERENCES.md).
        assertThat(RelayDriverCheck.of("2D21", "r", 24, 0, 8, 70, RELAY, 0.1, 0.5, 6.0, 10).heatedLongEnough()).isFalse();
        assertThat(RelayDriverCheck.of("2D21", "r", 24, 0, 8, 70, RELAY, 0.1, 0.5, 12.0, 10).heatedLongEnough()).isTrue();
    }
}
