package org.thermion.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.thermion.power.startup.SoftStartSizing;

/** The two-way sizing table of a soft start a machine lacks, laid out as a grid for people. */
final class SizingTableText {
    private SizingTableText() {
    }

    /**
     * The grid: resistors down, bypass times across, the larger of the two peaks in each cell; the
     * balance point marked with *, a cell at the supply's limit with !. CSV and JSON carry the same
     * cells as a table of their own ({@link PowerUpSizingReport}).
     */
    static List<String> grid(SoftStartSizing.Table t) {
        List<String> out = new ArrayList<>();
        StringBuilder cols = new StringBuilder(String.format(Locale.ROOT, "  %-9s", "ohm \\ s"));
        for (double s : t.seconds()) {
            cols.append(String.format(Locale.ROOT, " %7.3g", s));
        }
        out.add(cols.toString());
        for (int i = 0; i < t.ohms().length; i++) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "  %-9.4g", t.ohms()[i]));
            for (int j = 0; j < t.seconds().length; j++) {
                SoftStartSizing.Cell c = t.cells()[i][j];
                String mark = i == t.bestOhm() && j == t.bestTime() ? "*" : c.withinLimit() ? " " : "!";
                row.append(String.format(Locale.ROOT, " %6.2f%s", c.worstPeak(), mark));
            }
            out.add(row.toString().stripTrailing());
        }
        return out;
    }
}
