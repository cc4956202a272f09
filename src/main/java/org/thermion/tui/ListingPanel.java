package org.thermion.tui;

import com.googlecode.lanterna.TextColor;
import org.thermion.asm.ListingLine;

import java.util.List;

/**
 * The program: one row per source line with its address and word, a diamond in the gutter
 * for a breakpoint, an arrow at the PC (filled while its cycle runs, hollow when it is next
 * to be fetched) and the cursor as a mark on the left edge.
 */
final class ListingPanel {
    private ListingPanel() {
    }

    /** Rows of listing the panel shows: its inside less the header row. */
    static int rows(Rect r) {
        return Math.max(1, r.height() - 3);
    }

    /** Keeps the line of interest in view: the PC while following it, else the cursor. */
    static void scroll(View v, Session s, int rows) {
        int size = s.assembly().listing().size();
        int pcLine = s.listingIndex(s.pc());
        int target = v.followPc && pcLine >= 0 ? pcLine : v.cursor;
        // A line brought into view keeps a few lines of context around it.
        int margin = Math.min(3, (rows - 1) / 2);
        if (target < v.top + margin) {
            v.top = target - margin;
        } else if (target >= v.top + rows - margin) {
            v.top = target - rows + 1 + margin;
        }
        // The view may scroll past the end only as far as puts the first instruction near the top,
        // so a long header of comments never fills the panel while rows stay empty below; a
        // listing that fits whole is shown whole.
        int floor = size <= rows ? 0 : firstWord(s) - 3;
        v.top = Math.max(0, Math.min(v.top, Math.max(size - rows, floor)));
    }

    private static int firstWord(Session s) {
        List<ListingLine> listing = s.assembly().listing();
        for (int i = 0; i < listing.size(); i++) {
            if (listing.get(i).hasWord()) {
                return i;
            }
        }
        return 0;
    }

    static void draw(Canvas c, Rect r, Session s, View v) {
        c.box(r, "program");
        Rect in = Canvas.inside(r);
        Canvas cc = c.within(in);
        int addrDigits = Hex.digits(s.machine().pc().width());
        int wordDigits = Math.max(4, Hex.digits(s.machine().rom().width()));
        String header = "  " + Canvas.pad("at", addrDigits) + " " + Canvas.pad("word", wordDigits) + "  source";
        cc.text(in.col(), in.row(), Canvas.pad(header, in.width()), Palette.DIM);
        int rows = rows(r);
        scroll(v, s, rows);
        List<ListingLine> listing = s.assembly().listing();
        int pcLine = s.listingIndex(s.pc());
        if (listing.isEmpty()) {
            cc.text(in.col() + 1, in.row() + 1, "(the program has no lines)", Palette.DIM);
        }
        for (int i = 0; i < rows && v.top + i < listing.size(); i++) {
            int idx = v.top + i;
            ListingLine l = listing.get(idx);
            int row = in.row() + 1 + i;
            boolean atPc = idx == pcLine;
            boolean atCursor = idx == v.cursor;
            TextColor bg = atPc ? Palette.PC_BACKGROUND : atCursor ? Palette.CURSOR_BACKGROUND : Palette.BACKGROUND;
            cc.text(in.col(), row, " ".repeat(in.width()), Palette.TEXT, bg);
            int col = in.col();
            boolean bp = l.hasWord() && s.breakpoint(l.address());
            col = cc.text(col, row, bp ? String.valueOf(Glyphs.BREAKPOINT) : " ", Palette.BREAKPOINT, bg);
            String pc = atPc ? String.valueOf(s.midCycle() ? Glyphs.PC : Glyphs.PC_NEXT) : " ";
            col = cc.text(col, row, pc, Palette.LIT, bg);
            if (l.hasWord()) {
                col = cc.text(col, row, Hex.address(l.address(), s.machine()) + " ", Palette.DIM, bg);
                col = cc.text(col, row, Canvas.pad(Hex.word(l.word(), s.machine()), wordDigits) + "  ", atPc ? Palette.LIT : Palette.DIM, bg);
            } else {
                col += addrDigits + wordDigits + 3;
            }
            String src = l.sourceText().replace("\t", "    ").stripTrailing();
            cc.text(col, row, Canvas.fit(src, in.right() - col), atPc ? Palette.LIT : Palette.TEXT, bg);
            if (atCursor) {
                c.text(r.col(), row, String.valueOf(Glyphs.CURSOR), Palette.KEY);
            }
        }
        int last = Math.min(listing.size(), v.top + rows);
        if (listing.size() > rows && r.width() > 20) {
            String where = " " + (v.top + 1) + "-" + last + " of " + listing.size() + " ";
            c.text(r.right() - 2 - where.length(), r.bottom() - 1, where, Palette.DIM);
        }
    }
}
