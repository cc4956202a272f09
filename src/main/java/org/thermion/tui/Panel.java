package org.thermion.tui;

/** The boxes of the main screen. Title and status lines are always shown and not panels. */
enum Panel {
    LISTING("program"), STATE("state"), DECODE("decode"), IO("switches and lamps"), POWER("power");

    final String title;

    Panel(String title) {
        this.title = title;
    }
}
