package org.thermion.tui;

/** What a lamp shows for one net on the lane the session watches. */
public enum Level {
    OFF, ON, UNKNOWN;

    /** The level a '0', '1' or 'x' stands for. */
    static Level of(char level) {
        return level == 'x' ? UNKNOWN : level == '1' ? ON : OFF;
    }

    static Level of(long value, long unknown, int lane) {
        if ((unknown >>> lane & 1L) != 0) {
            return UNKNOWN;
        }
        return (value >>> lane & 1L) != 0 ? ON : OFF;
    }
}
