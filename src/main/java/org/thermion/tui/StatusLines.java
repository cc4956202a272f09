package org.thermion.tui;

import org.thermion.asm.ListingLine;

import java.util.List;

/** The title line on top and the two status lines at the bottom. */
final class StatusLines {
    private StatusLines() {
    }

    static void title(Canvas c, int cols, Session s, String program, List<Panel> hidden) {
        c.text(0, 0, " ".repeat(cols), Palette.TEXT, Palette.OVERLAY_BACKGROUND);
        String note = "";
        if (!hidden.isEmpty()) {
            StringBuilder b = new StringBuilder("hidden, too little room: ");
            for (int i = 0; i < hidden.size(); i++) {
                b.append(i == 0 ? "" : ", ").append(hidden.get(i).title);
            }
            note = b.append(' ').toString();
        }
        // The note about hidden panels matters more than the names, so they give way to it.
        int room = Math.max(0, cols - note.length() - 1);
        int x = c.text(1, 0, Canvas.fit("THERMION", room - 1), Palette.HEADING, Palette.OVERLAY_BACKGROUND);
        String names = "  " + s.machine().name() + " \u00B7 " + program + " \u00B7 latches start " + initName(s);
        c.text(x, 0, Canvas.fit(names, Math.max(0, room - x)), Palette.TEXT, Palette.OVERLAY_BACKGROUND);
        if (!note.isEmpty()) {
            int at = Math.max(0, cols - note.length());
            c.text(at, 0, Canvas.fit(note, cols - at), Palette.STOPPED, Palette.OVERLAY_BACKGROUND);
        }
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
        String where = String.format(" cycle %,d  phase %d of %d next  ", s.cycle(), s.nextPhase(), phases);
        String at = Hex.address(s.pc(), s.machine()) + " " + instructionText(s);
        String inst = (s.midCycle() ? "in flight " : "next up ") + at + "   ";
        String state;
        if (s.running()) {
            String rate = v.cyclesPerSecond > 0 ? String.format("  %,.0f cycles/s", v.cyclesPerSecond) : "";
            state = "\u25B6 running" + rate;
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

    static void keys(Canvas c, int cols, int row, int inputs, View v) {
        c.text(0, row, " ".repeat(cols), Palette.TEXT, Palette.BACKGROUND);
        String[][] hints;
        if (v.mode == View.Mode.POWER_UP) {
            hints = new String[][] {{"[ ]", "rail"}, {"w", "back"}, {"?", "help"}, {"q", "quit"}};
        } else {
            String sw = inputs == 0 ? "" : inputs == 1 ? "1" : inputs <= 10 ? "1-" + Keymap.INPUT_KEYS.charAt(inputs - 1) : "1-0 !-)";
            hints = new String[][] {{"p", "phase"}, {"c", "cycle"}, {"Space", "run/pause"}, {"r", "reset"},
                {sw, "switches"}, {"b", "breakpoint"}, {"w", "power-up"}, {"?", "help"}, {"q", "quit"}};
        }
        // Help and quit always stay; the others give way from the right on narrow windows.
        int keep = 2;
        int total = 1;
        for (String[] h : hints) {
            if (!h[0].isEmpty()) {
                total += h[0].length() + h[1].length() + 3;
            }
        }
        List<String[]> shown = new java.util.ArrayList<>(List.of(hints));
        shown.removeIf(h -> h[0].isEmpty());
        while (total > cols && shown.size() > keep) {
            String[] h = shown.remove(shown.size() - keep - 1);
            total -= h[0].length() + h[1].length() + 3;
        }
        int x = 1;
        for (String[] h : shown) {
            x = c.text(x, row, h[0], Palette.KEY);
            x = c.text(x + 1, row, h[1], Palette.DIM) + 2;
        }
    }
}
