package org.thermion.sim.run;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** Bits as text: a bit as itself, a bus in hexadecimal, an 'x' digit where a bit is unknown. */
class LevelsTest {
    @Test
    void aBusIsHexWithTheLeastSignificantBitFirstInTheInput() {
        // 1101 0011 read LSB first is 0xcb... spelled out: bits 0,1 set, 4 set, 6,7 set = 0b1101_0011 = 0xd3.
        assertThat(Levels.text("11001011".toCharArray())).isEqualTo("0xd3");
        assertThat(Levels.text("1".toCharArray())).isEqualTo("1");
        assertThat(Levels.text("x".toCharArray())).isEqualTo("x");
        // Nine bits take three digits; an unknown bit spoils only its own digit.
        assertThat(Levels.text("000000001".toCharArray())).isEqualTo("0x100");
        assertThat(Levels.text("1000x000".toCharArray())).isEqualTo("0xx1");
        assertThat(Levels.hex(0x2a, 8)).isEqualTo("0x2a");
        assertThat(Levels.hex(5, 12)).isEqualTo("0x005");
    }
}
