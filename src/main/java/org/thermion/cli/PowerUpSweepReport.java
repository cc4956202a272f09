package org.thermion.cli;

import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.power.startup.PreferredValues;
import org.thermion.power.startup.ResistorSweep;

import static org.thermion.cli.report.ReportUnit.AMPS;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.JOULES;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.WATTS;

/** A soft-start resistor sweep ({@code powerup --sweep}) as one report. */
final class PowerUpSweepReport {
    /** The schema version of the sweep's JSON ({@code org/thermion/schema/powerup_sweep.schema.json}). */
    static final int VERSION = 2;
    private static final Absent NONE = PowerUpReport.NONE;

    private PowerUpSweepReport() {
    }

    /** A resistor sweep as a report. */
    static Report of(ResistorSweep.Result s) {
        Report rep = new Report("powerup_sweep", VERSION);
        rep.field("soft_start", s.softStart());
        rep.field("rail", s.rail());
        rep.field("limit", AMPS, Double.isInfinite(s.limitAmps()) ? NONE : s.limitAmps());
        rep.field("rated", WATTS, Double.isInfinite(s.ratedWatts()) ? new Absent("no rating") : s.ratedWatts());
        ResistorSweep.Row best = s.recommended();
        rep.field("recommended", OHMS, best == null ? NONE : best.ohms());
        ResistorSweep.Row pref = s.preferred();
        rep.field("preferred", OHMS, pref == null ? NONE : pref.ohms());
        rep.field("preferred_series", pref == null ? NONE : PreferredValues.isE12(pref.ohms()) ? "E12" : "E24");
        rep.field("preferred_rating", WATTS, pref == null || Double.isNaN(s.preferredWatts())
                ? new Absent("beyond the common list") : s.preferredWatts());
        rep.field("caution", PowerUpReport.CAUTION);
        rep.text("soft-start resistor sweep for " + s.softStart() + " on " + s.rail() + " (limit "
                + (Double.isInfinite(s.limitAmps()) ? "none" : Numbers.si(s.limitAmps(), AMPS)) + ", rating "
                + (Double.isInfinite(s.ratedWatts()) ? "none" : Numbers.si(s.ratedWatts(), WATTS)) + ")", "");
        Table t = new Table("sweep", "resistor sweep")
                .column("resistor", "resistor", OHMS)
                .column("switch_on_peak", "switch-on pk", AMPS, "the highest current before the bypass")
                .column("bypass_peak", "bypass pk", AMPS, "the highest current after it")
                .column("larger_peak", "larger", AMPS)
                .column("bypass", "bypass at", SECONDS)
                .column("peak_demand", "demand pk", AMPS, "the most the loads asked for, before any current limit")
                .column("mean", "mean", WATTS, "mean power in the resistor while in circuit")
                .column("peak", "peak", WATTS, "peak power in the resistor")
                .column("energy", "energy", JOULES)
                .column("feasible", "feasible", FLAG, "bypassed, supply within its limit, resistor within its rating")
                .column("verdict", "verdict", TEXT);
        for (int i = 0; i < s.rows().size(); i++) {
            ResistorSweep.Row row = s.rows().get(i);
            String verdict = !row.bypassed() ? "no bypass" : !row.withinLimit() ? "over limit" : !row.withinRating() ? "over rating"
                    : i == s.best() ? "best" : "ok";
            t.row(row.ohms(), row.switchOnPeak(), Double.isNaN(row.bypassPeak()) ? NONE : row.bypassPeak(), row.worstPeak(),
                    Double.isNaN(row.bypassTime()) ? new Absent("not bypassed") : row.bypassTime(), row.peakDemand(),
                    row.meanWatts(), row.peakWatts(), row.joules(), row.feasible(), verdict);
        }
        rep.table(t);
        rep.text(best == null ? "no value in the range keeps the supply within its limit and the resistor within its rating"
                : "recommended: " + Numbers.si(best.ohms(), OHMS) + " (larger peak " + Numbers.si(best.worstPeak(), AMPS)
                + ", bypass at " + Numbers.si(best.bypassTime(), SECONDS) + ", mean " + Numbers.si(best.meanWatts(), WATTS)
                + " in the resistor)");
        if (pref != null) {
            rep.text("preferred value: " + Numbers.si(pref.ohms(), OHMS) + (PreferredValues.isE12(pref.ohms()) ? " (E12)" : " (E24)")
                    + ", " + (Double.isNaN(s.preferredWatts()) ? "a rating beyond the common list" : Numbers.si(s.preferredWatts(), WATTS))
                    + " (larger peak " + Numbers.si(pref.worstPeak(), AMPS) + ")");
        }
        rep.text("", PowerUpReport.CAUTION);
        return rep;
    }

    // ---- CSV (RFC 4180) ------------------------------------------------------------------

}
