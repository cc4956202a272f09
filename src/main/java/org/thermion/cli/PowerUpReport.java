package org.thermion.cli;

import org.thermion.power.startup.BypassDelay;
import org.thermion.power.startup.CurrentPlot;
import org.thermion.power.startup.HeaterModel;
import org.thermion.power.startup.HeaterWarmup;
import org.thermion.power.startup.PowerUpResult;
import org.thermion.power.startup.RailTransient;
import org.thermion.power.startup.RelayDriverCheck;
import org.thermion.power.startup.ResistorSweep;
import org.thermion.power.startup.SoftStartResult;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Writes a power-up result as text, JSON or an RFC 4180 time series. */
final class PowerUpReport {
    static final String CAUTION = "caution: B+, heater and mains supplies can injure or kill, and a soft-start resistor runs hot. "
            + "These figures are planning estimates from idealised models; confirm them by measurement, and defer to local "
            + "codes and qualified practice.";

    private final PowerUpResult r;
    private final List<BypassDelay.Advice> advice;

    PowerUpReport(PowerUpResult r, List<BypassDelay.Advice> advice) {
        this.r = r;
        this.advice = advice;
    }

    private BypassDelay.Advice adviceFor(String softStart) {
        return advice.stream().filter(a -> a.softStart().equals(softStart)).findFirst().orElse(null);
    }

    /** True when every check passed: supplies within limit, resistors within rating and bypassed, relay drivers sound. */
    boolean ok() {
        for (RailTransient rt : r.rails()) {
            if (!rt.withinLimit()) {
                return false;
            }
        }
        for (SoftStartResult s : r.softStarts()) {
            if (s.ohms() > 0 && (!s.withinRating() || !s.bypassed() || !s.contactsOk())) {
                return false;
            }
        }
        for (RelayDriverCheck c : r.relayChecks()) {
            if (!c.ok()) {
                return false;
            }
        }
        return true;
    }

    // ---- text ----------------------------------------------------------------------------

