package org.thermion.cli;

import java.io.PrintWriter;
import java.util.Locale;

import org.thermion.power.startup.SoftStartSizing;

/** Writes the sizing table of a soft start a machine lacks, as plain text. */
final class SizingTableText {
    private SizingTableText() {
    }

    /**
     * The two-way sizing table of a soft start the machine does not have yet (plain text; the balance
     * point marked with *, a cell at the supply's limit with !).
     */
    static void write(PrintWriter out, SoftStartSizing.Table t) {
        String head = "sizing a soft start for rail " + t.rail() + " (no soft start declared; limit "
                + (Double.isInfinite(t.limitAmps()) ? "none" : String.format(Locale.ROOT, "%.3g A", t.limitAmps()))
                + "): larger of the switch-on and bypass peaks in amperes, by resistor (rows, ohms) and bypass time "
                + "(columns, seconds); * marks the balance point, ! a cell at the supply's limit";
        StringBuilder line = new StringBuilder();
        for (String w : head.split(" ")) {
            if (line.length() + w.length() + 1 > 78) {
                out.println(line);
                line.setLength(0);
            }
            line.append(line.length() == 0 ? "" : " ").append(w);
        }
        out.println(line);
        StringBuilder cols = new StringBuilder(String.format(Locale.ROOT, "  %-9s", "ohms"));
        for (double s : t.seconds()) {
            cols.append(String.format(Locale.ROOT, " %7.3g", s));
        }
        out.println(cols);
        for (int i = 0; i < t.ohms().length; i++) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "  %-9.4g", t.ohms()[i]));
            for (int j = 0; j < t.seconds().length; j++) {
                SoftStartSizing.Cell c = t.cells()[i][j];
                String mark = i == t.bestOhm() && j == t.bestTime() ? "*" : c.withinLimit() ? " " : "!";
                row.append(String.format(Locale.ROOT, " %6.2f%s", c.worstPeak(), mark));
            }
            out.println(row);
        }
        SoftStartSizing.Cell b = t.best();
        out.println(b == null ? "  no cell keeps the supply within its limit"
                : String.format(Locale.ROOT, "  balance: %.4g ohm bypassed at %.3g s (switch-on peak %.3g A, bypass peak %.3g A)",
                t.ohms()[t.bestOhm()], t.seconds()[t.bestTime()], b.switchOnPeak(), b.bypassPeak())
                + (Double.isNaN(t.preferredOhms()) ? "" : String.format(Locale.ROOT, "; preferred value %.3g ohm (E24)",
                t.preferredOhms()) + (Double.isNaN(t.preferredWatts()) ? "" : String.format(Locale.ROOT,
                ", %.3g W by temperature rise (10 x for 5 s, common practice)", t.preferredWatts()))));
        out.println("  computed on " + t.threads() + " thread(s), one run per resistor serving every bypass time");
        out.println();
        out.println(PowerUpReport.CAUTION);
    }
}
