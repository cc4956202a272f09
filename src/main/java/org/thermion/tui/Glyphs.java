package org.thermion.tui;

/** The shapes on the screen. Lit and dark lamps differ in shape, not only in colour. */
final class Glyphs {
    static final char LAMP_ON = '\u25CF';      // filled circle
    static final char LAMP_OFF = '\u25CB';     // hollow circle
    static final char LAMP_UNKNOWN = '\u25D0'; // half-filled circle: neither lit nor dark
    static final char SWITCH_ON = '\u25A3';    // square with a filled square inside: lever thrown
    static final char SWITCH_OFF = '\u25A1';   // hollow square
    static final char PC = '\u25B6';           // the instruction in flight (its cycle has begun)
    static final char PC_NEXT = '\u25B7';      // the instruction the next cycle fetches
    static final char CURSOR = '\u25B8';       // the listing cursor, on the panel's left edge
    static final char BREAKPOINT = '\u25C6';   // filled diamond in the listing gutter

    private Glyphs() {
    }

    static char lamp(Level l) {
        switch (l) {
            case ON:
                return LAMP_ON;
            case UNKNOWN:
                return LAMP_UNKNOWN;
            default:
                return LAMP_OFF;
        }
    }
}
