package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Rail;
import org.thermion.power.Budget;
import org.thermion.model.StageType;
import org.thermion.power.CurrentMeter;
import org.thermion.power.DrawingInstance;
import org.thermion.power.DrawingInstances;
import org.thermion.power.StageDraw;
import org.thermion.power.Finding;
import org.thermion.power.HeaterAnalysis;
import org.thermion.power.TubeCount;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.thermion.cli.report.ReportUnit.AMPS;
import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.PERCENT;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.VOLTS;
import static org.thermion.cli.report.ReportUnit.WATTS;

/** The tables of a budget report, one content for text, CSV and JSON. */
final class BudgetReport {
    static final String CAUTION = "Caution: B+, heater and mains supplies can injure or kill. These figures are "
            + "planning estimates, to be confirmed by measurement on the bench; follow local codes and "
            + "qualified practice when building and powering a machine.";

    /** What was simulated, or null for a static report. */
    record Run(String program, String inputs, long cycles, String init) {
    }

    private final Budget b;
    private final Machine m;
    private final Run run;

    BudgetReport(Budget b, Run run) {
        this.b = b;
        this.m = b.machine();
        this.run = b.simulated() ? run : null;
    }

    /** The schema version of budget's JSON ({@code org/thermion/schema/budget.schema.json}). */
    static final int VERSION = 4;

    /** The whole report: facts for every format, explanations and findings for people. */
    Report report() {
        Report r = new Report("budget", VERSION);
        r.field("machine", m.name());
        r.field("check", b.failed() ? "failed" : "ok");
        r.field("tubes", m.envelopes().size());
        r.field("heater_strings", m.heaterStrings().size());
        r.field("simulated", run != null);
        if (run != null) {
            Map<String, Object> s = new LinkedHashMap<>();
            s.put("program", run.program());
            s.put("inputs", run.inputs());
            s.put("cycles", run.cycles());
            s.put("phases", m.clock().phases());
            s.put("init", run.init());
            r.field("simulation", s);
        } else {
            r.field("simulation", new Absent("not simulated"));
        }
        r.field("left_out", b.leftOut());
        r.field("plate_dissipation", PLATE_NOTE);
        r.field("caution", CAUTION);
        r.text(head());
        for (Table t : List.of(modules(), tubes(), heaterStrings(), moduleHeaters(), stageDraws(), moduleRails(), rails(), supply(),
                findings())) {
            r.table(t);
        }
        r.text(b.failed() ? "check failed" : "check passed", "", CAUTION);
        return r;
    }

    static final String PLATE_NOTE = "approximate: P = I x max(V - I x Rload, I x Ron) for the draw on the plate-load "
            + "rail, I x V for other positive rails, I x arc drop for a conducting thyratron; bias-rail draws are "
            + "resistor losses and not counted";

    private List<String> head() {
        List<String> h = new ArrayList<>();
        h.add("budget of machine " + m.name() + ": " + Nouns.count(m.envelopes().size(), "tube") + ", "
                + Nouns.count(m.heaterStrings().size(), "heater string") + ", " + Nouns.count(m.rails().size(), "rail"));
        List<String> out = b.leftOut();
        h.add(out.isEmpty() ? "  the totals count every part: the logic and the built blocks"
                : "  the totals leave out: " + String.join("; ", out));
        h.add("  plate and bias current: lowest and highest = every stage instance at its lowest or highest draw;");
        h.add("    " + origins() + " (see 'stage draws')");
        h.add("  heaters and the supply check at each rail's voltage under its load (nominal less the source drop),");
        h.add("    heaters at the wire's equilibrium temperature there: the power-up's steady state");
        if (run != null) {
            h.add("  simulated: " + run.program() + (run.inputs() == null ? "" : " with inputs " + run.inputs()) + ", "
                    + Nouns.count(run.cycles(), "cycle") + " of " + Nouns.count(m.clock().phases(), "phase")
                    + ", latches start " + run.init());
            h.add("    min, mean and peak over every phase; now = the last phase; cycles count from 0, phases from 1"
                    + (run.init().startsWith("unknown") ? "; an unknown output counts at its low draw" : ""));
        } else {
            h.add("  not simulated: give --program (and --inputs) to meter the currents of a run");
        }
        h.add("  plate W is approximate: P = I x max(V - I x Rload, I x Ron) for the draw on the plate-load rail,");
        h.add("    I x V for other positive rails, I x arc drop for a conducting thyratron; bias draws not counted");
        h.add("");
        return h;
    }

