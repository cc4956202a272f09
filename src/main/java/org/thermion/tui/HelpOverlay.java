package org.thermion.tui;

import java.util.List;

/** A box in the middle of the screen listing every key; any key closes it. */
final class HelpOverlay {
    private HelpOverlay() {
    }

    static void draw(Canvas c, int cols, int rows, List<Keymap.HelpLine> lines) {
        int keyWidth = 0;
        int meaningWidth = 0;
        for (Keymap.HelpLine l : lines) {
            keyWidth = Math.max(keyWidth, l.keys().length());
            meaningWidth = Math.max(meaningWidth, l.meaning().length());
        }
        int width = Math.min(cols - 2, keyWidth + meaningWidth + 7);
        int height = Math.min(rows - 2, lines.size() + 4);
        Rect r = new Rect((cols - width) / 2, (rows - height) / 2, width, height);
        c.fill(r, Palette.OVERLAY_BACKGROUND);
        c.box(r, "keys");
        Canvas cc = c.within(Canvas.inside(r));
        int shown = Math.min(lines.size(), height - 4);
        for (int i = 0; i < shown; i++) {
            Keymap.HelpLine l = lines.get(i);
            int row = r.row() + 2 + i;
            cc.text(r.col() + 2, row, Canvas.pad(l.keys(), keyWidth), Palette.KEY, Palette.OVERLAY_BACKGROUND);
            cc.text(r.col() + 4 + keyWidth, row, l.meaning(), Palette.TEXT, Palette.OVERLAY_BACKGROUND);
        }
        if (shown < lines.size()) {
            cc.text(r.col() + 2, r.bottom() - 2, "(" + (lines.size() - shown) + " more: enlarge the window)",
                    Palette.DIM, Palette.OVERLAY_BACKGROUND);
        }
    }
}
