package org.thermion.tui;

/**
 * What a key asks for. {@link Key#arg()} carries the input index for {@link #TOGGLE_INPUT}
 * and the {@link Panel} ordinal for {@link #SHOW_PANEL}.
 */
enum Command {
    STEP_PHASE, STEP_CYCLE, RUN_PAUSE, PACE, RESET, TOGGLE_INPUT, BREAKPOINT, CLEAR_BREAKPOINTS,
    CURSOR_UP, CURSOR_DOWN, PAGE_UP, PAGE_DOWN, FIRST_LINE, LAST_LINE, CURSOR_TO_PC,
    NEXT_PANEL, PREVIOUS_PANEL, SHOW_PANEL, POWER_UP_VIEW, NEXT_RAIL, PREVIOUS_RAIL, HELP, CLOSE, QUIT,
    WORD_UP, WORD_DOWN, WORD_CLEAR, BENCH_VIEW, BUS_BITS
}
