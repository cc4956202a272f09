package org.thermion.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

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
        assertThat(help).contains("flip switch a").contains("flip switch b");
        for (String key : new String[] {"p", "c  Enter", "Space  g", "r", "b", "B", "Up Down  k j",
            "PgUp PgDn Home End", ".", "w", "[ ]  Left Right", "?  h  F1", "Esc", "q  Ctrl-C"}) {
            assertThat(help).contains("keys=" + key + ",");
        }
    }

    @Test
    void endOfInputQuits() throws IOException {
        f.press(KeyType.EOF);
        assertThat(f.ui.quitRequested()).isTrue();
    }

    /**
     * Every key the keymap knows, written out here, with its command. A key added to the keymap
     * without a line here fails {@link #everyKeyTheKeymapResolvesIsInTheTable}.
     */
    private static final Map<String, Command> KEYS = Map.ofEntries(
            Map.entry("p", Command.STEP_PHASE),
            Map.entry("+", Command.WORD_UP), Map.entry("=", Command.WORD_UP),
            Map.entry("-", Command.WORD_DOWN), Map.entry("z", Command.WORD_CLEAR), Map.entry("v", Command.BUS_BITS),
            Map.entry("c", Command.STEP_CYCLE), Map.entry("Enter", Command.STEP_CYCLE),
            Map.entry(" ", Command.RUN_PAUSE), Map.entry("g", Command.RUN_PAUSE),
            Map.entry("r", Command.RESET), Map.entry("t", Command.PACE),
            Map.entry("b", Command.BREAKPOINT), Map.entry("B", Command.CLEAR_BREAKPOINTS),
            Map.entry("k", Command.CURSOR_UP), Map.entry("ArrowUp", Command.CURSOR_UP),
            Map.entry("j", Command.CURSOR_DOWN), Map.entry("ArrowDown", Command.CURSOR_DOWN),
            Map.entry("PageUp", Command.PAGE_UP), Map.entry("PageDown", Command.PAGE_DOWN),
            Map.entry("Home", Command.FIRST_LINE), Map.entry("End", Command.LAST_LINE),
            Map.entry(".", Command.CURSOR_TO_PC),
            Map.entry("Tab", Command.NEXT_PANEL), Map.entry("ReverseTab", Command.PREVIOUS_PANEL),
            Map.entry("F2", Command.SHOW_PANEL), Map.entry("F3", Command.SHOW_PANEL),
            Map.entry("F4", Command.SHOW_PANEL), Map.entry("F5", Command.SHOW_PANEL),
            Map.entry("w", Command.POWER_UP_VIEW), Map.entry("d", Command.BENCH_VIEW),
            Map.entry("]", Command.NEXT_RAIL), Map.entry("ArrowRight", Command.NEXT_RAIL),
            Map.entry("[", Command.PREVIOUS_RAIL), Map.entry("ArrowLeft", Command.PREVIOUS_RAIL),
            Map.entry("?", Command.HELP), Map.entry("h", Command.HELP), Map.entry("F1", Command.HELP),
            Map.entry("Escape", Command.CLOSE),
            Map.entry("q", Command.QUIT), Map.entry("Ctrl-c", Command.QUIT), Map.entry("EOF", Command.QUIT));

    /** The switch keys: the digits, then the shifted digits of a US keyboard, in input order. */
    private static final String SWITCHES = "1234567890!@#$%^&*()";

    private static KeyStroke stroke(String key) {
        if (key.equals("Ctrl-c")) {
            return new KeyStroke('c', true, false);
        }
        if (key.length() == 1) {
            return new KeyStroke(key.charAt(0), false, false);
        }
        return new KeyStroke(KeyType.valueOf(key));
    }

    @Test
    void eachKeyOfTheTableResolvesToItsCommand() {
        for (Map.Entry<String, Command> e : KEYS.entrySet()) {
            Key k = Keymap.resolve(stroke(e.getKey()), 6);
            assertThat(k).as("key '%s'", e.getKey()).isNotNull();
            assertThat(k.command()).as("key '%s'", e.getKey()).isEqualTo(e.getValue());
        }
        for (int i = 0; i < SWITCHES.length(); i++) {
            Key k = Keymap.resolve(stroke(String.valueOf(SWITCHES.charAt(i))), SWITCHES.length());
            assertThat(k).isEqualTo(new Key(Command.TOGGLE_INPUT, i));
            // A switch key past the machine's inputs does nothing.
            assertThat(Keymap.resolve(stroke(String.valueOf(SWITCHES.charAt(i))), i)).isNull();
        }
    }

    @Test
    void everyKeyTheKeymapResolvesIsInTheTable() {
        List<String> unlisted = new ArrayList<>();
        for (char c = 32; c < 127; c++) {
            String key = String.valueOf(c);
            if (Keymap.resolve(stroke(key), SWITCHES.length()) != null && !KEYS.containsKey(key)
                    && SWITCHES.indexOf(c) < 0) {
                unlisted.add(key);
            }
            if (Keymap.resolve(new KeyStroke(c, true, false), 0) != null && c != 'c' && c != 'C') {
                unlisted.add("Ctrl-" + c);
            }
        }
        for (KeyType t : KeyType.values()) {
            if (t != KeyType.Character && Keymap.resolve(new KeyStroke(t), 0) != null && !KEYS.containsKey(t.name())) {
                unlisted.add(t.name());
            }
        }
        assertThat(unlisted).as("keys without a line in KEYS").isEmpty();
        // Every command is reached by some key.
        Set<Command> reached = EnumSet.of(Command.TOGGLE_INPUT);
        reached.addAll(KEYS.values());
        assertThat(reached).containsExactlyInAnyOrder(Command.values());
    }
}
