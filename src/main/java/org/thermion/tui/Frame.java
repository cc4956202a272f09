package org.thermion.tui;

import com.googlecode.lanterna.TextCharacter;
import com.googlecode.lanterna.screen.Screen;

/**
 * The cells of one frame, drawn here first and then handed to the screen only where they
 * differ from the frame before: Lanterna measures the width of every character it is given,
 * and most of the screen stays the same from one frame to the next. Cells come from
 * {@link Cells}, so "the same" is identity.
 */
final class Frame {
    private final Cells cells;
    private TextCharacter[][] now = new TextCharacter[0][0];
    private TextCharacter[][] before;

    Frame(Cells cells) {
        this.cells = cells;
    }

    Cells cells() {
        return cells;
    }

    /** Starts a frame of this size, every cell blank; a new size forgets the frame before. */
    void begin(int cols, int rows) {
        if (now.length != rows || (rows > 0 && now[0].length != cols)) {
            now = new TextCharacter[rows][cols];
            before = null;
        }
        TextCharacter blank = cells.of(' ', Palette.TEXT, Palette.BACKGROUND);
        for (TextCharacter[] row : now) {
            java.util.Arrays.fill(row, blank);
        }
    }

    void put(int col, int row, TextCharacter c) {
        if (row >= 0 && row < now.length && col >= 0 && col < now[row].length) {
            now[row][col] = c;
        }
    }

    /** Hands the changed cells to the screen and keeps this frame to compare the next with. */
    void flush(Screen screen) {
        for (int r = 0; r < now.length; r++) {
            for (int c = 0; c < now[r].length; c++) {
                if (before == null || before[r][c] != now[r][c]) {
                    screen.setCharacter(c, r, now[r][c]);
                }
            }
        }
        TextCharacter[][] old = before;
        before = now;
        now = old != null && old.length == before.length ? old : new TextCharacter[before.length][before.length == 0 ? 0 : before[0].length];
    }

    /** Forgets the frame before, so the next flush writes every cell (after the screen lost its contents). */
    void invalidate() {
        before = null;
    }
}
