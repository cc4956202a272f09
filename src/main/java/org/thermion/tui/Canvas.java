package org.thermion.tui;

import com.googlecode.lanterna.TextColor;

/** Drawing on a screen in absolute cells, clipped to a rectangle; never writes outside it. */
final class Canvas {
    private final Frame frame;
    private final Rect clip;

    Canvas(Frame frame, Rect clip) {
        this.frame = frame;
        this.clip = clip;
    }

    Canvas within(Rect r) {
        int c0 = Math.max(clip.col(), r.col());
        int r0 = Math.max(clip.row(), r.row());
        int c1 = Math.min(clip.right(), r.right());
        int r1 = Math.min(clip.bottom(), r.bottom());
        return new Canvas(frame, new Rect(c0, r0, Math.max(0, c1 - c0), Math.max(0, r1 - r0)));
    }

    void fill(Rect r, TextColor bg) {
        String blank = " ".repeat(Math.max(0, r.width()));
        for (int row = r.row(); row < r.bottom(); row++) {
            text(r.col(), row, blank, Palette.TEXT, bg);
        }
    }

    /** Writes {@code s} from (col,row); returns the column after it. */
    int text(int col, int row, String s, TextColor fg, TextColor bg) {
        if (row < clip.row() || row >= clip.bottom()) {
            return col + s.length();
        }
        int start = Math.max(col, clip.col());
        int end = Math.min(col + s.length(), clip.right());
        for (int x = start; x < end; x++) {
            frame.put(x, row, frame.cells().of(s.charAt(x - col), fg, bg));
        }
        return col + s.length();
    }

    int text(int col, int row, String s, TextColor fg) {
        return text(col, row, s, fg, Palette.BACKGROUND);
    }

    /** A single-line frame with a title in its top edge. */
    void box(Rect r, String title) {
        if (r.width() < 2 || r.height() < 2) {
            return;
        }
        String inner = "\u2500".repeat(r.width() - 2);
        text(r.col(), r.row(), "\u256D" + inner + "\u256E", Palette.BORDER);
        text(r.col(), r.bottom() - 1, "\u2570" + inner + "\u256F", Palette.BORDER);
        for (int row = r.row() + 1; row < r.bottom() - 1; row++) {
            text(r.col(), row, "\u2502", Palette.BORDER);
            text(r.right() - 1, row, "\u2502", Palette.BORDER);
        }
        if (!title.isEmpty() && r.width() > 6) {
            String t = " " + fit(title, r.width() - 6) + " ";
            text(r.col() + 2, r.row(), t, Palette.HEADING);
        }
    }

    /** The inside of a box drawn with {@link #box}. */
    static Rect inside(Rect r) {
        return new Rect(r.col() + 1, r.row() + 1, Math.max(0, r.width() - 2), Math.max(0, r.height() - 2));
    }

    static String fit(String s, int width) {
        if (width <= 0) {
            return "";
        }
        if (s.length() <= width) {
            return s;
        }
        return width == 1 ? "\u2026" : s.substring(0, width - 1) + "\u2026";
    }

    static String pad(String s, int width) {
        String f = fit(s, width);
        return f + " ".repeat(width - f.length());
    }

    static String padLeft(String s, int width) {
        String f = fit(s, width);
        return " ".repeat(width - f.length()) + f;
    }
}