    private Table modules() {
        Table t = new Table("modules", "modules")
                .column("module", "module", TEXT)
                .column("tubes", "tubes", COUNT)
                .column("sections_used", "used", COUNT, "tube sections in use")
                .column("sections_spare", "spare", COUNT, "tube sections left free")
                .column("heater_strings", "strings", COUNT, "heater strings holding one of its tubes")
                .column("heater", "heater", WATTS, "the module's share of its strings' power at the loaded rails "
                        + "(a string spanning modules counts in each; currents per rail: 'heater current by module')")
                .column("plate_lowest", "plate low", WATTS, "plate dissipation, every stage at its lowest draw")
                .column("plate_highest", "plate high", WATTS, "plate dissipation, every stage at its highest draw");
        CurrentMeter meter = b.meter();
        if (meter != null) {
            t.column("plate_mean", "plate mean", WATTS, "plate dissipation, mean over the run")
                    .column("plate_peak", "plate peak", WATTS, "plate dissipation, highest phase of the run");
        }
        t.column("supply", "supply", WATTS, meter != null ? "heaters plus the run's mean plate and bias draw"
                : "heaters plus every stage at its highest draw");
        double[] sum = new double[8];
        for (ModuleInstance mi : m.modules()) {
            TubeCount.Row c = b.tubes().module(mi.id());
            List<Object> row = new ArrayList<>(List.of(label(mi), c.envelopes(), c.sectionsUsed(), c.sectionsSpare(),
                    b.heaters().moduleStrings(mi.id()), b.heaters().moduleWatts(mi.id()),
                    b.staticPlateWatts(mi.id(), false), b.staticPlateWatts(mi.id(), true)));
            sum[1] += b.heaters().moduleWatts(mi.id());
            sum[2] += b.staticPlateWatts(mi.id(), false);
            sum[3] += b.staticPlateWatts(mi.id(), true);
            if (meter != null) {
                row.add(meter.meanPlateWatts(mi.id()));
                row.add(meter.peakPlateWatts(mi.id()));
                sum[4] += meter.meanPlateWatts(mi.id());
            }
            row.add(b.supplyWatts(mi.id()));
            sum[5] += b.supplyWatts(mi.id());
            t.row(row.toArray());
        }
        List<Object> total = new ArrayList<>(List.of("total", b.tubes().total(), b.tubes().sectionsUsed(),
                b.tubes().sectionsSpare(), m.heaterStrings().size(), sum[1], sum[2], sum[3]));
        if (meter != null) {
            total.add(sum[4]);
            total.add(Absent.NONE);
        }
        total.add(sum[5]);
        t.row(total.toArray());
        return t;
    }

    private Table tubes() {
        Table t = new Table("tubes", "tubes by module and type")
                .column("module", "module", TEXT)
                .column("type", "type", TEXT)
                .column("tubes", "tubes", COUNT)
                .column("sections_used", "sections used", COUNT)
                .column("sections_spare", "spare", COUNT);
        for (TubeCount.Row r : b.tubes().byModule()) {
            t.row(label(m.modules().get(r.module())), m.tubes().get(r.tube()).name(), r.envelopes(), r.sectionsUsed(),
                    r.sectionsSpare());
        }
        for (TubeCount.Row r : b.tubes().byType()) {
            t.row("all", m.tubes().get(r.tube()).name(), r.envelopes(), r.sectionsUsed(), r.sectionsSpare());
        }
        t.row("all", "all", b.tubes().total(), b.tubes().sectionsUsed(), b.tubes().sectionsSpare());
        return t;
    }

