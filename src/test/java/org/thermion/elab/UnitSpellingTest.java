package org.thermion.elab;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** The unit a builder meant when the word written is not one Thermion reads. */
class UnitSpellingTest {
    @Test
    void caseSlipsAndSpeltOutUnitsNameTheWordToWrite() {
        assertThat(Unit.meant("K", Unit.OHM)).isEqualTo("k");
        assertThat(Unit.meant("kohm", Unit.OHM)).isEqualTo("k");
        assertThat(Unit.meant("meg", Unit.OHM)).isEqualTo("M");
        assertThat(Unit.meant("R", Unit.OHM)).isEqualTo("ohm");
        assertThat(Unit.meant("ma", Unit.AMPERE)).isEqualTo("mA");
        assertThat(Unit.meant("volts", Unit.VOLT)).isEqualTo("V");
        assertThat(Unit.meant("v", Unit.VOLT)).isEqualTo("V");
        assertThat(Unit.meant("UF", Unit.FARAD)).isEqualTo("uF");
    }

    @Test
    void aWordOfAnotherDimensionOrNoUnitAtAllNamesNone() {
        assertThat(Unit.meant("MA", Unit.OHM)).isNull(); // milli- or mega-amperes: not a resistance either way
        assertThat(Unit.meant("MA")).isEqualTo("mA");
        assertThat(Unit.meant("from")).isNull(); // the next word of `load 100 from bplus`: the unit is missing
        assertThat(Unit.meant("MS", Unit.SECOND)).isEqualTo("ms");
        assertThat(Unit.meant("mv", Unit.VOLT)).isEqualTo("mV");
    }
}
