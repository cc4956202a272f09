package org.thermion.tui;

import org.thermion.sim.OutputChange;

import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.List;

/**
 * Inputs as switches (the keys that flip them beside them), outputs as lamps, and, when the
 * panel is wide enough, the latest output changes with the cycle they happened in. A bus is
 * one row holding its number (in its radix) with its lamps or switches most significant first;
 * {@code v} shows every bit on a row of its own instead.
 */
final class IoPanel {
    private IoPanel() {
    }

    static int height(Session s, View v) {
        return Math.max(1, Math.max(groups(s.machine().inputs(), v).size(), groups(s.machine().outputs(), v).size())) + 3;
    }

    /** The rows of a side: buses whole, or every bit alone while the view asks for bits. */
    static List<PortGroup> groups(List<Port> ports, View v) {
        if (!v.bits) {
            return PortGroup.of(ports);
        }
        List<PortGroup> alone = new ArrayList<>();
        for (int i = 0; i < ports.size(); i++) {
            alone.add(new PortGroup(ports.get(i).name(), new int[] {i}));
        }
        return alone;
    }

    static void draw(Canvas c, Rect r, Session s, View v) {
        List<PortGroup> ins = groups(s.machine().inputs(), v);
        List<PortGroup> outs = groups(s.machine().outputs(), v);
        boolean buses = PortGroup.of(s.machine().inputs()).stream().anyMatch(PortGroup::bus)
                || PortGroup.of(s.machine().outputs()).stream().anyMatch(PortGroup::bus);
        c.box(r, !buses ? "switches and lamps" : v.bits ? "switches and lamps \u00B7 v: numbers" : "switches and lamps \u00B7 v: bits");
        Rect in = Canvas.inside(r);
        Canvas cc = c.within(in);
        int keyW = 1;
        int glyphW = 1;
        for (PortGroup g : ins) {
            keyW = Math.max(keyW, keys(g).length());
            glyphW = Math.max(glyphW, g.ports().length);
        }
        int inName = longest(ins);
        int col = in.col() + 1;
        cc.text(col, in.row(), "inputs", Palette.DIM);
        int inValue = 3;
        for (int i = 0; i < ins.size(); i++) {
            PortGroup g = ins.get(i);
            int row = in.row() + 1 + i;
            int x = cc.text(col, row, Canvas.pad(keys(g), keyW), Palette.KEY);
            x++;
            List<Level> levels = new ArrayList<>();
            for (int k = 0; k < g.ports().length; k++) {
                levels.add(s.input(g.ports()[k]) ? Level.ON : Level.OFF);
            }
            x = cc.text(x + glyphW - g.ports().length, row, switches(levels), levels.contains(Level.ON) ? Palette.LIT : Palette.UNLIT);
            x = cc.text(x + 1, row, Canvas.pad(g.name(), inName), levels.contains(Level.ON) ? Palette.TEXT : Palette.DIM);
            String value = g.bus() ? s.radix(g.name()).write(levels) : levels.get(0) == Level.ON ? "on" : "off";
            inValue = Math.max(inValue, value.length());
            cc.text(x + 1, row, value, levels.contains(Level.ON) ? Palette.LIT : Palette.DIM);
        }
        int outCol = col + keyW + 1 + glyphW + 1 + inName + 1 + inValue + 3;
        int outGlyphW = 1;
        for (PortGroup g : outs) {
            outGlyphW = Math.max(outGlyphW, g.ports().length);
        }
        int outName = longest(outs);
        int outValue = 0;
        cc.text(outCol, in.row(), "outputs", Palette.DIM);
        for (int i = 0; i < outs.size(); i++) {
            PortGroup g = outs.get(i);
            int row = in.row() + 1 + i;
            List<Level> levels = new ArrayList<>();
            for (int k = 0; k < g.ports().length; k++) {
                levels.add(s.output(g.ports()[k]));
            }
            int x = outCol + outGlyphW - g.ports().length;
            for (int k = levels.size() - 1; k >= 0; k--) {
                x = cc.text(x, row, String.valueOf(Glyphs.lamp(levels.get(k))), Palette.lamp(levels.get(k)));
            }
            x = cc.text(x + 1, row, Canvas.pad(g.name(), outName), levels.contains(Level.ON) ? Palette.LIT : Palette.DIM);
            if (g.bus()) {
                String value = s.radix(g.name()).write(levels);
                outValue = Math.max(outValue, value.length() + 1);
                cc.text(x + 1, row, value, Palette.TEXT);
            }
        }
        int logCol = outCol + Math.max("outputs".length(), outGlyphW + 1 + outName + outValue) + 3;
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
                    // A bus of lamps changes as one number, written in the bus's radix.
                    String text = ch.output() + " = " + s.radix(ch.output()).write(fromHex(ch.value(), width(ch.output(), s)));
                    cc.text(x, row, Canvas.fit(text, in.right() - x), Palette.TEXT);
                }
            }
            if (changes.isEmpty()) {
                cc.text(logCol, in.row() + 1, "none since reset", Palette.DIM);
            }
        }
    }

    /** The keys that flip a group's switches: one key, or the first and last joined by a dash. */
    static String keys(PortGroup g) {
        int first = g.ports()[0];
        int last = g.ports()[g.ports().length - 1];
        String a = key(first);
        return g.ports().length == 1 ? a : a + "-" + key(last);
    }

    private static String key(int input) {
        return input < Keymap.INPUT_KEYS.length() ? String.valueOf(Keymap.INPUT_KEYS.charAt(input)) : " ";
    }

    /** Switch glyphs, most significant bit first. */
    private static String switches(List<Level> levels) {
        StringBuilder b = new StringBuilder();
        for (int k = levels.size() - 1; k >= 0; k--) {
            b.append(levels.get(k) == Level.ON ? Glyphs.SWITCH_ON : Glyphs.SWITCH_OFF);
        }
        return b.toString();
    }

    /** Levels, least significant first, of a change's hexadecimal value ({@code 0x0c}, an 'x' digit: four unknown bits). */
    static List<Level> fromHex(String hex, int width) {
        List<Level> l = new ArrayList<>();
        for (int i = hex.length() - 1; i >= 2 && l.size() < width; i--) {
            char c = hex.charAt(i);
            int d = Character.digit(c, 16);
            for (int b = 0; b < 4 && l.size() < width; b++) {
                l.add(c == 'x' ? Level.UNKNOWN : (d >>> b & 1) != 0 ? Level.ON : Level.OFF);
            }
        }
        return l;
    }

    // The width of the output bus a change names (its bits, whether or not the panel shows them apart).
    private static int width(String name, Session s) {
        for (PortGroup g : PortGroup.of(s.machine().outputs())) {
            if (g.name().equals(name)) {
                return g.ports().length;
            }
        }
        return 64;
    }

    private static int longest(List<PortGroup> groups) {
        int w = 1;
        for (PortGroup g : groups) {
            w = Math.max(w, g.name().length());
        }
        return w;
    }
}
