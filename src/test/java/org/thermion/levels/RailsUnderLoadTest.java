package org.thermion.levels;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.MachineCircuits;
import org.thermion.model.Machine;

class RailsUnderLoadTest {
    /** Four inverters of our own typed at 2 mA low and 0.5 mA high on a 48 V rail behind {@code ohms}. */
    private static Machine four(String ohms) {
        return LevelAnalysisTest.load("""
                rail bplus { voltage 48 V; source %s }
                rail heat { voltage 6.3 V }
                tube TX1 { kind triode; sections 1; heater 6.3 V 300 mA }
                heaters on heat { parallel TX1 at 6.3 V }
                stage inv : not { tube TX1; draw low bplus 2 mA; draw high bplus 0.5 mA }
                realize { not inv }
                module top { in a, b, c, d
                  out w, x, y, z
                  w = !a
                  x = !b
                  y = !c
                  z = !d }
                machine r { top top; inputs a b c d; outputs w x y z }
                """.formatted(ohms)).machine();
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
