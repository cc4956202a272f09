package org.thermion.tui;

/**
 * What the screen looks at, apart from the machine: the listing cursor and scroll, whether
 * the listing follows the PC, overlays, the power-up rail, the measured run speed and a
 * one-line message.
 */
final class View {
    /** The two screens. */
    enum Mode { MAIN, POWER_UP }

    int cursor;
    int top;
    boolean followPc = true;
    boolean help;
    Mode mode = Mode.MAIN;
    int rail;
    double cyclesPerSecond;
    String message = "";
}
