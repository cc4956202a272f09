package org.thermion.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.io.IOException;

import static org.assertj.core.api.Assertions.assertThat;

/** One test per command: the key, and what it changes in the session or the view. */
class KeyHandlingTest {
    private UiFixture f;

    @BeforeEach
    void open() throws IOException {
        f = new UiFixture(120, 40);
    }

    /** Listing index of the line holding address {@code a}. */
    private int lineOf(int a) {
        return f.session.listingIndex(a);
    }

    @Test
    void pStepsOnePhase() throws IOException {
        f.type("p");
        assertThat(f.session.nextPhase()).isEqualTo(2);
        assertThat(f.session.cycle()).isZero();
        assertThat(f.status()).contains("phase 2 of 2 next").contains("in flight 00");
    }

    @Test
    void cAndEnterStepOneCycleEach() throws IOException {
        f.type("c");
        assertThat(f.session.cycle()).isEqualTo(1);
        f.press(KeyType.Enter);
        assertThat(f.session.cycle()).isEqualTo(2);
        assertThat(f.session.pc()).isEqualTo(2);
    }

    @Test
    void cAfterAPhaseFinishesTheCycle() throws IOException {
        f.type("pc");
        assertThat(f.session.cycle()).isEqualTo(1);
        assertThat(f.session.nextPhase()).isEqualTo(1);
    }

    @Test
    void spaceAndGStartAndPauseARun() throws IOException {
        f.type(" ");
        assertThat(f.session.running()).isTrue();
        assertThat(f.status()).contains("running");
        f.ui.runFor(5_000_000L);
        assertThat(f.session.cycle()).isPositive();
        f.type("g");
        assertThat(f.session.running()).isFalse();
        assertThat(f.status()).contains("stopped: paused");
    }

    @Test
    void rResets() throws IOException {
        f.type("cccc");
        f.type("r");
        assertThat(f.session.cycle()).isZero();
        assertThat(f.session.pc()).isZero();
        assertThat(f.status()).contains("stopped: reset");
    }

    @Test
    void digitKeysFlipTheirSwitches() throws IOException {
        for (int i = 0; i < f.session.machine().inputs().size(); i++) {
            String name = f.session.machine().inputs().get(i).name();
            f.type(String.valueOf(Keymap.INPUT_KEYS.charAt(i)));
            assertThat(f.session.input(i)).as(name).isTrue();
            assertThat(f.text()).contains((i + 1) + " " + Glyphs.SWITCH_ON + " " + name);
            f.type(String.valueOf(Keymap.INPUT_KEYS.charAt(i)));
            assertThat(f.session.input(i)).as(name).isFalse();
        }
        f.type("7");
        assertThat(f.ui.view().message).contains("does nothing");
    }

    @Test
    void bSetsAndClearsABreakpointOnTheCursorLine() throws IOException {
        f.press(KeyType.ArrowDown).press(KeyType.ArrowDown).press(KeyType.ArrowDown);
        assertThat(f.ui.view().cursor).isEqualTo(lineOf(3));
        f.type("b");
        assertThat(f.session.breakpoint(3)).isTrue();
        assertThat(f.line("ST   run")).startsWith(String.valueOf(Glyphs.CURSOR) + Glyphs.BREAKPOINT);
        assertThat(f.status()).contains("breakpoint set at 03");
        f.type("b");
        assertThat(f.session.breakpoint(3)).isFalse();
    }

    @Test
    void bOnACommentLineSaysThereIsNoInstruction() throws IOException {
        f.press(KeyType.Home).type("b");
        assertThat(f.session.breakpointCount()).isZero();
        assertThat(f.ui.view().message).contains("no instruction");
    }

    @Test
    void capitalBClearsEveryBreakpoint() throws IOException {
        f.session.toggleBreakpoint(2);
        f.session.toggleBreakpoint(7);
        f.type("B");
        assertThat(f.session.breakpointCount()).isZero();
    }

