package org.thermion.tui;

import com.googlecode.lanterna.input.KeyType;
import org.junit.jupiter.api.Test;

import java.io.IOException;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The panel switcher: at 80 x 24 not every panel fits beside the listing, so Tab, Shift-Tab
 * and F2-F5 bring one forward; the title line's panel row says which are shown. Also the
 * golden screens of the demo at the three sizes a builder is likely to have.
 */
class PanelSwitchTest {

    @Test
    void at80x24TabBringsEachHiddenPanelIntoViewInTurn() throws IOException {
        UiFixture f = new UiFixture(80, 24);
        // Opening: state and the switches fit, decode lines and power do not.
        assertThat(f.line("THERMION")).contains("Tab state (decode) switches (power)");
        assertThat(f.text()).doesNotContain("decode lines");
        f.press(KeyType.Tab);
        assertThat(f.ui.view().front).isEqualTo(Panel.DECODE);
        assertThat(f.text()).contains("decode lines");
        assertThat(f.line("THERMION")).contains("[decode]");
        f.press(KeyType.Tab);
        assertThat(f.ui.view().front).isEqualTo(Panel.IO);
        f.press(KeyType.Tab);
        assertThat(f.ui.view().front).isEqualTo(Panel.POWER);
        assertThat(f.line("THERMION")).contains("[power]");
        assertThat(f.text()).contains("all modules");
        // Going round: the next hidden panel after power, in screen order.
        f.press(KeyType.Tab);
        assertThat(f.ui.view().front).isNotEqualTo(Panel.POWER);
        assertThat(f.line("THERMION")).contains("[" + f.ui.view().front.tab + "]");
    }

    @Test
    void shiftTabGoesTheOtherWayAndFunctionKeysNameThePanel() throws IOException {
        UiFixture f = new UiFixture(80, 24);
        f.press(KeyType.ReverseTab);
        assertThat(f.ui.view().front).isEqualTo(Panel.POWER);
        f.press(KeyType.F2);
        assertThat(f.ui.view().front).isEqualTo(Panel.STATE);
        f.press(KeyType.F3);
        assertThat(f.ui.view().front).isEqualTo(Panel.DECODE);
        assertThat(f.text()).contains("decode lines");
        f.press(KeyType.F4);
        assertThat(f.ui.view().front).isEqualTo(Panel.IO);
        assertThat(f.text()).contains("switches and lamps");
        f.press(KeyType.F5);
        assertThat(f.ui.view().front).isEqualTo(Panel.POWER);
        assertThat(f.line("THERMION")).contains("[power]");
    }

    @Test
    void everyPanelIsReachableAtEverySizeFrom80x24() throws IOException {
        int[][] sizes = {{80, 24}, {100, 30}, {60, 16}, {160, 50}};
        for (int[] size : sizes) {
            UiFixture f = new UiFixture(size[0], size[1]);
            for (Panel p : Keymap.PANEL_KEYS) {
                f.ui.view().front = p;
                f.ui.draw();
                assertThat(f.text()).as("%s at %d x %d", p, size[0], size[1]).contains(p.title);
            }
        }
    }

    @Test
    void theHelpIsOneKeyAwayAndComesInPagesWhenTheWindowIsShort() throws IOException {
        UiFixture f = new UiFixture(80, 24).type("?");
        assertThat(f.text()).contains("keys \u00B7 page 1 of 2").contains("Space: next page");
        f.type(" ");
        assertThat(f.ui.view().help).isTrue();
        assertThat(f.text()).contains("keys \u00B7 page 2 of 2").contains("quit");
        f.type(" ");
        assertThat(f.ui.view().help).isFalse();
        assertThat(f.session.running()).as("the key that closes the help does nothing else").isFalse();
    }

    @Test
    void theStatusLineGivesTheRealMachineTimeBesideTheCycles() throws IOException {
        // The demo's clock: period 300 us (examples/pumpstation/pumpstation.machine).
        UiFixture f = new UiFixture(100, 30).type("cccccc");
        assertThat(f.status()).contains(" cycle 6 \u00B7 1.80 ms ");
        assertThat(StatusLines.machineTime(12_345, 100e-6)).isEqualTo("1.235 s");
        assertThat(StatusLines.machineTime(123, 100e-6)).isEqualTo("12.30 ms");
        assertThat(StatusLines.machineTime(3, 1e-6)).isEqualTo("3.00 us");
        assertThat(StatusLines.machineTime(0, 100e-6)).isEqualTo("0 s");
    }

    @Test
    void theListingOpensAtTheCurrentInstructionNotTheHeaderComments() throws IOException {
        UiFixture f = new UiFixture(100, 30);
        int pcLine = f.session.listingIndex(f.session.pc());
        assertThat(f.ui.view().top).isBetween(pcLine - 3, pcLine);
        assertThat(f.text()).contains("loop:").doesNotContain("fill and drain control");
    }

    @Test
    void goldenScreensOfTheDemoAtThreeSizes() throws IOException {
        new UiFixture(80, 24).type("ccc").assertGolden("demo-80x24.txt");
        new UiFixture(80, 24).type("ccc").press(KeyType.F5).assertGolden("demo-80x24-power.txt");
        new UiFixture(100, 30).type("ccc").assertGolden("demo-100x30.txt");
        new UiFixture(160, 50).type("ccc").assertGolden("demo-160x50.txt");
    }
}
