package org.thermion.tui;

import org.thermion.asm.ListingLine;

import java.util.List;

/** The title line on top and the two status lines at the bottom. */
final class StatusLines {
    private StatusLines() {
    }

    /**
     * The title line: the names on the left and, when panels do not all fit, the panel row on
     * the right: each side panel's word, the one brought forward in brackets, hidden ones in
     * parentheses, after the key that cycles them. {@code plan} is null on the power-up screen.
     */
    static void title(Canvas c, int cols, Session s, String program, Layout.Plan plan, View v) {
        c.text(0, 0, " ".repeat(cols), Palette.TEXT, Palette.OVERLAY_BACKGROUND);
        String row = plan == null ? "" : panelRow(plan, v);
        // The panel row matters more than the names, so they give way to it.
        int room = Math.max(0, cols - row.length() - 1);
        int x = c.text(1, 0, Canvas.fit("THERMION", room - 1), Palette.HEADING, Palette.OVERLAY_BACKGROUND);
        String names = "  " + s.machine().name() + " \u00B7 " + program + " \u00B7 latches start " + initName(s);
        c.text(x, 0, Canvas.fit(names, Math.max(0, room - x)), Palette.TEXT, Palette.OVERLAY_BACKGROUND);
        if (row.isEmpty()) {
            return;
        }
        int at = Math.max(0, cols - row.length());
        at = c.text(at, 0, Canvas.fit("Tab ", cols - at), Palette.KEY, Palette.OVERLAY_BACKGROUND);
        for (Panel p : Keymap.PANEL_KEYS) {
            String w = panelWord(plan, v, p);
            boolean hidden = !plan.shows(p);
            at = c.text(at, 0, Canvas.fit(w, Math.max(0, cols - at)), hidden ? Palette.DIM : p == v.front ? Palette.LIT : Palette.TEXT,
                    Palette.OVERLAY_BACKGROUND) + 1;
        }
    }

    /** The panel row as text, or "" when every panel is shown and none was brought forward. */
    static String panelRow(Layout.Plan plan, View v) {
        if (plan.hidden().isEmpty() && v.front == null) {
            return "";
        }
        StringBuilder b = new StringBuilder("Tab ");
        for (Panel p : Keymap.PANEL_KEYS) {
            b.append(panelWord(plan, v, p)).append(' ');
        }
        return b.toString();
    }

    private static String panelWord(Layout.Plan plan, View v, Panel p) {
        if (!plan.shows(p)) {
            return "(" + p.tab + ")";
        }
        return p == v.front ? "[" + p.tab + "]" : p.tab;
    }

    /** Time on the real machine after {@code cycles} at the declared clock period: us, ms or s. */
    static String machineTime(long cycles, double periodSeconds) {
        double t = cycles * periodSeconds;
        if (t == 0) {
            return "0 s";
        }
        if (t < 10e-6) {
            return String.format("%.2f us", t * 1e6);
        }
        if (t < 1e-3) {
            return String.format("%.0f us", t * 1e6);
        }
        if (t < 1) {
            return String.format("%.2f ms", t * 1e3);
        }
        return t < 60 ? String.format("%.3f s", t) : String.format("%,.1f s", t);
    }

    static String initName(Session s) {
        Object m = s.initMode();
        String n = m.getClass().getSimpleName().toLowerCase();
        if (m instanceof org.thermion.sim.InitMode.Random) {
            return "random:" + ((org.thermion.sim.InitMode.Random) m).seed();
        }
        return n;
    }

    static void status(Canvas c, int cols, int row, Session s, View v) {
        c.text(0, row, " ".repeat(cols), Palette.TEXT, Palette.OVERLAY_BACKGROUND);
        int phases = s.machine().clock().phases();
        String time = machineTime(s.cycle(), s.machine().clock().periodSeconds());
        String where = String.format(" cycle %,d \u00B7 %s  phase %d of %d next  ", s.cycle(), time, s.nextPhase(), phases);
        String at = s.switchFed() ? "word " + Hex.word(s.switchWord(), s.machine()) + " "
                + Canvas.fit(WordPanel.meaning(s.machine().isa(), s.switchWord()), 24)
                : Hex.address(s.pc(), s.machine()) + " " + instructionText(s);
        String inst = (s.midCycle() ? "in flight " : "next up ") + at + "   ";
        String state;
        if (s.running()) {
            // The speed as a multiple of the real machine's: what a builder compares with.
            double real = v.cyclesPerSecond * s.machine().clock().periodSeconds();
            String rate = v.cyclesPerSecond > 0 ? String.format("  %,.0f cycles/s = %s real", v.cyclesPerSecond, times(real)) : "";
            state = "\u25B6 running" + (v.machineSpeed ? " at machine speed" : "") + rate;
        } else {
            state = "\u25A0 stopped: " + s.stop().text();
        }
        // Narrow windows lose the words around the instruction first, then the instruction.
        if (where.length() + inst.length() + state.length() > cols) {
            inst = at + "   ";
        }
        if (where.length() + inst.length() + state.length() > cols) {
            inst = "";
        }
        int x = c.text(0, row, where, Palette.TEXT, Palette.OVERLAY_BACKGROUND);
        x = c.text(x, row, inst, Palette.LIT, Palette.OVERLAY_BACKGROUND);
        x = c.text(x, row, state, s.running() ? Palette.RUNNING : Palette.STOPPED, Palette.OVERLAY_BACKGROUND);
        if (!v.message.isEmpty() && x + 3 < cols) {
            c.text(x + 3, row, Canvas.fit(v.message, cols - x - 3), Palette.KEY, Palette.OVERLAY_BACKGROUND);
        }
    }

