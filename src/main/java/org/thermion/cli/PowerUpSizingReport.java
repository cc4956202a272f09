package org.thermion.cli;

import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.power.startup.SoftStartSizing;

import static org.thermion.cli.report.ReportUnit.AMPS;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.WATTS;

/**
 * Sizing a soft start a machine lacks ({@code powerup --sweep} without a declared soft start) as
 * one report: the balance point and its preferred value as fields, every (resistor, bypass time)
 * cell as a table for CSV and JSON, and the same cells as a grid for people.
 */
final class PowerUpSizingReport {
    /** The schema version of the sizing JSON ({@code org/thermion/schema/powerup_sizing.schema.json}). */
    static final int VERSION = 1;

    private PowerUpSizingReport() {
    }

    static Report of(SoftStartSizing.Table t) {
        Report rep = new Report("powerup_sizing", VERSION);
        SoftStartSizing.Cell b = t.best();
        Absent none = new Absent("no cell within the limit");
        rep.field("rail", t.rail());
        rep.field("limit", AMPS, Double.isInfinite(t.limitAmps()) ? PowerUpReport.NONE : t.limitAmps());
        rep.field("balance_resistor", OHMS, b == null ? none : t.ohms()[t.bestOhm()]);
        rep.field("balance_bypass", SECONDS, b == null ? none : t.seconds()[t.bestTime()]);
        rep.field("balance_switch_on_peak", AMPS, b == null ? none : b.switchOnPeak());
        rep.field("balance_bypass_peak", AMPS, b == null ? none : b.bypassPeak());
        rep.field("preferred", OHMS, Double.isNaN(t.preferredOhms()) ? none : t.preferredOhms());
        rep.field("preferred_rating", WATTS, Double.isNaN(t.preferredWatts()) ? new Absent("beyond the common list")
                : t.preferredWatts());
        rep.field("caution", PowerUpReport.CAUTION);
        rep.text("sizing a soft start for rail " + t.rail() + " (no soft start declared; limit "
                + (Double.isInfinite(t.limitAmps()) ? "none" : Numbers.si(t.limitAmps(), AMPS))
                + "): the larger of the switch-on and bypass peaks in amperes, by resistor (rows, ohms) and bypass "
                + "time (columns, seconds); * marks the balance point, ! a cell at the supply's limit", "");
        rep.verbatim(SizingTableText.grid(t));
        Table cells = new Table("cells", "every resistor and bypass time")
                .column("resistor", "resistor", OHMS)
                .column("bypass", "bypass at", SECONDS)
                .column("switch_on_peak", "switch-on pk", AMPS, "the highest current before the bypass")
                .column("bypass_peak", "bypass pk", AMPS, "the highest current the instant after it")
                .column("larger_peak", "larger", AMPS)
                .column("resistor_rating", "rating", WATTS, "the continuous rating its temperature rise asks")
                .column("within_limit", "in limit", FLAG, "the supply stays within its current limit")
                .column("balance", "balance", FLAG, "the cell of the smallest larger peak within the limit");
        for (int i = 0; i < t.ohms().length; i++) {
            for (int j = 0; j < t.seconds().length; j++) {
                SoftStartSizing.Cell c = t.cells()[i][j];
                cells.row(t.ohms()[i], t.seconds()[j], c.switchOnPeak(), c.bypassPeak(), c.worstPeak(), c.neededWatts(),
                        c.withinLimit(), i == t.bestOhm() && j == t.bestTime());
            }
        }
        rep.data(cells);
        rep.text("", b == null ? "no cell keeps the supply within its limit"
                : "balance: " + Numbers.si(t.ohms()[t.bestOhm()], OHMS) + " bypassed at "
                + Numbers.si(t.seconds()[t.bestTime()], SECONDS) + " (switch-on peak " + Numbers.si(b.switchOnPeak(), AMPS)
                + ", bypass peak " + Numbers.si(b.bypassPeak(), AMPS) + ")"
                + (Double.isNaN(t.preferredOhms()) ? "" : "; preferred value " + Numbers.si(t.preferredOhms(), OHMS) + " (E24)"
                + (Double.isNaN(t.preferredWatts()) ? "" : ", " + Numbers.si(t.preferredWatts(), WATTS)
                + " by temperature rise (10 x for 5 s, common practice)")), "",
                PowerUpReport.CAUTION);
        return rep;
    }
}
