package org.thermion.elab;

import org.thermion.lang.Span;

/** A name in a module scope: its nets (LSB first), where declared, and what it is. */
record Signal(String name, int[] nets, Span decl, Kind kind, boolean bus) {
    enum Kind { IN, OUT, NET, LATCH }

    int width() {
        return nets.length;
    }
}
