package org.thermion.tui;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.power.CurrentMeter;

import java.io.IOException;
import java.time.Duration;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Whole screens after scripted keys, read back from the virtual terminal and compared with
 * golden screens (src/test/resources/org/thermion/tui/); the key facts are also asserted
 * one by one so a failure says what went wrong. Program facts: see SessionTest.
 */
class ScreenTest {

    @Test
    void sixCyclesFromADryTankLightThePumpAndTheStoreLine() throws IOException {
        UiFixture f = new UiFixture(120, 40).type("cccccc");
        assertThat(f.text()).contains(Glyphs.LAMP_ON + " pump ").contains(Glyphs.LAMP_OFF + " alarm");
        assertThat(f.line("decode lines")).isNotEmpty();
        assertThat(f.text()).contains(Glyphs.LAMP_ON + " ST ").contains(Glyphs.LAMP_OFF + " LDN");
        assertThat(f.status()).contains(" cycle 6 ").contains("next up 06 LD high_sw");
        assertThat(f.line("06 101")).contains(String.valueOf(Glyphs.PC_NEXT));
        // Power figures on screen are the meter's, in mA with one decimal.
        CurrentMeter meter = f.session.meter();
        int bplus = f.session.machine().railIndex("bplus");
        String now = PowerPanel.amps(meter.nowRail(bplus));
        String peak = PowerPanel.amps(meter.peakRail(bplus));
        assertThat(f.line("bplus   ")).contains(now).contains(peak).contains("800.0 mA");
        f.assertGolden("pump-on-after-six-cycles.txt");
    }

    @Test
    void aBreakpointOnTheAlarmStoreStopsARunWithTheSwitchesDisagreeing() throws IOException {
        UiFixture f = new UiFixture(120, 40);
        f.type("2"); // high wet, low dry
        int line = f.session.listingIndex(8);
        while (f.ui.view().cursor < line) {
            f.type("j");
        }
        f.type("b ");
        for (int i = 0; i < 100 && f.session.running(); i++) {
            f.ui.runFor(1_000_000L);
        }
        f.ui.draw();
        assertThat(f.status()).contains(" cycle 8 ").contains("stopped: breakpoint at 08").contains("next up 08 ST alarm");
        assertThat(f.text()).contains(Glyphs.LAMP_OFF + " alarm");
        f.assertGolden("breakpoint-before-alarm.txt");
        f.type("c");
        assertThat(f.text()).contains(Glyphs.LAMP_ON + " alarm");
        assertThat(f.line("output changes")).isNotEmpty();
        assertThat(f.text()).contains("8.2 " + Glyphs.LAMP_ON + " alarm");
    }

    @Test
    void unknownPowerUpShowsHalfLitLampsAndTheStopReason() throws IOException {
        UiFixture f = new UiFixture(UiFixture.session(new org.thermion.sim.InitMode.Unknown()), 120, 40);
        assertThat(f.text()).contains(Glyphs.LAMP_UNKNOWN + " acc").contains(Glyphs.LAMP_UNKNOWN + " pump");
        assertThat(f.line("THERMION")).contains("latches start unknown");
        f.type("1 ");
        for (int i = 0; i < 100 && f.session.running(); i++) {
            f.ui.runFor(1_000_000L);
        }
        f.ui.draw();
        assertThat(f.status()).contains(" cycle 2 ").contains("stopped: unknown value on acc");
        f.assertGolden("unknown-reaches-acc.txt");
    }

    @Test
    void theHelpOverlayListsTheKeys() throws IOException {
        UiFixture f = new UiFixture(120, 40).type("?");
        f.assertGolden("help.txt");
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void thePowerUpViewPlotsTheHeaterRailWithItsBypassAndACaution() throws Exception {
        UiFixture f = new UiFixture(120, 40).type("w");
        assertThat(f.ui.powerUpView().await(Duration.ofSeconds(100))).isTrue();
        f.ui.draw();
        assertThat(f.line("power-up")).contains("rail heat");
        assertThat(f.text()).contains("switch-on peak").containsPattern("heater_soft: [0-9.]+ ohm, [0-9]+ J").contains("can injure or kill");
        assertThat(f.text()).contains("\u2588");
        f.type("]");
        assertThat(f.line("power-up")).contains("rail relay");
        f.type("w");
        assertThat(f.line("program")).isNotEmpty();
    }
}
