package org.thermion.tui;

import org.junit.jupiter.api.Test;

import java.io.IOException;

import static org.assertj.core.api.Assertions.assertThat;

/** The layout follows the terminal's size, drops panels in order, and refuses tiny windows. */
class ResizeTest {

    @Test
    void panelsDropInOrderAsTheWindowShrinksAndComeBackWhenItGrows() throws IOException {
        UiFixture f = new UiFixture(120, 40).type("cccccc");
        String wide = f.text();
        assertThat(wide).contains("program").contains("state").contains("decode lines")
                .contains("switches and lamps").contains("power").doesNotContain("hidden");

        f.resize(80, 40);
        // Narrow: one column; the power panel keeps its module table and leaves out the rail totals.
        assertThat(f.line("THERMION")).doesNotContain("hidden");
        assertThat(f.text()).contains("decode lines").contains("switches and lamps").contains(Glyphs.LAMP_ON + " pump")
                .contains("power \u00B7 rail totals need more rows").contains("all modules");
        f.assertGolden("narrow-80x40.txt");

        f.resize(80, 30);
        assertThat(f.line("THERMION")).contains("hidden, too little room: power");

        f.resize(70, 20);
        assertThat(f.line("THERMION")).contains("hidden, too little room: switches and lamps, power");
        assertThat(f.text()).contains("state").contains("program");

        f.resize(50, 12);
        assertThat(f.text()).contains("This window is 50 \u00D7 12.").contains("at least 60 \u00D7 16")
                .doesNotContain("program");

        f.resize(120, 40);
        assertThat(f.text()).isEqualTo(wide);
    }

    @Test
    void theLayoutKeepsThePriorityOrderAndNeverOverlaps() {
        for (int cols = Layout.MIN_COLS; cols <= 160; cols += 7) {
            for (int rows = Layout.MIN_ROWS; rows <= 60; rows += 3) {
                Layout.Plan p = Layout.plan(cols, rows, (panel, w) -> panel == Panel.POWER ? 15 : 6);
                assertThat(p.tooSmall()).isFalse();
                assertThat(p.shows(Panel.LISTING)).isTrue();
                // A panel is only hidden if every panel kept before it in priority is shown.
                boolean hiddenSeen = false;
                for (Panel q : Layout.PRIORITY) {
                    if (!p.shows(q)) {
                        hiddenSeen = true;
                    } else if (hiddenSeen) {
                        // Shown after a hidden one: only allowed if it is smaller than the room left.
                        assertThat(q).isNotEqualTo(Panel.POWER);
                    }
                }
                for (Rect a : p.rects().values()) {
                    assertThat(a.right()).isLessThanOrEqualTo(cols);
                    assertThat(a.bottom()).isLessThanOrEqualTo(rows - 2);
                    for (Rect b : p.rects().values()) {
                        if (a != b) {
                            boolean apart = a.right() <= b.col() || b.right() <= a.col()
                                    || a.bottom() <= b.row() || b.bottom() <= a.row();
                            assertThat(apart).as(cols + "x" + rows + ": " + a + " and " + b).isTrue();
                        }
                    }
                }
            }
        }
        assertThat(Layout.plan(Layout.MIN_COLS - 1, 40, (p, w) -> 5).tooSmall()).isTrue();
        assertThat(Layout.plan(120, Layout.MIN_ROWS - 1, (p, w) -> 5).tooSmall()).isTrue();
    }
}