    /** A speed ratio: two decimals below 10, whole above. */
    static String times(double ratio) {
        return ratio < 10 ? String.format("%.2f\u00D7", ratio) : String.format("%,.0f\u00D7", ratio);
    }

    /** The source of the instruction at the PC without its label and comment, or its opcode. */
    static String instructionText(Session s) {
        int idx = s.listingIndex(s.pc());
        if (idx >= 0) {
            ListingLine l = s.assembly().listing().get(idx);
            String t = l.sourceText();
            int semi = t.indexOf(';');
            if (semi >= 0) {
                t = t.substring(0, semi);
            }
            int colon = t.indexOf(':');
            if (colon >= 0) {
                t = t.substring(colon + 1);
            }
            String text = t.trim().replaceAll("\\s+", " ");
            return Canvas.fit(text, 24);
        }
        return "(no program word)";
    }

    /** A hint on the key line: the key, what it does, and how long it stays when room runs out (higher stays longer). */
    private record Hint(String key, String word, int keep) {
        int width() {
            return key.length() + word.length() + 3;
        }
    }

    /**
     * The key line. When it does not fit, hints give way lowest {@code keep} first (the
     * rightmost of equals first), so help, quit, the switches (and a switch-fed machine's word
     * keys) and the panel key while panels are hidden stay at 80 columns; the rest keep their order.
     */
    static void keys(Canvas c, int cols, int row, int inputs, boolean switchFed, View v, boolean panelsHidden) {
        c.text(0, row, " ".repeat(cols), Palette.TEXT, Palette.BACKGROUND);
        List<Hint> hints = new java.util.ArrayList<>();
        if (v.mode == View.Mode.POWER_UP) {
            hints.add(new Hint("[ ]", "rail", 5));
            hints.add(new Hint("w", "back", 8));
        } else if (v.mode == View.Mode.BENCH) {
            hints.add(new Hint("Space", "lit/dark", 8));
            hints.add(new Hint("Enter", "record", 8));
            hints.add(new Hint("d", "back", 7));
            hints.add(new Hint("Up/Down", "lamp", 6));
            hints.add(new Hint("Left/Right", "step", 4));
            hints.add(new Hint("x", "not looked", 3));
            hints.add(new Hint("e", "as expected", 5));
        } else {
            String sw = inputs == 0 ? "" : inputs == 1 ? "1" : inputs <= 10 ? "1-" + Keymap.INPUT_KEYS.charAt(inputs - 1) : "1-0 !-)";
            hints.add(new Hint("p", "phase", 4));
            hints.add(new Hint("c", "cycle", 7));
            hints.add(new Hint("Space", "run/pause", 6));
            hints.add(new Hint("r", "reset", 5));
            if (!sw.isEmpty()) {
                hints.add(new Hint(sw, "switches", 8));
            }
            if (switchFed) {
                hints.add(new Hint("+ -", "word", 8));
            }
            hints.add(new Hint("b", "breakpoint", 2));
            hints.add(new Hint("t", "pace", 1));
            hints.add(new Hint("w", "power-up", 3));
            hints.add(new Hint("Tab", "panels", panelsHidden ? 9 : 0));
        }
        hints.add(new Hint("?", "help", 10));
        hints.add(new Hint("q", "quit", 10));
        int total = 1;
        for (Hint h : hints) {
            total += h.width();
        }
        while (total > cols && hints.size() > 2) {
            Hint drop = hints.get(0);
            for (Hint h : hints) {
                if (h.keep() <= drop.keep()) {
                    drop = h;
                }
            }
            hints.remove(drop);
            total -= drop.width();
        }
        int x = 1;
        for (Hint h : hints) {
            x = c.text(x, row, h.key(), Palette.KEY);
            x = c.text(x + 1, row, h.word(), Palette.DIM) + 2;
        }
    }
}
