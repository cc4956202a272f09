package org.thermion.cli;

import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.plot.Figure;
import org.thermion.plot.Panel;
import org.thermion.plot.Series;
import org.thermion.power.startup.DrawMode;
import org.thermion.power.startup.PowerUpOptions;
import org.thermion.power.startup.StartupNetwork;
import org.thermion.power.startup.TraceFit;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.thermion.cli.report.ReportUnit.AMPS;
import static org.thermion.cli.report.ReportUnit.NUMBER;
import static org.thermion.cli.report.ReportUnit.TEXT;

/**
 * {@code powerup --fit TRACE} and {@code --calibrate TRACE}: reads a bench trace, fits the model to
 * it ({@link TraceFit}) and reports the fitted figures, their uncertainty and what the trace cannot
 * tell; the fitted model then serves any prediction.
 */
final class PowerUpFit {
    /** The schema version of the fit's JSON ({@code org/thermion/schema/powerup_fit.schema.json}). */
    static final int VERSION = 1;

    private PowerUpFit() {
    }

    /** A fit and the trace it came from. */
    record Done(PowerUpTrace trace, TraceFit.Result result) {
    }

    /** Reads and fits {@code file}; null after printing what was wrong (exit 2). */
    static Done fit(Machine m, Path file, String railName, PowerUpOptions o, DrawMode mode, MachineLoader loader,
                    PrintWriter err) {
        Diagnostics diags = new Diagnostics();
        PowerUpTrace trace = PowerUpTrace.read(file, railName, loader.sources(), diags);
        if (trace == null) {
            new DiagnosticPrinter(loader.sources()).print(diags, err);
            err.flush();
            return null;
        }
        int rail = railName != null ? m.railIndex(railName) : railOfColumn(m, trace.column());
        if (railName != null && rail < 0) {
            err.println("error: --trace-rail: no rail named '" + railName + "'; the machine has: "
                    + String.join(", ", m.rails().stream().map(Rail::name).toList()));
            return null;
        }
        try {
            if (rail < 0) {
                rail = PowerUpCommand.inrushRail(m, StartupNetwork.of(m, o.assumptions(), mode), o);
            }
            return new Done(trace, TraceFit.fit(m, o.assumptions(), mode, rail, trace.t(), trace.amps()));
        } catch (IllegalArgumentException | org.hipparchus.exception.MathRuntimeException e) {
            err.println("error: " + file + ": the model cannot be fitted to this trace: " + e.getMessage());
            return null;
        }
    }

    /** The rail whose name the current column carries ({@code heat_amps}), or -1. */
    private static int railOfColumn(Machine m, String column) {
        String c = column.toLowerCase(Locale.ROOT);
        for (int r = 0; r < m.rails().size(); r++) {
            if (c.startsWith(PowerUpSeries.identifier(m.rails().get(r).name()) + "_")) {
                return r;
            }
        }
        return -1;
    }

    /** The fit as a report. */
    static Report report(Done d) {
        TraceFit.Result f = d.result();
        Report rep = new Report("powerup_fit", VERSION);
        rep.field("rail", f.rail());
        rep.field("trace", d.trace().file().toString());
        rep.field("column", d.trace().column());
        rep.field("readings", f.points());
        rep.field("rms_residual", AMPS, f.rmsAmps());
        rep.field("rms_relative_residual", f.rmsRelative());
        rep.field("caution", PowerUpReport.CAUTION);
        rep.text("model fitted to " + f.points() + " readings of rail " + f.rail() + " (" + d.trace().column() + " of "
                + d.trace().file() + ") by least squares on the residual relative to each reading", "");
        Table t = new Table("figures", "fitted figures")
                .column("figure", "figure", TEXT)
                .column("value", "fitted", NUMBER)
                .column("uncertainty", "+-", NUMBER)
                .column("model_value", "model", NUMBER)
                .column("unit", "unit", TEXT)
                .column("status", "status", TEXT);
        Table view = new Table("figures_view", "fitted figures")
                .column("figure", "figure", TEXT)
                .column("value", "fitted", TEXT)
                .column("uncertainty", "+-", TEXT, "one standard deviation, from the covariance at the fit scaled by the residual")
                .column("model_value", "model", TEXT, "the model's figure before the fit")
                .column("unit", "unit", TEXT)
                .column("status", "status", TEXT, "fitted; uncertain: the trace leaves it loose; not determined: the trace "
                        + "does not depend on it, so it keeps the model's value");
        for (TraceFit.Value v : f.values()) {
            String status = v.determined() ? "fitted" : Double.isNaN(v.sigma()) ? "not determined" : "uncertain";
            String unit = v.figure().unit.isEmpty() ? "ratio" : v.figure().unit.equals("x") ? "factor" : v.figure().unit;
            Object sigma = Double.isNaN(v.sigma()) ? new Absent("none")
                    : Double.isInfinite(v.sigma()) ? new Absent("unbounded") : round(v.sigma());
            t.row(v.figure().key, round(v.value()), sigma, round(v.start()), unit, status);
            view.row(v.figure().key, three(v.value()), sigma instanceof Absent a ? a.word() : three(v.sigma()),
                    three(v.start()), unit, status);
        }
        rep.data(t);
        rep.view(view);
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "residual: %s rms, %.3g %% of the readings", Numbers.si(f.rmsAmps(), AMPS),
                100 * f.rmsRelative()));
        for (TraceFit.Value v : f.values()) {
            if (!v.determined()) {
                lines.add("cannot tell from this trace: " + v.figure().words + " (" + v.why() + ")");
            }
        }
        for (String w : f.warnings()) {
            lines.add("warning: " + w);
        }
        lines.add("figures: " + describe());
        rep.text(lines);
        rep.text("", "run the prediction with these figures: powerup MACHINE --calibrate " + d.trace().file(), "",
                PowerUpReport.CAUTION);
        return rep;
    }

    /** A note for reports run on a calibrated model. */
    static String note(Done d) {
        TraceFit.Result f = d.result();
        StringBuilder b = new StringBuilder("model calibrated on " + d.trace().file() + " (rail " + f.rail() + "):");
        for (TraceFit.Value v : f.values()) {
            if (v.figure() != TraceFit.Figure.OFFSET && v.determined()) {
                b.append(' ').append(v.figure().key).append(' ').append(three(v.value()))
                        .append(v.figure().unit.isEmpty() || v.figure().unit.equals("x") ? "" : " " + v.figure().unit).append(',');
            }
        }
        b.setLength(b.length() - 1);
        return b.toString();
    }

    /** The measured and the fitted current against the trace's time. */
    static Figure figure(Done d) {
        TraceFit.Result f = d.result();
        return new Figure("fit of rail " + f.rail() + " to " + d.trace().file().getFileName(), List.of(new Panel(
                "rail " + f.rail() + ": measured and fitted", "time in the trace (s)", "current (A)",
                List.of(Series.line("measured", f.t(), f.measured()), Series.line("fitted model", f.t(), f.fitted())))),
                PowerUpReport.CAUTION);
    }

    private static String describe() {
        StringBuilder b = new StringBuilder();
        for (TraceFit.Figure fig : TraceFit.Figure.values()) {
            b.append(b.length() == 0 ? "" : "; ").append(fig.key).append(" = ").append(fig.words);
        }
        return b.toString();
    }

    /** Three significant figures for people. */
    private static String three(double v) {
        return Numbers.plain(new java.math.BigDecimal(v).round(new java.math.MathContext(3)).doubleValue());
    }

    /** Four significant figures: a fit's last digits are noise, and goldens must not hang on them. */
    static double round(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return v;
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(4)).doubleValue();
    }
}
