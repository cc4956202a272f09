package org.thermion.cli;

import org.thermion.text.Nouns;
import static org.thermion.cli.report.ReportUnit.AMPS;
import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.PERCENT;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.VOLTS;

import java.util.ArrayList;
import java.util.List;

import org.thermion.circuit.Tolerances;
import org.thermion.circuit.WorstMargin;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.levels.LevelAnalysis;
import org.thermion.levels.LoadDrive;
import org.thermion.levels.NetLevel;
import org.thermion.levels.RailsUnderLoad;
import org.thermion.model.Machine;

/** The {@code levels} report: every net worst first, then the lamp and coil drivers. */
final class LevelsReport {
    /** The schema version of this JSON ({@code org/thermion/schema/levels.schema.json}). */
    static final int VERSION = 2;

    private static final Absent NONE = Absent.NONE;

    private final Machine machine;
    private final LevelAnalysis analysis;

    LevelsReport(Machine machine, LevelAnalysis analysis) {
        this.machine = machine;
        this.analysis = analysis;
    }

    Report report() {
        Tolerances t = analysis.tolerances();
        List<NetLevel> nets = analysis.nets();
        int failing = 0;
        int weak = 0;
        int unsolved = 0;
        for (NetLevel n : nets) {
            if (withoutLevels(n)) {
                unsolved++;
            }
            double w = n.worstMargin();
            if (w < 0) {
                failing++;
            } else if (w < analysis.minMargin()) {
                weak++;
            }
        }
        Report rep = new Report("levels", VERSION);
        rep.field("machine", machine.name());
        rep.field("rail_tolerance", PERCENT, 100 * t.rail());
        rep.field("resistor_tolerance", PERCENT, 100 * t.resistor());
        rep.field("end_of_life_emission", PERCENT, 100 * t.endOfLife());
        rep.field("minimum_margin", VOLTS, analysis.minMargin());
        rep.field("nets", nets.size());
        rep.field("negative_margins", failing);
        rep.field("below_minimum", weak);
        rep.field("without_levels", unsolved);
        RailsUnderLoad rails = analysis.rails();
        rep.field("rails_under_load", rails.problem() == null);
        rep.text(List.of("machine " + machine.name() + ": " + Nouns.count(nets.size(), "net") + "; worst case at rails and resistors "
                + pct(t.rail()) + ", worn tubes at " + Math.round(100 * t.endOfLife()) + " % emission; minimum margin "
                + num(analysis.minMargin()) + " V.",
                railsLine(machine, rails),
                Nouns.count(failing, "net") + " with a negative worst-case margin, " + weak + " below the minimum"
                        + (unsolved == 0 ? "." : "; " + unsolved + " driven without levels (listed below the table)."),
                ""));
        Table railTable = new Table("rails", "rails")
                .column("rail", "rail", TEXT)
                .column("volts", "V", VOLTS, "where the levels are solved: under the heaviest static load")
                .column("light_volts", "light V", VOLTS, "under the lightest static load")
                .column("low_end_volts", "low end V", VOLTS, "the worst case's low end: heaviest load less the tolerance")
                .column("high_end_volts", "high end V", VOLTS, "its high end: lightest load plus the tolerance");
        for (org.thermion.model.Rail r : machine.rails()) {
            double at = rails.volts(r.name());
            double[] ends = t.railEnds(r.name());
            railTable.row(r.name(), v(at), v(at * rails.lightRise().getOrDefault(r.name(), 1.0)), v(at * ends[0]),
                    v(at * ends[1]));
        }
        rep.data(railTable);
        Table data = new Table("nets", "nets")
                .column("net", "net", TEXT)
                .column("driver", "driver", TEXT, "the stage that drives the net (empty: driven from outside)")
                .column("loads", "loads", COUNT, "input pins the net feeds")
                .column("receivers", "receivers", TEXT, "the stages it feeds, xN for N pins")
                .column("high", "V_OH", VOLTS, "lowest high level under the load, nominal")
                .column("low", "V_OL", VOLTS, "highest low level under the load, nominal")
                .column("vih", "V_IH", VOLTS, "the receivers' highest input-high threshold, nominal")
                .column("vil", "V_IL", VOLTS, "the receivers' lowest input-low threshold, nominal")
                .column("high_margin", "NM_H", VOLTS, "V_OH - V_IH, nominal")
                .column("low_margin", "NM_L", VOLTS, "V_IL - V_OL, nominal")
                .column("worst_high_margin", "worst NM_H", VOLTS, "NM_H at the corner that lowers it most")
                .column("worst_high_corner", "NM_H corner", TEXT, "that corner")
                .column("worst_low_margin", "worst NM_L", VOLTS, "NM_L at the corner that lowers it most")
                .column("worst_low_corner", "NM_L corner", TEXT, "that corner")
                .column("fan_out_limit", "limit", COUNT,
                        "most receivers of the limiting kind with the minimum margin at the worse corner")
                .column("limit_kind", "limit kind", TEXT, "the receiving stage the limit counts")
                .column("note", "note", TEXT);
        Table view = new Table("nets", "nets, worst first (worst-case margins)")
                .column("net", "net", TEXT)
                .column("driver", "driver", TEXT)
                .column("loads", "loads", COUNT)
                .column("high", "V_OH", VOLTS)
                .column("low", "V_OL", VOLTS)
                .column("worst_high_margin", "NM_H", VOLTS)
                .column("worst_low_margin", "NM_L", VOLTS)
                .column("fan_out_limit", "limit", COUNT);
        List<String> corners = new ArrayList<>();
        for (NetLevel n : nets) {
            data.row(n.name(), n.stage(), n.loads(), n.receivers(), v(n.voh()), v(n.vol()), v(n.vih()), v(n.vil()),
                    n.high() == null ? NONE : v(n.high().nominal()), n.low() == null ? NONE : v(n.low().nominal()),
                    worst(n.high()), corner(n.high()), worst(n.low()), corner(n.low()),
                    n.fanOutLimit() < 0 ? NONE : n.fanOutLimit(), n.limitKind(), n.note());
            view.row(n.name(), n.stage().isEmpty() ? "(outside)" : n.stage(), n.loads(), v(n.voh()), v(n.vol()),
                    worst(n.high()), worst(n.low()), n.fanOutLimit() < 0 ? NONE : n.fanOutLimit());
            WorstMargin w = n.worse();
            if (w != null && w.worst() < analysis.minMargin() && corners.size() < 20) {
                corners.add(n.name() + ": " + (w.side() == WorstMargin.Side.HIGH ? "NM_H " : "NM_L ")
                        + num(w.worst()) + " V at " + corner(w) + " (nominal " + num(w.nominal())
                        + " V; receivers " + n.receivers() + ")" + (n.note().isEmpty() ? "" : "; " + n.note()));
            }
        }
        rep.view(view);
        rep.data(data);
        unsolved(rep, nets);
        if (!corners.isEmpty()) {
            List<String> lines = new ArrayList<>();
            lines.add("");
            lines.add("below the minimum margin, with the corner that puts them there:");
            corners.forEach(c -> lines.add("  " + c));
            rep.text(lines);
        }
        Table drives = new Table("drives", "lamp and coil drivers")
                .column("net", "net", TEXT, "the net the stage drives; for a soft start's bypass relay, the soft start")
                .column("stage", "stage", TEXT)
                .column("load", "load", TEXT, "lamp or coil")
                .column("on", "on", AMPS, "load current with the tube conducting, nominal")
                .column("worst_on", "worst on", AMPS, "at the corner that lowers it")
                .column("need", "needs", AMPS, "a lamp's rated current, a coil's pick-up current")
                .column("off", "off", AMPS, "load current with the tube cut off, nominal")
                .column("worst_off", "worst off", AMPS, "at the corner that raises it")
                .column("dropout", "drop-out", AMPS, "a coil's drop-out current (none: not stated)");
        for (LoadDrive d : analysis.drives()) {
            drives.row(d.name(), d.stage(), d.kind() == LoadDrive.Kind.LAMP ? "lamp" : "coil", v(d.onAmps()),
                    v(d.onWorstAmps()), v(d.ratedAmps()), v(d.offAmps()), v(d.offWorstAmps()),
                    d.dropoutAmps() > 0 ? d.dropoutAmps() : NONE);
        }
        rep.text("");
        rep.table(drives);
        return rep;
    }