    /** Strings with the same wiring and results share a row, with their count. */
    private Table heaterStrings() {
        Table t = new Table("heater_strings", "heater strings (in series across their rail at its loaded voltage, "
                + "the supply check's 'at peak'; identical strings counted together)")
                .column("rail", "rail", TEXT)
                .column("count", "count", COUNT, "identical strings")
                .column("heaters", "heaters", TEXT)
                .column("rated", "rated", VOLTS, "sum of the heaters' rated voltages")
                .column("string", "current", AMPS, "string current, heaters at their steady resistance at that voltage")
                .column("heater_volts", "each heater gets", TEXT)
                .column("worst_deviation", "worst", PERCENT, "the heater furthest from its rated voltage")
                .column("dropper", "dropper", OHMS, "declared series resistor")
                .column("dropper", "dropper", WATTS, "its dissipation")
                .column("shunts", "shunts", TEXT)
                .column("suggested_dropper", "suggest", OHMS, "a dropper that would bring the string to its rating")
                .column("suggested_dropper", "suggest", WATTS, "its dissipation")
                .column("first_string", "first", COUNT, "number of the first such string (from 1)")
                .column("status", "status", TEXT);
        Map<String, List<HeaterAnalysis.StringResult>> groups = new LinkedHashMap<>();
        for (HeaterAnalysis.StringResult s : b.heaters().strings()) {
            StringBuilder key = new StringBuilder().append(s.string().rail()).append('|').append(s.string().rule())
                    .append('|').append(s.string().dropOhms()).append('|').append(s.string().shunt());
            for (HeaterAnalysis.Heater h : s.heaters()) {
                key.append('|').append(h.tube()).append('@').append(h.rating().volts()).append('/').append(h.rating().amps());
            }
            groups.computeIfAbsent(key.toString(), k -> new ArrayList<>()).add(s);
        }
        for (List<HeaterAnalysis.StringResult> g : groups.values()) {
            HeaterAnalysis.StringResult s = g.get(0);
            StringBuilder types = new StringBuilder();
            StringBuilder volts = new StringBuilder();
            StringBuilder shunts = new StringBuilder();
            double worst = 0;
            for (HeaterAnalysis.Heater h : s.heaters()) {
                String name = m.tubes().get(h.tube()).name();
                types.append(types.length() == 0 ? "" : " + ").append(name);
                volts.append(volts.length() == 0 ? "" : ", ").append(Numbers.si(h.volts(), VOLTS))
                        .append(String.format(Locale.ROOT, " (%+.1f %%)", h.deviation() * 100));
                if (h.shunted()) {
                    shunts.append(shunts.length() == 0 ? "" : ", ").append(name).append(' ').append(Numbers.si(h.shuntOhms(), OHMS))
                            .append(' ').append(Numbers.si(h.shuntWatts(), WATTS));
                }
                if (Math.abs(h.deviation()) > Math.abs(worst)) {
                    worst = h.deviation();
                }
            }
            String status = s.findings().stream().anyMatch(Finding::isError) ? "error"
                    : s.findings().stream().anyMatch(f -> f.severity() == Finding.Severity.WARNING) ? "warning" : "ok";
            t.row(m.rails().get(s.string().rail()).name(), g.size(), types.toString(), s.ratedVolts(), s.amps(),
                    volts.toString(), worst * 100, s.string().dropOhms() > 0 ? s.string().dropOhms() : Absent.NONE,
                    s.string().dropOhms() > 0 ? s.dropWatts() : Absent.NONE, shunts.length() == 0 ? Absent.NONE : shunts.toString(),
                    s.suggestion() == null ? Absent.NONE : s.suggestion().ohms(),
                    s.suggestion() == null ? Absent.NONE : s.suggestion().watts(), s.index() + 1, status);
        }
        return t;
    }