    void text(PrintWriter out, int plotWidth, boolean plots, CurrentPlot.Style style) {
        out.println("power-up of " + r.machine() + ": " + Units.time(r.options().seconds()) + " simulated, heaters from "
                + f0(r.options().assumptions().ambientKelvin()) + " K to " + f0(r.options().assumptions().hotKelvin())
                + " K; steady stage draws: " + (r.options().drawMode().name().equals("MEAN") ? "mean of low and high" : "highest of low and high"));
        out.println();
        out.println("rails:");
        Table t = new Table("rail", "volts", "limit", "switch-on peak", "at", "bypass peak", "at", "final", "supply");
        for (RailTransient rt : r.rails()) {
            if (!rt.hasLoad()) {
                continue;
            }
            String supply = rt.withinLimit() ? "ok" : "LIMIT for " + Units.time(rt.secondsInLimit()) + ", asks " + Units.amps(rt.peakDemand());
            t.row(rt.name(), Units.volts(rt.volts()), Double.isInfinite(rt.limitAmps()) ? "none" : Units.amps(rt.limitAmps()),
                    Units.amps(rt.switchOnPeak()), Units.time(rt.switchOnTime()),
                    rt.hasSoftStart() ? Units.amps(rt.bypassPeak()) : "-", rt.hasSoftStart() ? Units.time(rt.bypassPeakTime()) : "-",
                    Units.amps(rt.finalAmps()), supply);
        }
        t.print(out, "  ");
        for (SoftStartResult s : r.softStarts()) {
            out.println();
            String rail = r.rail(s.rail()).name();
            out.println("soft start " + s.name() + " on " + rail + ": " + Units.ohms(s.ohms())
                    + (Double.isInfinite(s.ratedWatts()) ? ", no rating declared" : ", rated " + Units.watts(s.ratedWatts())));
            if (s.ohms() == 0) {
                out.println("  no resistor: the rail switches straight on");
                continue;
            }
            String trig = s.thyratron()
                    ? (Double.isNaN(s.triggerTime()) ? "thyratron did not fire within the run" : "thyratron fired at " + Units.time(s.triggerTime()))
                    : (Double.isNaN(s.triggerTime()) ? "delay beyond the run" : "delay of " + Units.time(s.triggerTime()));
            out.println("  trigger   " + trig);
            out.println("  bypass    " + (s.bypassed() ? "relay closed at " + Units.time(s.bypassTime()) : "NOT within the run: the resistor stays in circuit"));
            out.println("  resistor  " + joules(s.joules()) + " dissipated; peak " + Units.watts(s.peakWatts()) + ", mean "
                    + Units.watts(s.meanWatts()) + " while in circuit"
                    + (Double.isInfinite(s.ratedWatts()) ? "" : s.withinRating() ? ": within its rating"
                    : ": OVER its " + Units.watts(s.ratedWatts()) + " rating")
                    + (Double.isInfinite(s.ratedWatts()) ? "" : String.format(Locale.ROOT, " (peak %.1f x rating)", s.peakWatts() / s.ratedWatts())));
            out.println("  rating    by temperature rise, " + String.format(Locale.ROOT, "%.3g x rated power for %.3g s",
                    s.rating().multiple(), s.rating().seconds()) + " (common practice): asks at least "
                    + Units.watts(s.neededWatts()) + " continuous"
                    + (Double.isNaN(s.suggestedWatts()) ? "" : ", a " + Units.watts(s.suggestedWatts()) + " resistor"));
            if (!Double.isNaN(s.contactAmps())) {
                out.println("  contacts  make " + Units.amps(s.makeAmps()) + ", carry " + Units.amps(s.carryAmps()) + " against "
                        + Units.amps(s.contactAmps()) + ": " + (s.contactsOk() ? "ok" : "OVER RATING"));
            }
            BypassDelay.Advice a = adviceFor(s.name());
            if (a != null) {
                out.println("  delay     " + (Double.isNaN(a.settleSeconds()) ? "with the relay held open the current has not settled within "
                        + Units.time(Math.max(60, r.options().seconds()))
                        : "with the relay held open the current settles within 2 % of " + Units.amps(a.restingAmps()) + " by "
                        + Units.time(a.settleSeconds()) + ";\n            bypassing later gains little, earlier raises the bypass peak"));
            }
        }
        out.println();
        if (r.heaters().isEmpty()) {
            out.println("heaters: none; the machine has no tubes");
            out.println();
            wrap(out, CAUTION, 78);
            return;
        }
        out.println("heaters:");
        Table h = new Table("tube", "rating", "string", "pos", "count", "95 % hot", "peak voltage", "at", "final");
        for (HeaterWarmup w : r.heaters()) {
            h.row(w.tube(), Units.volts(w.ratedVolts()) + " " + Units.amps(w.ratedAmps()), w.string(),
                    String.valueOf(w.position() + 1), String.valueOf(w.count()),
                    Double.isNaN(w.warmSeconds()) ? "not yet" : Units.time(w.warmSeconds()),
                    Units.volts(w.peakVoltRatio() * w.ratedVolts()) + String.format(Locale.ROOT, " %+.0f %%", 100 * (w.peakVoltRatio() - 1)),
                    Units.time(w.peakVoltTime()), Units.volts(w.finalVolts()));
        }
        h.print(out, "  ");
        double all = r.allWarmSeconds();
        out.println("  every heater at 95 % of operating temperature " + (Double.isNaN(all) ? "NOT within the run" : "by " + Units.time(all)));
        HeaterWarmup worst = r.worstMixedOverVoltage();
        if (worst == null) {
            out.println("  no string mixes heater types");
        } else {
            out.println("  worst over-voltage in a mixed string: " + worst.tube() + " in " + worst.string() + ", "
                    + Units.volts(worst.peakVoltRatio() * worst.ratedVolts())
                    + String.format(Locale.ROOT, " (%+.0f %% of rated)", 100 * (worst.peakVoltRatio() - 1)) + " at " + Units.time(worst.peakVoltTime())
                    + (worst.peakVoltRatio() > 1.10 ? ": beyond the +10 % of common practice" : ""));
        }
        for (HeaterWarmup w : r.heaters()) {
            if (w.finalVolts() > 1.10 * w.ratedVolts()) {
                out.println("  WARNING: " + w.tube() + " in " + w.string() + " settles at " + Units.volts(w.finalVolts()) + " on a "
                        + Units.volts(w.ratedVolts()) + " heater");
            }
        }
        for (RelayDriverCheck c : r.relayChecks()) {
            out.println();
            out.println("relay driver: " + c.tube() + " from " + c.railName() + " " + Units.volts(c.railVolts()) + " through "
                    + Units.ohms(c.plateOhms()) + ", coil " + Units.ohms(c.relay().coilOhms()) + ", arc drop " + Units.volts(c.arcDropVolts()));
            double pick = c.relay().pickupVolts();
            out.println("  coil      " + Units.volts(c.coilVolts()) + String.format(Locale.ROOT, " (%.0f %% of rated %s), pick-up %s: ",
                    100 * c.ratedRatio(), Units.volts(c.relay().ratedVolts()), Units.volts(pick))
                    + (!c.picksUp() ? "DOES NOT PICK UP" : !c.coilNotOverdriven() ? "OVERDRIVEN (over +10 %)" : "ok"));
            if (c.coil() != null && !Double.isNaN(c.coil().atFireVolts())) {
                out.println("  in run    coil " + Units.volts(c.coil().atFireVolts()) + " at firing, at most "
                        + Units.volts(c.coil().maxVolts()) + " at " + Units.time(c.coil().maxTime())
                        + (c.chatters() ? "; CHATTER: opened " + c.coil().openings() + " times below drop-out, first at "
                        + Units.time(c.coil().firstOpening()) : ""));
            }
            if (c.coil() != null && !c.coil().closed()) {
                out.println("  why open  " + c.coil().whyOpen());
            }
            out.println("  tube      " + Units.amps(c.coilAmps()) + " continuous against " + Units.amps(c.avgRatingAmps()) + " average and "
                    + Units.amps(c.peakRatingAmps()) + " peak: " + (c.averageOk() && c.peakOk() ? "ok" : "OVER RATING"));
            out.println("  heating   " + (Double.isNaN(c.fireTime()) ? "did not fire" : "fired " + Units.time(c.fireTime()) + " after switch-on")
                    + (Double.isNaN(c.heatingSeconds()) ? "" : "; asks " + Units.time(c.heatingSeconds()) + " of cathode heating: "
                    + (c.heatedLongEnough() ? "ok" : "TOO EARLY")));
            out.println("  note      once fired it conducts until its anode supply is broken, so the relay holds in; the relay");
            out.println("            contacts carry the whole rail current: rate them for the bypass peak");
        }
        if (plots) {
            for (RailTransient rt : r.rails()) {
                if (!rt.hasLoad() || rt.t().length == 0) {
                    continue;
                }
                out.println();
                if (!(rt.worstPeak() > 0)) {
                    out.println("rail " + rt.name() + ": no current during the run");
                    continue;
                }
                List<CurrentPlot.Marker> marks = new ArrayList<>();
                if (!Double.isNaN(rt.bypassTime())) {
                    marks.add(new CurrentPlot.Marker(rt.bypassTime(), "bypass " + Units.time(rt.bypassTime())));
                }
                for (String line : CurrentPlot.render(rt.t(), rt.amps(), plotWidth, 16,
                        "rail " + rt.name() + ": current against time, peak " + Units.amps(rt.worstPeak()),
                        marks, rt.limitAmps(), style)) {
                    out.println(line);
                }
            }
        }
        out.println();
        out.println("heater models (radiation balanced at rated power, heat capacity from the warm-up test):");
        Table m = new Table("tube", "rating", "cold/hot", "k, W/K^4", "C, J/K", "warm-up");
        for (HeaterModel hm : r.models()) {
            m.row(hm.tube(), Units.volts(hm.rating().volts()) + " " + Units.amps(hm.rating().amps()), f2(hm.coldHotRatio()),
                    String.format(Locale.ROOT, "%.3e", hm.radiationK()), String.format(Locale.ROOT, "%.4f", hm.heatCapacity()),
                    Units.time(hm.warmupSeconds()) + (hm.warmupDeclared() ? "" : " assumed"));
        }
        m.print(out, "  ");
        for (String n : r.notes()) {
            out.println("  note: " + n);
        }
        out.println();
        wrap(out, CAUTION, 78);
    }

