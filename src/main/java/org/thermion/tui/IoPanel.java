package org.thermion.tui;

import org.thermion.sim.OutputChange;

import org.thermion.model.Port;

import java.util.List;

/**
 * Inputs as switches (the key that flips each beside it), outputs as lamps, and, when the
 * panel is wide enough, the latest output changes with the cycle they happened in.
 */
final class IoPanel {
    private IoPanel() {
    }

    static int height(Session s) {
        return Math.max(1, Math.max(s.machine().inputs().size(), s.machine().outputs().size())) + 3;
    }

    static void draw(Canvas c, Rect r, Session s) {
        c.box(r, "switches and lamps");
        Rect in = Canvas.inside(r);
        Canvas cc = c.within(in);
        List<Port> ins = s.machine().inputs();
        List<Port> outs = s.machine().outputs();
        int inName = longest(ins);
        int outName = longest(outs);
        int col = in.col() + 1;
        cc.text(col, in.row(), "inputs", Palette.DIM);
        for (int i = 0; i < ins.size(); i++) {
            int row = in.row() + 1 + i;
            boolean on = s.input(i);
            String key = i < Keymap.INPUT_KEYS.length() ? String.valueOf(Keymap.INPUT_KEYS.charAt(i)) : " ";
            int x = cc.text(col, row, key, Palette.KEY);
            x = cc.text(x + 1, row, String.valueOf(on ? Glyphs.SWITCH_ON : Glyphs.SWITCH_OFF), on ? Palette.LIT : Palette.UNLIT);
            x = cc.text(x + 1, row, Canvas.pad(ins.get(i).name(), inName), on ? Palette.TEXT : Palette.DIM);
            cc.text(x + 1, row, on ? "on" : "off", on ? Palette.LIT : Palette.DIM);
        }
        int outCol = col + inName + 11;
        cc.text(outCol, in.row(), "outputs", Palette.DIM);
        for (int i = 0; i < outs.size(); i++) {
            int row = in.row() + 1 + i;
            Level l = s.output(i);
            cc.text(outCol, row, String.valueOf(Glyphs.lamp(l)), Palette.lamp(l));
            cc.text(outCol + 2, row, outs.get(i).name(), l == Level.ON ? Palette.LIT : Palette.DIM);
        }
        int logCol = outCol + outName + 5;
        int logWidth = in.right() - logCol;
        if (logWidth >= 18) {
            cc.text(logCol, in.row(), Canvas.fit("output changes at cycle.phase", logWidth), Palette.DIM);
            List<OutputChange> changes = s.outputChanges();
            int rows = in.height() - 1;
            for (int i = 0; i < rows && i < changes.size(); i++) {
                OutputChange ch = changes.get(changes.size() - 1 - i);
                int row = in.row() + 1 + i;
                String when = Canvas.padLeft(String.format("%,d", s.cycleBase() + ch.cycle()), 9) + "." + ch.phase();
                int x = cc.text(logCol, row, when + " ", Palette.DIM);
                if (ch.value().length() == 1) {
                    Level l = Level.of(ch.value().charAt(0));
                    x = cc.text(x, row, String.valueOf(Glyphs.lamp(l)), Palette.lamp(l));
                    cc.text(x + 1, row, Canvas.fit(ch.output(), in.right() - x - 1), Palette.TEXT);
                } else {
                    // A bus of lamps changes as one number.
                    String text = ch.output() + " = " + ch.value();
                    cc.text(x, row, Canvas.fit(text, in.right() - x), Palette.TEXT);
                }
            }
            if (changes.isEmpty()) {
                cc.text(logCol, in.row() + 1, "none since reset", Palette.DIM);
            }
        }
    }

    private static int longest(List<Port> ports) {
        int w = 1;
        for (Port p : ports) {
            w = Math.max(w, p.name().length());
        }
        return w;
    }
}
