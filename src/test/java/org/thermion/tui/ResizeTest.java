package org.thermion.tui;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The layout follows the terminal's size, drops panels in order, and refuses tiny windows. */
class ResizeTest {

    @Test
    void shortWindowsHideTheTailOfTheOrderOneByOne() {
        // Wide enough for a side column, whose rows are the body (rows - 3); each panel 7 rows, power 15.
        int cols = 150;
        java.util.function.ToIntBiFunction<Panel, Integer> h = (q, w) -> q == Panel.POWER ? 15 : 7;
        assertThat(Layout.plan(cols, 3 + 7 + 7 + 7 + 15, h).hidden()).isEmpty();
        assertThat(Layout.plan(cols, 3 + 7 + 7 + 7 + 14, h).hidden()).containsExactly(Panel.POWER);
        assertThat(Layout.plan(cols, 3 + 7 + 7 + 6, h).hidden()).containsExactly(Panel.DECODE, Panel.POWER);
        assertThat(Layout.plan(cols, 3 + 7 + 6, h).hidden()).containsExactly(Panel.IO, Panel.DECODE, Panel.POWER);
    }

    @Test
    void panelsDropInOrderAsTheWindowShrinksAndComeBackWhenItGrows() throws IOException {
        UiFixture f = new UiFixture(120, 40).type("cccccc");
        String wide = f.text();
        assertThat(wide).contains("program").contains("state").contains("decode lines")
                .contains("switches and lamps").contains("power").doesNotContain("(power)");

        f.resize(80, 40);
        // Narrow: one column; the power panel keeps its module table and leaves out the rail totals.
        assertThat(f.line("THERMION")).doesNotContain("Tab");
        assertThat(f.text()).contains("decode lines").contains("switches and lamps").contains(Glyphs.LAMP_ON + " pump")
                .contains("power \u00B7 rail totals need more rows").contains("all modules");
        f.assertGolden("narrow-80x40.txt");

        f.resize(80, 30);
        assertThat(f.line("THERMION")).contains("Tab state decode switches (power)");

        f.resize(70, 20);
        assertThat(f.line("THERMION")).contains("Tab state decode (switches) (power)");
        assertThat(f.text()).contains("state").contains("program");

        f.resize(50, 12);
        assertThat(f.text()).contains("This window is 50 \u00D7 12.").contains("at least 60 \u00D7 16")
                .doesNotContain("program");

        f.resize(120, 40);
        assertThat(f.text()).isEqualTo(wide);
    }

    /**
     * The order panels are kept in when rows run short, written out here rather than read from
     * {@code Layout}: the state bits first (what the program is doing), then switches and lamps
     * (what the builder works), the decode lines, and the power table last.
     */
    private static final List<Panel> KEPT_FIRST = List.of(Panel.STATE, Panel.IO, Panel.DECODE, Panel.POWER);

    @Test
    void theLayoutKeepsThePriorityOrderAndNeverOverlaps() {
        for (int cols = Layout.MIN_COLS; cols <= 160; cols += 7) {
            for (int rows = Layout.MIN_ROWS; rows <= 60; rows += 3) {
                // Panels of six rows and a power panel of fifteen: once one is hidden, every later one
                // is at least as tall, so the hidden panels are exactly a tail of the order.
                Layout.Plan p = Layout.plan(cols, rows, (panel, w) -> panel == Panel.POWER ? 15 : 6);
                assertThat(p.tooSmall()).isFalse();
                assertThat(p.shows(Panel.LISTING)).isTrue();
                int firstHidden = KEPT_FIRST.size();
                for (int i = 0; i < KEPT_FIRST.size(); i++) {
                    if (!p.shows(KEPT_FIRST.get(i))) {
                        firstHidden = Math.min(firstHidden, i);
                    }
                }
                assertThat(p.hidden()).as(cols + "x" + rows)
                        .containsExactlyElementsOf(KEPT_FIRST.subList(firstHidden, KEPT_FIRST.size()));
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