    static void sweepText(PrintWriter out, ResistorSweep.Result s) {
        out.println("soft-start resistor sweep for " + s.softStart() + " on " + s.rail() + " (limit "
                + (Double.isInfinite(s.limitAmps()) ? "none" : Units.amps(s.limitAmps())) + ", rating "
                + (Double.isInfinite(s.ratedWatts()) ? "none" : Units.watts(s.ratedWatts())) + "):");
        Table t = new Table("resistor", "switch-on peak", "bypass peak", "larger", "bypass at", "mean power", "energy", "verdict");
        for (int i = 0; i < s.rows().size(); i++) {
            ResistorSweep.Row row = s.rows().get(i);
            String verdict = !row.bypassed() ? "no bypass" : !row.withinLimit() ? "over limit" : !row.withinRating() ? "over rating"
                    : i == s.best() ? "<- best" : "ok";
            t.row(ohms(row.ohms()), Units.amps(row.switchOnPeak()), Units.amps(row.bypassPeak()), Units.amps(row.worstPeak()),
                    Units.time(row.bypassTime()), Units.watts(row.meanWatts()), joules(row.joules()), verdict);
        }
        t.print(out, "  ");
        ResistorSweep.Row best = s.recommended();
        out.println(best == null ? "  no value in the range keeps the supply within its limit and the resistor within its rating"
                : "  recommended: " + ohms(best.ohms()) + " (larger peak " + Units.amps(best.worstPeak()) + ", bypass at "
                + Units.time(best.bypassTime()) + ", mean " + Units.watts(best.meanWatts()) + " in the resistor)");
        if (s.preferred() != null) {
            ResistorSweep.Row p = s.preferred();
            out.println("  preferred value: " + ohms(p.ohms()) + (org.thermion.power.startup.PreferredValues.isE12(p.ohms())
                    ? " (E12)" : " (E24)") + ", " + (Double.isNaN(s.preferredWatts()) ? "a rating beyond the common list"
                    : Units.watts(s.preferredWatts())) + " (larger peak " + Units.amps(p.worstPeak()) + ")");
        }
        out.println();
        wrap(out, CAUTION, 78);
    }