    /** Where the levels are solved, in a line: the rails under load, or why the declared ones. */
    private static String railsLine(Machine machine, RailsUnderLoad rails) {
        if (rails.problem() != null) {
            return "levels at the declared rail voltages: the machine's load could not be solved (" + rails.problem() + ")";
        }
        StringBuilder sb = new StringBuilder("levels at the rails under the heaviest static load (");
        int i = 0;
        for (org.thermion.model.Rail r : machine.rails()) {
            sb.append(i++ == 0 ? "" : ", ").append(r.name()).append(' ')
                    .append(String.format(java.util.Locale.ROOT, "%.1f", rails.volts(r.name()))).append(" V");
        }
        return sb.append("); each rail's high end is its lightest load's voltage plus the tolerance").toString();
    }

    /** In text, why a driven net shows no levels (no DC solution, ...): the data table's note, which the view leaves out. */
    private static void unsolved(Report rep, List<NetLevel> nets) {
        List<String> lines = new ArrayList<>();
        int count = 0;
        for (NetLevel n : nets) {
            if (withoutLevels(n)) {
                if (++count <= 20) {
                    lines.add("  " + n.name() + " (" + n.stage() + "): " + n.note());
                }
            }
        }
        if (count == 0) {
            return;
        }
        if (count > 20) {
            lines.add("  ... and " + Nouns.count(count - 20, "more net"));
        }
        lines.add(0, "");
        lines.add(1, "without levels, and why (`check` places each at its stage use):");
        rep.text(lines);
    }

    /** A driven net whose levels could not be solved; its note says why. */
    private static boolean withoutLevels(NetLevel n) {
        return !n.stage().isEmpty() && !n.note().isEmpty() && !(Double.isFinite(n.voh()) && Double.isFinite(n.vol()));
    }

    private static Object v(double x) {
        return Double.isFinite(x) ? x : NONE;
    }

    private static Object worst(WorstMargin w) {
        return w == null ? NONE : v(w.worst());
    }

    /** A corner with each rail in the volts it stands at there (levels stand at the rails under load). */
    private Object corner(WorstMargin w) {
        return w == null ? NONE : w.corner().describe(analysis.rails().solver().rails());
    }

    private static String pct(double f) {
        return "\u00b1" + Math.round(100 * f) + " %";
    }

    static String num(double x) {
        return String.format(java.util.Locale.ROOT, "%.2f", x);
    }
}
