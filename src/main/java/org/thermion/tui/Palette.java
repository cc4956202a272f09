package org.thermion.tui;

import com.googlecode.lanterna.TextColor;

/**
 * Colours of the screen: warm and low in glare, like lit filaments in a dark room. Lit
 * lamps glow amber, dark ones are brown; unknown is a muted violet so it never reads as
 * either. Shape carries the meaning too (see {@link Glyphs}), so colour is only a help.
 */
final class Palette {
    static final TextColor BACKGROUND = new TextColor.RGB(28, 23, 19);
    static final TextColor TEXT = new TextColor.RGB(208, 192, 164);
    static final TextColor DIM = new TextColor.RGB(132, 114, 94);
    static final TextColor BORDER = new TextColor.RGB(92, 74, 58);
    static final TextColor HEADING = new TextColor.RGB(222, 162, 100);
    static final TextColor LIT = new TextColor.RGB(255, 184, 82);
    static final TextColor UNLIT = new TextColor.RGB(112, 94, 76);
    static final TextColor UNKNOWN = new TextColor.RGB(166, 136, 178);
    static final TextColor PC_BACKGROUND = new TextColor.RGB(74, 52, 30);
    static final TextColor CURSOR_BACKGROUND = new TextColor.RGB(50, 41, 34);
    static final TextColor BREAKPOINT = new TextColor.RGB(216, 100, 76);
    static final TextColor RUNNING = new TextColor.RGB(160, 178, 108);
    static final TextColor STOPPED = new TextColor.RGB(216, 128, 88);
    static final TextColor KEY = new TextColor.RGB(236, 206, 150);
    static final TextColor OVERLAY_BACKGROUND = new TextColor.RGB(44, 35, 28);

    private Palette() {
    }

    static TextColor lamp(Level l) {
        switch (l) {
            case ON:
                return LIT;
            case UNKNOWN:
                return UNKNOWN;
            default:
                return UNLIT;
        }
    }
}
