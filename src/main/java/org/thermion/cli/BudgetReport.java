package org.thermion.cli;

import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Rail;
import org.thermion.power.Budget;
import org.thermion.power.CurrentMeter;
import org.thermion.power.Finding;
import org.thermion.power.HeaterAnalysis;
import org.thermion.power.TubeCount;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.thermion.cli.ReportTable.Kind.AMPS;
import static org.thermion.cli.ReportTable.Kind.COUNT;
import static org.thermion.cli.ReportTable.Kind.OHMS;
import static org.thermion.cli.ReportTable.Kind.PERCENT;
import static org.thermion.cli.ReportTable.Kind.TEXT;
import static org.thermion.cli.ReportTable.Kind.VOLTS;
import static org.thermion.cli.ReportTable.Kind.WATTS;

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

    /** The report's named fields (JSON top level, CSV "report" records). */
    Map<String, Object> fields() {
        Map<String, Object> f = new LinkedHashMap<>();
        f.put("machine", m.name());
        f.put("check", b.failed() ? "failed" : "ok");
        f.put("tubes", m.envelopes().size());
        f.put("heater_strings", m.heaterStrings().size());
        if (run != null) {
            Map<String, Object> s = new LinkedHashMap<>();
            s.put("program", run.program());
            s.put("inputs", run.inputs());
            s.put("cycles", run.cycles());
            s.put("lane", 0);
            s.put("init", run.init());
            f.put("simulation", s);
        } else {
            f.put("simulation", null);
        }
        f.put("plate_dissipation", PLATE_NOTE);
        f.put("caution", CAUTION);
        return f;
    }

    static final String PLATE_NOTE = "approximate: P = I x max(V - I x Rload, I x Ron) for the draw on the plate-load "
            + "rail, I x V for other positive rails, I x arc drop for a conducting thyratron; bias-rail draws are "
            + "resistor losses and not counted";

    List<String> head() {
        List<String> h = new ArrayList<>();
        h.add(String.format(Locale.ROOT, "budget of machine %s: %d tubes, %d heater strings, %d rails", m.name(),
                m.envelopes().size(), m.heaterStrings().size(), m.rails().size()));
        h.add("  plate and bias current: lowest and highest = every stage instance at its lowest or highest draw");
        if (run != null) {
            h.add(String.format(Locale.ROOT, "  simulated: %s%s, %d cycles of %d phases, lane 0, latches start %s",
                    run.program(), run.inputs() == null ? "" : " with inputs " + run.inputs(), run.cycles(),
                    m.clock().phases(), run.init()));
            h.add("    min, mean and peak over every phase; now = the last phase; cycles count from 0, phases from 1"
                    + (run.init().startsWith("unknown") ? "; an unknown output counts at its low draw" : ""));
        }
        h.add("  plate W is approximate: P = I x max(V - I x Rload, I x Ron) for the draw on the plate-load rail,");
        h.add("    I x V for other positive rails, I x arc drop for a conducting thyratron; bias draws not counted");
        return h;
    }

    List<String> tail() {
        List<String> t = new ArrayList<>();
        List<Finding> f = b.findings();
        long errors = f.stream().filter(Finding::isError).count();
        long warnings = f.stream().filter(x -> x.severity() == Finding.Severity.WARNING).count();
        t.add(String.format(Locale.ROOT, "findings: %d errors, %d warnings, %d notes", errors, warnings,
                f.size() - errors - warnings));
        for (Finding x : f) {
            t.add("  " + x.severity().name().toLowerCase(Locale.ROOT) + ": " + x.subject() + ": " + x.message());
            if (x.advice() != null) {
                t.add("    = " + x.advice());
            }
        }
        t.add(b.failed() ? "check failed" : "check passed");
        t.add("");
        t.add(CAUTION);
        return t;
    }

    /** Every table; {@code withFindings} false for text, which lists findings after the tables. */
    List<ReportTable> tables(boolean withFindings) {
        List<ReportTable> t = new ArrayList<>(List.of(modules(), tubes(), heaterStrings(), moduleRails(), rails(), supply()));
        if (withFindings) {
            t.add(findings());
        }
        return t;
    }

    private ReportTable modules() {
        ReportTable t = new ReportTable("modules",
                "modules (heater A and W: the module's share of its strings; a string spanning modules counts in each)")
                .column("module", "module", TEXT)
                .column("tubes", "tubes", COUNT)
                .column("sections_used", "used", COUNT)
                .column("sections_spare", "spare", COUNT)
                .column("heater_strings", "strings", COUNT)
                .column("heater_amps", "heater A", AMPS)
                .column("heater_watts", "heater W", WATTS)
                .column("plate_watts_lowest", "plate W lowest", WATTS)
                .column("plate_watts_highest", "plate W highest", WATTS);
        CurrentMeter meter = b.meter();
        if (meter != null) {
            t.column("plate_watts_mean", "plate W mean", WATTS).column("plate_watts_peak", "plate W peak", WATTS);
        }
        t.column("supply_watts", meter != null ? "supply W mean" : "supply W highest", WATTS);
        double[] sum = new double[8];
        for (ModuleInstance mi : m.modules()) {
            TubeCount.Row c = b.tubes().module(mi.id());
            double ha = 0;
            for (int r = 0; r < m.rails().size(); r++) {
                ha += b.heaters().moduleAmps(mi.id(), r);
            }
            List<Object> row = new ArrayList<>(List.of(label(mi), c.envelopes(), c.sectionsUsed(), c.sectionsSpare(),
                    b.heaters().moduleStrings(mi.id()), ha, b.heaters().moduleWatts(mi.id()),
                    b.staticPlateWatts(mi.id(), false), b.staticPlateWatts(mi.id(), true)));
            sum[0] += ha;
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
                b.tubes().sectionsSpare(), m.heaterStrings().size(), sum[0], sum[1], sum[2], sum[3]));
        if (meter != null) {
            total.add(sum[4]);
            total.add(Double.NaN);
        }
        total.add(sum[5]);
        t.row(total.toArray());
        return t;
    }

    private ReportTable tubes() {
        ReportTable t = new ReportTable("tubes", "tubes by module and type")
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
    private ReportTable heaterStrings() {
        ReportTable t = new ReportTable("heater_strings", "heater strings (in series across their rail; identical strings counted together)")
                .column("rail", "rail", TEXT)
                .column("count", "count", COUNT)
                .column("heaters", "heaters", TEXT)
                .column("rated_volts", "rated", VOLTS)
                .column("string_amps", "current", AMPS)
                .column("heater_volts", "each heater gets", TEXT)
                .column("worst_deviation_percent", "worst", PERCENT)
                .column("drop_ohms", "dropper", OHMS)
                .column("drop_watts", "dropper W", WATTS)
                .column("shunts", "shunts", TEXT)
                .column("suggested_drop_ohms", "suggest", OHMS)
                .column("suggested_drop_watts", "suggest W", WATTS)
                .column("first_string", "first", COUNT)
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
                volts.append(volts.length() == 0 ? "" : ", ").append(Units.volts(h.volts()))
                        .append(String.format(Locale.ROOT, " (%+.1f %%)", h.deviation() * 100));
                if (h.shunted()) {
                    shunts.append(shunts.length() == 0 ? "" : ", ").append(name).append(' ').append(Units.ohms(h.shuntOhms()))
                            .append(' ').append(Units.watts(h.shuntWatts()));
                }
                if (Math.abs(h.deviation()) > Math.abs(worst)) {
                    worst = h.deviation();
                }
            }
            String status = s.findings().stream().anyMatch(Finding::isError) ? "error"
                    : s.findings().stream().anyMatch(f -> f.severity() == Finding.Severity.WARNING) ? "warning" : "ok";
            t.row(m.rails().get(s.string().rail()).name(), g.size(), types.toString(), s.ratedVolts(), s.amps(),
                    volts.toString(), worst * 100, s.string().dropOhms() > 0 ? s.string().dropOhms() : Double.NaN,
                    s.string().dropOhms() > 0 ? s.dropWatts() : Double.NaN, shunts.length() == 0 ? null : shunts.toString(),
                    s.suggestion() == null ? Double.NaN : s.suggestion().ohms(),
                    s.suggestion() == null ? Double.NaN : s.suggestion().watts(), s.index() + 1, status);
        }
        return t;
    }

    private ReportTable moduleRails() {
        ReportTable t = new ReportTable("module_rails", "plate and bias current by module")
                .column("module", "module", TEXT)
                .column("rail", "rail", TEXT)
                .column("lowest_amps", "lowest", AMPS)
                .column("highest_amps", "highest", AMPS);
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

    private static void dynamicColumns(ReportTable t) {
        t.column("now_amps", "now", AMPS)
                .column("min_amps", "min", AMPS)
                .column("mean_amps", "mean", AMPS)
                .column("peak_amps", "peak", AMPS)
                .column("peak_cycle", "peak cycle", COUNT)
                .column("peak_phase", "phase", COUNT);
    }

    private ReportTable rails() {
        ReportTable t = new ReportTable("rails", "plate and bias current by rail")
                .column("rail", "rail", TEXT)
                .column("volts", "voltage", VOLTS)
                .column("lowest_amps", "lowest", AMPS)
                .column("highest_amps", "highest", AMPS);
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

    private ReportTable supply() {
        ReportTable t = new ReportTable("supply", "supply check (peak = heaters + plate and bias)")
                .column("rail", "rail", TEXT)
                .column("volts", "voltage", VOLTS)
                .column("heater_amps", "heaters", AMPS)
                .column("heater_watts", "heater W", WATTS)
                .column("stage_amps", "plate+bias", AMPS)
                .column("basis", "from", TEXT)
                .column("peak_amps", "peak", AMPS)
                .column("limit_amps", "limit", AMPS)
                .column("margin_amps", "margin", AMPS)
                .column("margin_percent", "margin %", PERCENT)
                .column("volts_at_peak", "V at peak", VOLTS)
                .column("status", "status", TEXT);
        for (Budget.Supply s : b.supply()) {
            Rail rail = m.rails().get(s.rail());
            t.row(rail.name(), rail.volts(), s.heaterAmps(), b.heaters().railWatts(s.rail()), s.stageAmps(), s.simulated() ? "simulation" : "highest",
                    s.peakAmps(), s.limited() ? s.limitAmps() : Double.NaN, s.limited() ? s.marginAmps() : Double.NaN,
                    s.marginFraction() * 100, Math.copySign(s.voltsAtPeak(), rail.volts()),
                    s.over() ? "OVER" : s.limited() ? "ok" : "no limit");
        }
        return t;
    }

    private ReportTable findings() {
        ReportTable t = new ReportTable("findings", "findings")
                .column("severity", "severity", TEXT)
                .column("subject", "subject", TEXT)
                .column("message", "message", TEXT)
                .column("advice", "advice", TEXT);
        for (Finding f : b.findings()) {
            t.row(f.severity().name().toLowerCase(Locale.ROOT), f.subject(), f.message(), f.advice());
        }
        return t;
    }

    static String label(ModuleInstance mi) {
        return mi.path().isEmpty() ? "(top) " + mi.type() : mi.path() + " (" + mi.type() + ")";
    }
}
