package org.thermion.tui;

import java.util.List;

/** Labelled lamps in rows, as many to a row as fit; used for state bits and decode lines. */
final class LampGrid {
    private LampGrid() {
    }

    /** Columns one lamp takes: glyph, space, the longest label, two spaces. */
    static int cell(List<String> labels) {
        int w = 1;
        for (String l : labels) {
            w = Math.max(w, l.length());
        }
        return w + 4;
    }

    static int perRow(List<String> labels, int innerWidth) {
        return Math.max(1, (innerWidth - 1) / cell(labels));
    }

    /** Rows with border for {@code labels} in a panel {@code width} wide (one row when empty, for a note). */
    static int height(List<String> labels, int width) {
        if (labels.isEmpty()) {
            return 3;
        }
        int per = perRow(labels, width - 2);
        return (labels.size() + per - 1) / per + 2;
    }

    static void draw(Canvas c, Rect r, String title, List<String> labels, List<Level> levels, String emptyNote) {
        c.box(r, title);
        Rect in = Canvas.inside(r);
        Canvas cc = c.within(in);
        if (labels.isEmpty()) {
            cc.text(in.col() + 1, in.row(), Canvas.fit(emptyNote, in.width() - 1), Palette.DIM);
            return;
        }
        int cell = cell(labels);
        int per = perRow(labels, in.width());
        for (int i = 0; i < labels.size(); i++) {
            int col = in.col() + 1 + (i % per) * cell;
            int row = in.row() + i / per;
            Level l = levels.get(i);
            cc.text(col, row, String.valueOf(Glyphs.lamp(l)), Palette.lamp(l));
            cc.text(col + 2, row, labels.get(i), l == Level.ON ? Palette.LIT : l == Level.UNKNOWN ? Palette.UNKNOWN : Palette.DIM);
        }
    }
}
