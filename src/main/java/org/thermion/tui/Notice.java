package org.thermion.tui;

import java.util.List;

/**
 * A box over the panels after a reload: what changed and what was kept, or the errors in the
 * saved files. The next key closes it and still does its own work, so it is never in the way.
 */
record Notice(String title, List<String> lines, boolean error) {
    Notice {
        lines = List.copyOf(lines);
    }

    void draw(Canvas c, int cols, int rows) {
        int width = title.length() + 6;
        for (String l : lines) {
            width = Math.max(width, l.length() + 4);
        }
        width = Math.min(cols - 2, width);
        int height = Math.min(rows - 4, wrap(lines, width - 4).size() + 3);
        Rect r = new Rect((cols - width) / 2, Math.max(1, (rows - height) / 2), width, height);
        c.fill(r, Palette.OVERLAY_BACKGROUND);
        c.box(r, title);
        if (error) {
            c.text(r.col() + 1, r.row(), "!", Palette.STOPPED);
        }
        Canvas cc = c.within(Canvas.inside(r));
        List<String> shown = wrap(lines, width - 4);
        int room = height - 3;
        for (int i = 0; i < shown.size() && i < room; i++) {
            boolean last = i == room - 1 && shown.size() > room;
            String l = last ? "... " + (shown.size() - i) + " more lines" : shown.get(i);
            cc.text(r.col() + 2, r.row() + 1 + i, Canvas.fit(l, width - 4), last ? Palette.DIM : Palette.TEXT,
                    Palette.OVERLAY_BACKGROUND);
        }
        cc.text(r.col() + 2, r.bottom() - 2, "any key closes this", Palette.DIM, Palette.OVERLAY_BACKGROUND);
    }

    /** Long lines broken at a space, the rest indented; a source line and its caret are left whole. */
    static List<String> wrap(List<String> lines, int width) {
        List<String> out = new java.util.ArrayList<>();
        for (String l : lines) {
            String rest = l;
            String indent = "";
            boolean source = l.startsWith(" ");
            while (rest.length() > width && width > 12 && !source) {
                int cut = rest.lastIndexOf(' ', width);
                if (cut <= indent.length()) {
                    break;
                }
                out.add(rest.substring(0, cut));
                indent = "    ";
                rest = indent + rest.substring(cut + 1);
            }
            out.add(rest);
        }
        return out;
    }
}
