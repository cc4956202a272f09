package org.thermion.tui;

import java.util.List;

/**
 * A box in the middle of the screen listing every key. When the window is too short for the
 * whole list it comes in pages: Space or PgDn turns the page, any other key closes it.
 */
final class HelpOverlay {
    private HelpOverlay() {
    }

    /** Key lines one page holds in a window of {@code rows}. */
    static int perPage(List<Keymap.HelpLine> lines, int rows) {
        return Math.max(1, Math.min(lines.size(), rows - 6));
    }

    static boolean hasPage(int page, List<Keymap.HelpLine> lines, int rows) {
        return page * perPage(lines, rows) < lines.size();
    }

    static void draw(Canvas c, int cols, int rows, List<Keymap.HelpLine> lines, int page) {
        int keyWidth = 0;
        int meaningWidth = 0;
        for (Keymap.HelpLine l : lines) {
            keyWidth = Math.max(keyWidth, l.keys().length());
            meaningWidth = Math.max(meaningWidth, l.meaning().length());
        }
        int per = perPage(lines, rows);
        int pages = (lines.size() + per - 1) / per;
        int width = Math.min(cols - 2, keyWidth + meaningWidth + 7);
        int height = Math.min(rows - 2, lines.size() + 4);
        Rect r = new Rect((cols - width) / 2, (rows - height) / 2, width, height);
        c.fill(r, Palette.OVERLAY_BACKGROUND);
        c.box(r, pages > 1 ? "keys \u00B7 page " + (page + 1) + " of " + pages : "keys");
        Canvas cc = c.within(Canvas.inside(r));
        int from = Math.min(page * per, lines.size());
        int shown = Math.min(per, lines.size() - from);
        for (int i = 0; i < shown; i++) {
            Keymap.HelpLine l = lines.get(from + i);
            int row = r.row() + 2 + i;
            cc.text(r.col() + 2, row, Canvas.pad(l.keys(), keyWidth), Palette.KEY, Palette.OVERLAY_BACKGROUND);
            cc.text(r.col() + 4 + keyWidth, row, l.meaning(), Palette.TEXT, Palette.OVERLAY_BACKGROUND);
        }
        if (pages > 1) {
            String note = page + 1 < pages ? "Space: next page \u00B7 any other key closes" : "last page \u00B7 any key closes";
            cc.text(r.col() + 2, r.bottom() - 2, note, Palette.DIM, Palette.OVERLAY_BACKGROUND);
        }
    }
}
