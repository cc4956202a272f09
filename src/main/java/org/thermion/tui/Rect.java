package org.thermion.tui;

/** A rectangle of character cells: left column, top row, width, height. */
record Rect(int col, int row, int width, int height) {
    int right() {
        return col + width;
    }

    int bottom() {
        return row + height;
    }
}
