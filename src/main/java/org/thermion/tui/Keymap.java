package org.thermion.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;

import java.util.ArrayList;
import java.util.List;

/**
 * The keys and what they do; the help overlay is printed from the same table, so it
 * cannot drift from the code. Switch keys are the digits, then the shifted digits.
 */
final class Keymap {
    /** Keys that flip the machine's inputs, in input order. */
    static final String INPUT_KEYS = "1234567890!@#$%^&*()";

    /** The side panels F2, F3, ... bring forward, in the order they are stacked on screen. */
    static final Panel[] PANEL_KEYS = {Panel.STATE, Panel.DECODE, Panel.IO, Panel.POWER};

    /** A line of help: the keys as written on the overlay, and what they do. */
    record HelpLine(String keys, String meaning) {
    }

    private Keymap() {
    }

    /** The key's command, or null for a key that does nothing. */
    static Key resolve(KeyStroke k, int inputCount) {
        KeyType t = k.getKeyType();
        if (t == KeyType.Character) {
            char c = k.getCharacter();
            if (k.isCtrlDown()) {
                return c == 'c' || c == 'C' ? new Key(Command.QUIT, 0) : null;
            }
            int input = INPUT_KEYS.indexOf(c);
            if (input >= 0) {
                return input < inputCount ? new Key(Command.TOGGLE_INPUT, input) : null;
            }
            switch (c) {
                case 'p': return of(Command.STEP_PHASE);
                case 'c': return of(Command.STEP_CYCLE);
                case ' ': case 'g': return of(Command.RUN_PAUSE);
                case 't': return of(Command.PACE);
                case 'r': return of(Command.RESET);
                case 'b': return of(Command.BREAKPOINT);
                case 'B': return of(Command.CLEAR_BREAKPOINTS);
                case 'k': return of(Command.CURSOR_UP);
                case 'j': return of(Command.CURSOR_DOWN);
                case '.': return of(Command.CURSOR_TO_PC);
                case 'w': return of(Command.POWER_UP_VIEW);
                case 'd': return of(Command.BENCH_VIEW);
                case ']': return of(Command.NEXT_RAIL);
                case '[': return of(Command.PREVIOUS_RAIL);
                case '+': case '=': return of(Command.WORD_UP);
                case '-': return of(Command.WORD_DOWN);
                case 'z': return of(Command.WORD_CLEAR);
                case 'v': return of(Command.BUS_BITS);
                case '?': case 'h': return of(Command.HELP);
                case 'q': return of(Command.QUIT);
                default: return null;
            }
        }
        switch (t) {
            case Enter: return of(Command.STEP_CYCLE);
            case ArrowUp: return of(Command.CURSOR_UP);
            case ArrowDown: return of(Command.CURSOR_DOWN);
            case PageUp: return of(Command.PAGE_UP);
            case PageDown: return of(Command.PAGE_DOWN);
            case Home: return of(Command.FIRST_LINE);
            case End: return of(Command.LAST_LINE);
            case Tab: return of(Command.NEXT_PANEL);
            case ReverseTab: return of(Command.PREVIOUS_PANEL);
            case F2: return panel(0);
            case F3: return panel(1);
            case F4: return panel(2);
            case F5: return panel(3);
            case ArrowRight: return of(Command.NEXT_RAIL);
            case ArrowLeft: return of(Command.PREVIOUS_RAIL);
            case F1: return of(Command.HELP);
            case Escape: return of(Command.CLOSE);
            case EOF: return of(Command.QUIT);
            default: return null;
        }
    }

    private static Key of(Command c) {
        return new Key(c, 0);
    }

    private static Key panel(int i) {
        return new Key(Command.SHOW_PANEL, PANEL_KEYS[i].ordinal());
    }

    /** Every key, for the help overlay; a switch-fed machine's word keys among them. */
    static List<HelpLine> help(List<String> inputNames, boolean switchFed) {
        List<HelpLine> h = help(inputNames);
        if (switchFed) {
            h.add(5, new HelpLine("+ -", "instruction word switches: the next / previous word"));
            h.add(6, new HelpLine("z", "instruction word switches: all off"));
        }
        return h;
    }

    /** Every key, for the help overlay. */
    static List<HelpLine> help(List<String> inputNames) {
        List<HelpLine> h = new ArrayList<>();
        h.add(new HelpLine("p", "step one clock phase"));
        h.add(new HelpLine("c  Enter", "step one cycle (one instruction)"));
        h.add(new HelpLine("Space  g", "run / pause"));
        h.add(new HelpLine("t", "runs at the machine's own clock, or flat out"));
        h.add(new HelpLine("r", "reset: latches to power-up state, PC 0"));
        for (int i = 0; i < inputNames.size(); i++) {
            String key = i < INPUT_KEYS.length() ? String.valueOf(INPUT_KEYS.charAt(i)) : "-";
            h.add(new HelpLine(key, "flip switch " + inputNames.get(i)));
        }
        h.add(new HelpLine("v", "buses as numbers, or every bit on its own"));
        h.add(new HelpLine("b", "set or clear a breakpoint on the cursor line"));
        h.add(new HelpLine("B", "clear every breakpoint"));
        h.add(new HelpLine("Up Down  k j", "move the listing cursor"));
        h.add(new HelpLine("PgUp PgDn Home End", "move the cursor by pages, to the ends"));
        h.add(new HelpLine(".", "cursor to the PC"));
        h.add(new HelpLine("Tab  Shift-Tab", "bring the next / previous hidden panel into view"));
        StringBuilder f = new StringBuilder();
        for (int i = 0; i < PANEL_KEYS.length; i++) {
            f.append(i == 0 ? "" : ", ").append(PANEL_KEYS[i].tab);
        }
        h.add(new HelpLine("F2 F3 F4 F5", "bring forward " + f));
        h.add(new HelpLine("w", "power-up view: rail current from switch-on; w leaves"));
        h.add(new HelpLine("[ ]  Left Right", "previous / next rail in the power-up view"));
        h.add(new HelpLine("d", "bench mode: follow the bring-up plan, type in the lamps you see; d leaves"));
        h.add(new HelpLine("Up Down  Space  x  e", "bench: pick a lamp, lit / dark, not looked at, all as expected"));
        h.add(new HelpLine("Enter  Left Right", "bench: record the step and go on; previous / next step"));
        h.add(new HelpLine("?  h  F1", "this help; Space: next page, other keys close it"));
        h.add(new HelpLine("Esc", "close help, the power-up view or the bench"));
        h.add(new HelpLine("q  Ctrl-C", "quit"));
        h.add(new HelpLine("", ""));
        h.add(new HelpLine(Glyphs.LAMP_ON + " " + Glyphs.LAMP_OFF + " " + Glyphs.LAMP_UNKNOWN,
                "lamp lit, dark, unknown (never set, or lost)"));
        h.add(new HelpLine(Glyphs.SWITCH_ON + " " + Glyphs.SWITCH_OFF, "switch on, off"));
        h.add(new HelpLine(Glyphs.PC + " " + Glyphs.PC_NEXT, "instruction in flight, next to be fetched"));
        h.add(new HelpLine(Glyphs.BREAKPOINT + " " + Glyphs.CURSOR, "breakpoint, listing cursor"));
        h.add(new HelpLine("[power] (decode)", "top line: panel brought forward, panel hidden"));
        return h;
    }
}
