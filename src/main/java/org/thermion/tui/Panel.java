package org.thermion.tui;

/** The boxes of the main screen. Title and status lines are always shown and not panels. */
enum Panel {
    LISTING("program", "program"), STATE("state", "state"), DECODE("decode", "decode"),
    IO("switches and lamps", "switches"), POWER("power", "power");

    final String title;
    /** The panel's word on the title line's panel row, and for its function key. */
    final String tab;

    Panel(String title, String tab) {
        this.title = title;
        this.tab = tab;
    }
}
