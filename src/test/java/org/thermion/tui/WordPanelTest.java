package org.thermion.tui;

import org.junit.jupiter.api.Test;
import org.thermion.asm.Assembly;
import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A machine whose instruction word comes from switches (the bring-up panel example): the UI
 * shows a switch panel for the word where a listing would be, the word's switches flip from the
 * keyboard (their input keys, or + - z for the word as a number), and a cycle runs the word set.
 * Golden screens at 80 x 24 and 100 x 30.
 */
class WordPanelTest {
    static final Path PANEL = Path.of("examples", "bringup-panel", "bringup-panel.machine");

    static UiFixture panel(int cols, int rows) throws IOException {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborate(PANEL);
        assertThat(d.hasErrors()).isFalse();
        Session s = new Session(m, new Assembly(new long[0], List.of()), DecodeLamp.DEFAULT_NAME, new InitMode.Zero(), null);
        return new UiFixture(s, cols, rows, "word from switches");
    }

    @Test
    void theWordIsSetBitByBitOrAsANumberAndShownAsOne() throws IOException {
        UiFixture f = panel(80, 24);
        assertThat(f.text()).contains(WordPanel.TITLE).doesNotContain("program ");
        assertThat(f.text()).contains("0x00 = 0 = 0b000000").contains("means  NOP");
        // Keys 4 and 1 flip word[3] and word[0]: opcode 1 (LD), address 1 (d1).
        f.type("41");
        assertThat(f.session.switchWord()).isEqualTo(0b001001);
        assertThat(f.line("0x09")).contains("0x09 = 9 = 0b001001");
        assertThat(f.line("means")).contains("LD 1 (d1)");
        f.type("+");
        assertThat(f.session.switchWord()).isEqualTo(10);
        assertThat(f.line("means")).contains("LD 2 (no bit there: reads 0)");
        f.type("z");
        assertThat(f.session.switchWord()).isZero();
    }

    @Test
    void aCycleRunsTheWordOnTheSwitches() throws IOException {
        UiFixture f = panel(100, 30);
        // LD d0 with d0 on (key 7 is d0), one cycle: the accumulator lamp lights.
        f.session.setSwitchWord(0x08);
        f.type("7c");
        assertThat(f.session.stateBit(f.session.machine().isa().stateIndex("acc"))).isEqualTo(Level.ON);
        assertThat(f.status()).contains("word 08 LD 0 (d0)");
        // CLR (0x38) and a cycle: dark again.
        f.session.setSwitchWord(0x38);
        f.type("c");
        assertThat(f.session.stateBit(f.session.machine().isa().stateIndex("acc"))).isEqualTo(Level.OFF);
    }

    @Test
    void goldenScreens() throws IOException {
        UiFixture f = panel(80, 24);
        f.session.setSwitchWord(0x1C);
        f.ui.draw();
        f.assertGolden("panel-80x24.txt");
        UiFixture g = panel(100, 30);
        g.session.setSwitchWord(0x1C);
        g.ui.draw();
        g.assertGolden("panel-100x30.txt");
    }
}
