package org.thermion.cli;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** {@code sheets parts} for people: every value with its own unit, so a 0.2 ohm and a 2.2 Mohm part both read. */
class SheetsPartsTest {

    @Test
    void valuesAndWattsCarryTheirOwnUnits() {
        assertThat(SheetsParts.ohms(0.2)).isEqualTo("0.2 ohm");
        assertThat(SheetsParts.ohms(0.00068)).isEqualTo("0.00068 ohm");
        assertThat(SheetsParts.ohms(51)).isEqualTo("51.0 ohm");
        assertThat(SheetsParts.ohms(2.2e6)).isEqualTo("2.20 Mohm");
        assertThat(SheetsParts.ohms(Double.NaN)).isEqualTo("none");
        assertThat(SheetsParts.watts(0.125)).isEqualTo("0.125 W");
        assertThat(SheetsParts.watts(200)).isEqualTo("200 W");
    }

    @Test
    void thePumpStationsSoftStartResistorIsOrderedAtItsValueAndDeclaredRating() {
        TimingCommandTest.Run r = TimingCommandTest.run("sheets", "parts", "examples/pumpstation/pumpstation.machine");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        // examples/pumpstation: softstart heater_soft, resistor 0.2 ohm rated 200 W (E24 keeps 0.2)
        assertThat(r.out()).containsPattern("power resistor +0\\.2 ohm +200 W +none +1 ");
        // the plate resistor of its thyratron: 53 ohm, E24 51 ohm (IEC 60063)
        assertThat(r.out()).containsPattern("resistor +51\\.0 ohm ");
    }
}