    @Test
    void arrowsAndJkMoveTheCursorWithinTheListing() throws IOException {
        int start = f.ui.view().cursor;
        assertThat(start).isEqualTo(lineOf(0));
        f.press(KeyType.ArrowUp);
        assertThat(f.ui.view().cursor).isEqualTo(start - 1);
        f.type("jj");
        assertThat(f.ui.view().cursor).isEqualTo(start + 1);
        f.type("k");
        assertThat(f.ui.view().cursor).isEqualTo(start);
    }

    @Test
    void pageKeysHomeAndEndMoveFarAndStopAtTheEnds() throws IOException {
        int last = f.session.assembly().listing().size() - 1;
        f.press(KeyType.End);
        assertThat(f.ui.view().cursor).isEqualTo(last);
        f.press(KeyType.PageDown);
        assertThat(f.ui.view().cursor).isEqualTo(last);
        f.press(KeyType.Home);
        assertThat(f.ui.view().cursor).isZero();
        f.press(KeyType.PageUp);
        assertThat(f.ui.view().cursor).isZero();
        f.press(KeyType.PageDown);
        assertThat(f.ui.view().cursor).isEqualTo(Math.min(last, 40 - 8));
    }

    @Test
    void dotPutsTheCursorOnThePc() throws IOException {
        f.type("ccc").press(KeyType.Home).type(".");
        assertThat(f.ui.view().cursor).isEqualTo(lineOf(3));
    }

    @Test
    void wOpensThePowerUpViewAndBracketsChooseTheRail() throws IOException {
        f.type("w");
        assertThat(f.ui.view().mode).isEqualTo(View.Mode.POWER_UP);
        f.type("]");
        assertThat(f.ui.view().rail).isEqualTo(1);
        f.press(KeyType.ArrowLeft).press(KeyType.ArrowLeft);
        assertThat(f.ui.view().rail).isEqualTo(-1);
        f.press(KeyType.ArrowRight);
        assertThat(f.ui.view().rail).isZero();
        f.type("w");
        assertThat(f.ui.view().mode).isEqualTo(View.Mode.MAIN);
    }

    @Test
    void escapeLeavesThePowerUpView() throws IOException {
        f.type("w").press(KeyType.Escape);
        assertThat(f.ui.view().mode).isEqualTo(View.Mode.MAIN);
    }

    @Test
    void questionMarkHAndF1ShowHelpAndAnyKeyClosesIt() throws IOException {
        for (String open : new String[] {"?", "h"}) {
            f.type(open);
            assertThat(f.ui.view().help).isTrue();
            assertThat(f.text()).contains("flip switch low_sw").contains("Ctrl-C");
            f.type("c");
            assertThat(f.ui.view().help).isFalse();
            assertThat(f.session.cycle()).as("the closing key does nothing else").isZero();
        }
        f.press(KeyType.F1);
        assertThat(f.ui.view().help).isTrue();
        f.press(KeyType.Escape);
        assertThat(f.ui.view().help).isFalse();
    }

    @Test
    void qQuits() throws IOException {
        f.type("q");
        assertThat(f.ui.quitRequested()).isTrue();
    }

    @Test
    void ctrlCQuitsEvenFromTheHelp() throws IOException {
        f.type("?");
        f.ui.handle(new KeyStroke('c', true, false));
        assertThat(f.ui.quitRequested()).isTrue();
    }

    @Test
    void helpListsEveryKeyTheKeymapResolves() {
        String help = Keymap.help(java.util.List.of("a", "b")).toString();
        for (Command c : Command.values()) {
            if (c == Command.TOGGLE_INPUT) {
                assertThat(help).contains("flip switch a").contains("flip switch b");
            }
        }
        for (String key : new String[] {"p", "c  Enter", "Space  g", "r", "b", "B", "Up Down  k j",
            "PgUp PgDn Home End", ".", "w", "[ ]  Left Right", "?  h  F1", "Esc", "q  Ctrl-C"}) {
            assertThat(help).contains("keys=" + key + ",");
        }
    }
}
