package org.thermion.tui;

/**
 * What the screen looks at, apart from the machine: the listing cursor and scroll, whether
 * the listing follows the PC, overlays, the power-up rail, the measured run speed and a
 * one-line message, and which side panel is brought forward.
 */
final class View {
    /** The two screens. */
    enum Mode { MAIN, POWER_UP, BENCH }

    int cursor;
    int top;
    boolean followPc = true;
    boolean help;
    /** Page of the help overlay when it needs more rows than the window has. */
    int helpPage;
    /** The side panel brought forward with Tab or a function key; it gets room first. Null: the usual order. */
    Panel front;
    Mode mode = Mode.MAIN;
    int rail;
    double cyclesPerSecond;
    /** Runs keep to the machine's declared clock instead of going flat out. */
    boolean machineSpeed;
    String message = "";
    /** Buses shown bit by bit (v) instead of as one number each. */
    boolean bits;
    /** What a reload said (changes and what was kept, or the saved files' errors); null when closed. */
    Notice notice;
}