    private Table moduleRails() {
        Table t = new Table("module_rails", "plate and bias current by module")
                .column("module", "module", TEXT)
                .column("rail", "rail", TEXT)
                .column("lowest", "lowest", AMPS, "every stage at its lowest draw")
                .column("highest", "highest", AMPS, "every stage at its highest draw");
        CurrentMeter meter = b.meter();
        if (meter != null) {
            dynamicColumns(t);
        }
        for (ModuleInstance mi : m.modules()) {
            for (int r = 0; r < m.rails().size(); r++) {
                if (!b.drawsOn(mi.id(), r)) {
                    continue;
                }
                List<Object> row = new ArrayList<>(List.of(label(mi), m.rails().get(r).name(),
                        b.staticLow(mi.id(), r), b.staticHigh(mi.id(), r)));
                if (meter != null) {
                    row.addAll(List.of(meter.nowModule(mi.id(), r), meter.minModule(mi.id(), r),
                            meter.meanModule(mi.id(), r), meter.peakModule(mi.id(), r),
                            meter.peakCycleModule(mi.id(), r), meter.peakPhaseModule(mi.id(), r)));
                }
                t.row(row.toArray());
            }
        }
        return t;
    }

    private static void dynamicColumns(Table t) {
        t.column("now", "now", AMPS, "in the run's last phase")
                .column("min", "min", AMPS, "lowest over the run's phases")
                .column("mean", "mean", AMPS, "mean over the run's phases")
                .column("peak", "peak", AMPS, "highest over the run's phases")
                .column("peak_cycle", "peak cycle", COUNT, "cycle of the peak (from 0)")
                .column("peak_phase", "phase", COUNT, "phase of the peak (from 1)");
    }

    private Table rails() {
        Table t = new Table("rails", "plate and bias current by rail")
                .column("rail", "rail", TEXT)
                .column("nominal", "voltage", VOLTS)
                .column("lowest", "lowest", AMPS, "every stage at its lowest draw")
                .column("highest", "highest", AMPS, "every stage at its highest draw");
        CurrentMeter meter = b.meter();
        if (meter != null) {
            dynamicColumns(t);
        }
        for (int r = 0; r < m.rails().size(); r++) {
            if (!b.railHasDraws(r)) {
                continue;
            }
            Rail rail = m.rails().get(r);
            List<Object> row = new ArrayList<>(List.of(rail.name(), rail.volts(), b.staticLowRail(r), b.staticHighRail(r)));
            if (meter != null) {
                row.addAll(List.of(meter.nowRail(r), meter.minRail(r), meter.meanRail(r), meter.peakRail(r),
                        meter.peakCycle(r), meter.peakPhase(r)));
            }
            t.row(row.toArray());
        }
        return t;
    }

    private Table supply() {
        Table t = new Table("supply", "supply check (peak = heaters + plate and bias)")
                .column("rail", "rail", TEXT)
                .column("nominal", "voltage", VOLTS)
                .column("heaters", "heaters", AMPS, "heater strings at the loaded voltage ('at peak'), "
                        + "each heater at its steady temperature there")
                .column("heaters", "heaters", WATTS)
                .column("stages", "plate+bias", AMPS, "plate and bias draws at the loaded voltage (each stage's "
                        + "current scaled from the nominal rail as a conductance, as powerup takes it)")
                .column("basis", "from", TEXT, "highest: every stage at its highest draw; simulation: the run's peak")
                .column("peak", "peak", AMPS, "heaters plus plate and bias")
                .column("limit", "limit", AMPS, "the supply's current limit")
                .column("margin", "margin", AMPS, "limit less peak")
                .column("margin", "margin", PERCENT, "margin as a share of the limit")
                .column("at_peak", "at peak", VOLTS, "the rail's voltage under that load, after its source resistance "
                        + "(solved with the load, which falls with it)")
                .column("status", "status", TEXT);
        for (Budget.Supply s : b.supply()) {
            Rail rail = m.rails().get(s.rail());
            t.row(rail.name(), rail.volts(), s.heaterAmps(), b.heaters().railWatts(s.rail()), s.stageAmps(), s.simulated() ? "simulation" : "highest",
                    s.peakAmps(), s.limited() ? s.limitAmps() : NO_LIMIT, s.limited() ? s.marginAmps() : NO_LIMIT,
                    s.limited() ? (Object) (s.marginFraction() * 100) : NO_LIMIT, Math.copySign(s.voltsAtPeak(), rail.volts()),
                    s.over() ? "OVER" : s.limited() ? "ok" : "no limit");
        }
        return t;
    }