    static void wrap(PrintWriter out, String text, int width) {
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            if (line.length() > 0 && line.length() + 1 + word.length() > width) {
                out.println(line);
                line.setLength(0);
            }
            line.append(line.length() == 0 ? "" : " ").append(word);
        }
        if (line.length() > 0) {
            out.println(line);
        }
    }

    // ---- JSON ----------------------------------------------------------------------------

    String json() {
        StringBuilder b = new StringBuilder();
        b.append("{\n");
        kv(b, 1, "machine", ReportJson.quote(r.machine())).append(",\n");
        kv(b, 1, "seconds", num(r.options().seconds())).append(",\n");
        kv(b, 1, "drawMode", ReportJson.quote(r.options().drawMode().name().toLowerCase(Locale.ROOT))).append(",\n");
        kv(b, 1, "ok", String.valueOf(ok())).append(",\n");
        ind(b, 1).append("\"rails\": [");
        boolean first = true;
        for (RailTransient rt : r.rails()) {
            b.append(first ? "\n" : ",\n");
            first = false;
            ind(b, 2).append("{\"name\": ").append(ReportJson.quote(rt.name())).append(", \"volts\": ").append(num(rt.volts()))
                    .append(", \"limitAmps\": ").append(num(rt.limitAmps()))
                    .append(", \"switchOnPeakAmps\": ").append(num(rt.switchOnPeak())).append(", \"switchOnPeakSeconds\": ").append(num(rt.switchOnTime()))
                    .append(", \"bypassPeakAmps\": ").append(num(rt.bypassPeak())).append(", \"bypassPeakSeconds\": ").append(num(rt.bypassPeakTime()))
                    .append(", \"bypassSeconds\": ").append(num(rt.bypassTime())).append(", \"peakDemandAmps\": ").append(num(rt.peakDemand()))
                    .append(", \"secondsInLimit\": ").append(num(rt.secondsInLimit())).append(", \"finalAmps\": ").append(num(rt.finalAmps()))
                    .append(", \"withinLimit\": ").append(rt.withinLimit()).append(", \"softStart\": ").append(rt.hasSoftStart()).append("}");
        }
        b.append("\n");
        ind(b, 1).append("],\n");
        ind(b, 1).append("\"softStarts\": [");
        first = true;
        for (SoftStartResult s : r.softStarts()) {
            b.append(first ? "\n" : ",\n");
            first = false;
            ind(b, 2).append("{\"name\": ").append(ReportJson.quote(s.name())).append(", \"rail\": ").append(ReportJson.quote(r.rail(s.rail()).name()))
                    .append(", \"ohms\": ").append(num(s.ohms())).append(", \"ratedWatts\": ").append(num(s.ratedWatts()))
                    .append(", \"thyratron\": ").append(s.thyratron()).append(", \"triggerSeconds\": ").append(num(s.triggerTime()))
                    .append(", \"bypassSeconds\": ").append(num(s.bypassTime())).append(", \"joules\": ").append(num(s.joules()))
                    .append(", \"peakWatts\": ").append(num(s.peakWatts())).append(", \"meanWatts\": ").append(num(s.meanWatts()))
                    .append(", \"withinRating\": ").append(s.withinRating());
            BypassDelay.Advice a = adviceFor(s.name());
            if (a != null) {
                b.append(", \"settleSeconds\": ").append(num(a.settleSeconds())).append(", \"restingAmps\": ").append(num(a.restingAmps()));
            }
            b.append("}");
        }
        b.append("\n");
        ind(b, 1).append("],\n");
        ind(b, 1).append("\"heaters\": [");
        first = true;
        for (HeaterWarmup w : r.heaters()) {
            b.append(first ? "\n" : ",\n");
            first = false;
            ind(b, 2).append("{\"tube\": ").append(ReportJson.quote(w.tube())).append(", \"ratedVolts\": ").append(num(w.ratedVolts()))
                    .append(", \"ratedAmps\": ").append(num(w.ratedAmps())).append(", \"rail\": ").append(ReportJson.quote(r.rail(w.rail()).name()))
                    .append(", \"string\": ").append(ReportJson.quote(w.string())).append(", \"position\": ").append(w.position())
                    .append(", \"count\": ").append(w.count()).append(", \"mixed\": ").append(w.mixed())
                    .append(", \"warmSeconds\": ").append(num(w.warmSeconds())).append(", \"peakVoltRatio\": ").append(num(w.peakVoltRatio()))
                    .append(", \"peakVoltSeconds\": ").append(num(w.peakVoltTime())).append(", \"finalVolts\": ").append(num(w.finalVolts()))
                    .append(", \"finalKelvin\": ").append(num(w.finalKelvin())).append("}");
        }
        b.append("\n");
        ind(b, 1).append("],\n");
        kv(b, 1, "allWarmSeconds", num(r.allWarmSeconds())).append(",\n");
        HeaterWarmup worst = r.worstMixedOverVoltage();
        kv(b, 1, "worstMixedOverVoltage", worst == null ? "null" : "{\"tube\": " + ReportJson.quote(worst.tube()) + ", \"string\": " + ReportJson.quote(worst.string())
                + ", \"peakVoltRatio\": " + num(worst.peakVoltRatio()) + ", \"seconds\": " + num(worst.peakVoltTime()) + "}").append(",\n");
        ind(b, 1).append("\"relayDrivers\": [");
        first = true;
        for (RelayDriverCheck c : r.relayChecks()) {
            b.append(first ? "\n" : ",\n");
            first = false;
            ind(b, 2).append("{\"tube\": ").append(ReportJson.quote(c.tube())).append(", \"rail\": ").append(ReportJson.quote(c.railName()))
                    .append(", \"railVolts\": ").append(num(c.railVolts())).append(", \"arcDropVolts\": ").append(num(c.arcDropVolts()))
                    .append(", \"plateOhms\": ").append(num(c.plateOhms())).append(", \"coilOhms\": ").append(num(c.relay().coilOhms()))
                    .append(", \"coilVolts\": ").append(num(c.coilVolts())).append(", \"coilAmps\": ").append(num(c.coilAmps()))
                    .append(", \"picksUp\": ").append(c.picksUp()).append(", \"coilNotOverdriven\": ").append(c.coilNotOverdriven())
                    .append(", \"averageOk\": ").append(c.averageOk()).append(", \"peakOk\": ").append(c.peakOk())
                    .append(", \"fireSeconds\": ").append(num(c.fireTime())).append(", \"heatedLongEnough\": ").append(c.heatedLongEnough())
                    .append(", \"ok\": ").append(c.ok()).append("}");
        }
        b.append("\n");
        ind(b, 1).append("],\n");
        ind(b, 1).append("\"notes\": [");
        for (int i = 0; i < r.notes().size(); i++) {
            b.append(i == 0 ? "" : ", ").append(ReportJson.quote(r.notes().get(i)));
        }
        b.append("],\n");
        kv(b, 1, "caution", ReportJson.quote(CAUTION)).append("\n");
        b.append("}\n");
        return b.toString().replace("[\n  ]", "[]");
    }

    static String sweepJson(ResistorSweep.Result s) {
        StringBuilder b = new StringBuilder("{\n");
        kv(b, 1, "softStart", ReportJson.quote(s.softStart())).append(",\n");
        kv(b, 1, "rail", ReportJson.quote(s.rail())).append(",\n");
        kv(b, 1, "limitAmps", num(s.limitAmps())).append(",\n");
        kv(b, 1, "ratedWatts", num(s.ratedWatts())).append(",\n");
        ind(b, 1).append("\"rows\": [");
        for (int i = 0; i < s.rows().size(); i++) {
            ResistorSweep.Row row = s.rows().get(i);
            b.append(i == 0 ? "\n" : ",\n");
            ind(b, 2).append("{\"ohms\": ").append(num(row.ohms())).append(", \"switchOnPeakAmps\": ").append(num(row.switchOnPeak()))
                    .append(", \"bypassPeakAmps\": ").append(num(row.bypassPeak())).append(", \"bypassSeconds\": ").append(num(row.bypassTime()))
                    .append(", \"peakDemandAmps\": ").append(num(row.peakDemand())).append(", \"meanWatts\": ").append(num(row.meanWatts()))
                    .append(", \"peakWatts\": ").append(num(row.peakWatts())).append(", \"joules\": ").append(num(row.joules()))
                    .append(", \"feasible\": ").append(row.feasible()).append("}");
        }
        b.append("\n");
        ind(b, 1).append("],\n");
        kv(b, 1, "recommendedOhms", s.recommended() == null ? "null" : num(s.recommended().ohms())).append(",\n");
        kv(b, 1, "caution", ReportJson.quote(CAUTION)).append("\n}\n");
        return b.toString();
    }

    // ---- CSV (RFC 4180) ------------------------------------------------------------------

    String csv() {
        StringBuilder b = new StringBuilder();
        List<String> head = new ArrayList<>();
        head.add("time_s");
        for (RailTransient rt : r.rails()) {
            head.add(rt.name() + "_A");
        }
        for (RailTransient rt : r.rails()) {
            head.add(rt.name() + "_V");
        }
        for (HeaterWarmup w : r.heaters()) {
            head.add(w.tube() + " #" + (w.position() + 1) + " in " + w.string() + " (x" + w.count() + ")_K");
        }
        row(b, head);
        double[] t = r.t();
        for (int i = 0; i < t.length; i++) {
            List<String> cells = new ArrayList<>();
            cells.add(g(t[i]));
            for (RailTransient rt : r.rails()) {
                cells.add(g(rt.amps()[i]));
            }
            for (RailTransient rt : r.rails()) {
                cells.add(g(rt.busVolts()[i]));
            }
            for (double[] k : r.heaterKelvin()) {
                cells.add(g(k[i]));
            }
            row(b, cells);
        }
        return b.toString();
    }

    private static void row(StringBuilder b, List<String> cells) {
        b.append(ReportCsv.row(cells.toArray(String[]::new))).append("\r\n");
    }

    // ---- helpers -------------------------------------------------------------------------

    private static String g(double v) {
        return Double.isFinite(v) ? num(v) : "";
    }

    private static String f0(double v) {
        return String.format(Locale.ROOT, "%.0f", v);
    }

    private static String f2(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }

    /** Resistor values as swept: up to four significant figures, so close steps stay distinct. */
    static String ohms(double v) {
        if (v >= 1000) {
            return Units.ohms(v);
        }
        return num(Double.parseDouble(String.format(Locale.ROOT, "%.4g", v))) + " ohm";
    }

    static String joules(double j) {
        return Units.scaled(j, "J");
    }

    private static StringBuilder ind(StringBuilder b, int level) {
        return b.append("  ".repeat(level));
    }

    private static StringBuilder kv(StringBuilder b, int level, String key, String value) {
        return ind(b, level).append(ReportJson.quote(key)).append(": ").append(value);
    }

    static String num(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return "null";
        }
        String s = String.format(Locale.ROOT, "%.6g", v);
        int e = s.indexOf('e');
        String mant = e < 0 ? s : s.substring(0, e);
        String exp = e < 0 ? "" : s.substring(e);
        if (mant.contains(".")) {
            mant = mant.replaceFirst("0+$", "");
            if (mant.endsWith(".")) {
                mant = mant.substring(0, mant.length() - 1);
            }
        }
        return mant + exp;
    }
}
