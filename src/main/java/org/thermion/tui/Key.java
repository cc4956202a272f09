package org.thermion.tui;

/** A resolved key press: the command and its argument (an input index, or 0). */
record Key(Command command, int arg) {
}