    /** Each module's share of each rail's heater current: amps on different rails never add up. */
    private Table moduleHeaters() {
        Table t = new Table("module_heaters", "heater current by module (loaded rails)")
                .column("module", "module", TEXT)
                .column("rail", "rail", TEXT)
                .column("heaters", "heaters", AMPS, "the module's share of the rail's heater current (a string spanning "
                        + "modules is shared by the voltage each heater drops)");
        for (ModuleInstance mi : m.modules()) {
            for (int r = 0; r < m.rails().size(); r++) {
                double a = b.heaters().moduleAmps(mi.id(), r);
                if (a > 0) {
                    t.row(label(mi), m.rails().get(r).name(), a);
                }
            }
        }
        return t;
    }

    /** Every stage with instances: where its figures come from, and its draw per rail. */
    private Table stageDraws() {
        Table t = new Table("stage_draws", "stage draws (per instance, at the nominal rails)")
                .column("stage", "stage", TEXT)
                .column("figures", "figures", TEXT, "computed: solved from the stage's circuit at the machine's rails; "
                        + "declared: the stage's draw lines; none: neither")
                .column("instances", "instances", COUNT)
                .column("rail", "rail", TEXT)
                .column("low", "low", AMPS, "output low")
                .column("high", "high", AMPS, "output high")
                .column("plate_low", "plate low", WATTS, "plate and screen dissipation, output low")
                .column("plate_high", "plate high", WATTS, "plate and screen dissipation, output high");
        int[] count = instances();
        StageDraw d = b.draw();
        for (int s = 0; s < m.stages().size(); s++) {
            if (count[s] == 0) {
                continue;
            }
            StageType st = m.stages().get(s);
            boolean any = false;
            for (int r = 0; r < m.rails().size(); r++) {
                if (d.drawsOn(st, r)) {
                    t.row(st.name(), d.origin(st).word(), count[s], m.rails().get(r).name(), d.amps(st, r, false),
                            d.amps(st, r, true), d.plateWatts(st, false), d.plateWatts(st, true));
                    any = true;
                }
            }
            if (!any) {
                t.row(st.name(), d.origin(st).word(), count[s], Absent.NONE, 0.0, 0.0, d.plateWatts(st, false),
                        d.plateWatts(st, true));
            }
        }
        return t;
    }

    private int[] instances() {
        int[] count = new int[m.stages().size()];
        for (DrawingInstance di : DrawingInstances.of(m)) {
            count[di.stage()]++;
        }
        return count;
    }

    /** "3 stages computed from their circuits at the machine's rails, 2 declared". */
    private String origins() {
        int[] count = instances();
        int[] by = new int[StageDraw.Origin.values().length];
        for (int s = 0; s < count.length; s++) {
            if (count[s] > 0) {
                by[b.draw().origin(m.stages().get(s)).ordinal()]++;
            }
        }
        List<String> parts = new ArrayList<>();
        int computed = by[StageDraw.Origin.COMPUTED.ordinal()];
        parts.add(Nouns.count(computed, "stage kind") + " computed from " + (computed == 1 ? "its circuit" : "their circuits")
                + " at the machine's rails");
        parts.add(by[StageDraw.Origin.DECLARED.ordinal()] + " declared");
        if (by[StageDraw.Origin.NONE.ordinal()] > 0) {
            parts.add(by[StageDraw.Origin.NONE.ordinal()] + " with neither (counted as drawing nothing)");
        }
        return String.join(", ", parts);
    }

    private Table findings() {
        Table t = new Table("findings", "findings")
                .column("severity", "severity", TEXT)
                .column("subject", "subject", TEXT)
                .column("message", "message", TEXT)
                .column("advice", "advice", TEXT);
        for (Finding f : b.findings()) {
            t.row(f.severity().name().toLowerCase(Locale.ROOT), f.subject(), f.message(), f.advice());
        }
        return t;
    }

    private static final Absent NO_LIMIT = new Absent("no limit");

    static String label(ModuleInstance mi) {
        return mi.path().isEmpty() ? "(top) " + mi.type() : mi.path() + " (" + mi.type() + ")";
    }
}
