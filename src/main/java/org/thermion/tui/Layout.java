package org.thermion.tui;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.ToIntBiFunction;

/**
 * Where the panels go for a terminal size. Wide terminals put the listing on the left and
 * the other panels stacked on the right; narrow ones stack everything under the listing.
 * When rows run out, panels are left out in a fixed order (power first, then decode lines,
 * then switches and lamps, state last) and the plan says which; a panel brought forward
 * goes before that order, so every panel can be shown at any size; the listing and the title
 * and status lines always stay. Below a minimum size there is no layout at all.
 */
final class Layout {
    static final int MIN_COLS = 60;
    static final int MIN_ROWS = 16;
    static final int WIDE_COLS = 100;
    /** Listing rows (with its border) kept before any other panel is placed. */
    static final int LISTING_MIN = 8;
    /** Panels in the order they are kept when rows are short; the rest are hidden. */
    static final Panel[] PRIORITY = {Panel.STATE, Panel.IO, Panel.DECODE, Panel.POWER};
    private static final Panel[] STACK = {Panel.STATE, Panel.DECODE, Panel.IO, Panel.POWER};

    /** The result: rectangles of the shown panels, and the panels left out. */
    record Plan(int cols, int rows, boolean tooSmall, boolean wide, Map<Panel, Rect> rects, List<Panel> hidden) {
        Rect rect(Panel p) {
            return rects.get(p);
        }

        boolean shows(Panel p) {
            return rects.containsKey(p);
        }
    }

    private Layout() {
    }

    /** Plans a screen where every panel needs its whole height. */
    static Plan plan(int cols, int rows, ToIntBiFunction<Panel, Integer> heightFor) {
        return plan(cols, rows, heightFor, heightFor);
    }

    /**
     * Plans a screen of {@code cols} x {@code rows}. {@code heightFor(panel, width)} gives the
     * rows a panel wants with its border, {@code leastFor} the fewest it can show itself in
     * (a panel that gets less than it wants draws its most important part).
     */
    static Plan plan(int cols, int rows, ToIntBiFunction<Panel, Integer> heightFor, ToIntBiFunction<Panel, Integer> leastFor) {
        return plan(cols, rows, heightFor, leastFor, null);
    }

    /** As above, with {@code front} (or null) given room before the usual order. */
    static Plan plan(int cols, int rows, ToIntBiFunction<Panel, Integer> heightFor, ToIntBiFunction<Panel, Integer> leastFor,
            Panel front) {
        Map<Panel, Rect> rects = new EnumMap<>(Panel.class);
        List<Panel> hidden = new ArrayList<>();
        if (cols < MIN_COLS || rows < MIN_ROWS) {
            return new Plan(cols, rows, true, false, rects, hidden);
        }
        int top = 1;
        int body = rows - 3;
        boolean wide = cols >= WIDE_COLS;
        int listingWidth = wide ? Math.max(36, Math.min(56, cols * 2 / 5)) : cols;
        int sideWidth = wide ? cols - listingWidth : cols;
        int room = wide ? body : body - LISTING_MIN;
        Map<Panel, Integer> heights = new EnumMap<>(Panel.class);
        for (Panel p : order(front)) {
            int h = heightFor.applyAsInt(p, sideWidth);
            int least = Math.min(h, leastFor.applyAsInt(p, sideWidth));
            if (p == front && least > room) {
                // The panel asked for gets whatever there is; it draws what fits.
                least = room;
            }
            if (h <= room) {
                heights.put(p, h);
                room -= h;
            } else if (least <= room) {
                heights.put(p, least);
                room -= least;
            } else {
                hidden.add(p);
            }
        }
        int sideTop = wide ? top : top + LISTING_MIN + room;
        rects.put(Panel.LISTING, new Rect(0, top, listingWidth, wide ? body : LISTING_MIN + room));
        Panel last = null;
        for (Panel p : STACK) {
            if (heights.containsKey(p)) {
                last = p;
            }
        }
        int row = sideTop;
        for (Panel p : STACK) {
            Integer h = heights.get(p);
            if (h == null) {
                continue;
            }
            // In the wide layout the last panel reaches down to the status line, so the column ends square.
            int height = wide && p == last ? top + body - row : h;
            rects.put(p, new Rect(wide ? listingWidth : 0, row, sideWidth, height));
            row += height;
        }
        return new Plan(cols, rows, false, wide, rects, hidden);
    }

    private static List<Panel> order(Panel front) {
        List<Panel> o = new ArrayList<>(List.of(PRIORITY));
        if (front != null && o.remove(front)) {
            o.add(0, front);
        }
        return o;
    }

    /**
     * The hidden panel Tab (step 1) or Shift-Tab (step -1) brings forward: the next one after
     * {@code front} in screen order, going round; with none hidden, the next panel at all.
     */
    static Panel next(Panel front, List<Panel> hidden, int step) {
        Panel[] all = Keymap.PANEL_KEYS;
        int at = -1;
        for (int i = 0; i < all.length; i++) {
            if (all[i] == front) {
                at = i;
            }
        }
        if (at < 0 && step < 0) {
            at = 0;
        }
        for (int k = 1; k <= all.length; k++) {
            Panel p = all[Math.floorMod(at + step * k, all.length)];
            if (hidden.isEmpty() || hidden.contains(p)) {
                return p;
            }
        }
        return front;
    }
}
