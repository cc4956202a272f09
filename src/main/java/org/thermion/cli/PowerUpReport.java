package org.thermion.cli;

import org.thermion.power.startup.BypassDelay;
import org.thermion.power.startup.CurrentPlot;
import org.thermion.power.startup.HeaterModel;
import org.thermion.power.startup.HeaterWarmup;
import org.thermion.power.startup.PowerUpResult;
import org.thermion.power.startup.RailTransient;
import org.thermion.power.startup.RelayDriverCheck;
import org.thermion.power.startup.SoftStartResult;

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
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.JOULES;
import static org.thermion.cli.report.ReportUnit.KELVIN;
import static org.thermion.cli.report.ReportUnit.NUMBER;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.PERCENT;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.VOLTS;
import static org.thermion.cli.report.ReportUnit.WATTS;

/** A power-up result as one report (text, CSV, JSON) and as an RFC 4180 time series. */
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

    /** The schema version of powerup's JSON ({@code org/thermion/schema/powerup.schema.json}). */
    static final int VERSION = 3;
    /** A rail has settled when its current moved less than this share over the last tenth of the run. */
    static final double SETTLED = 0.01;
    static final Absent NONE = new Absent("none");

    /** The whole report; text adds the plots ({@code plotWidth} columns) unless {@code plots} is false. */
    Report report(int plotWidth, boolean plots, CurrentPlot.Style style) {
        Report rep = new Report("powerup", VERSION);
        rep.field("machine", r.machine());
        rep.field("simulated", SECONDS, r.options().seconds());
        rep.field("ambient", KELVIN, r.options().assumptions().ambientKelvin());
        rep.field("hot", KELVIN, r.options().assumptions().hotKelvin());
        rep.field("draw_mode", r.options().drawMode().name().toLowerCase(Locale.ROOT));
        rep.field("ok", ok());
        double all = r.allWarmSeconds();
        rep.field("all_warm", SECONDS, Double.isNaN(all) ? new Absent("not within the run") : all);
        HeaterWarmup worst = r.worstMixedOverVoltage();
        if (worst == null) {
            rep.field("worst_mixed_over_voltage", new Absent("no string mixes heater types"));
        } else {
            Map<String, Object> w = new LinkedHashMap<>();
            w.put("tube", worst.tube());
            w.put("string", worst.string());
            w.put(VOLTS.name("peak"), worst.peakVoltRatio() * worst.ratedVolts());
            w.put(PERCENT.name("peak_deviation"), 100 * (worst.peakVoltRatio() - 1));
            w.put(SECONDS.name("peak_time"), worst.peakVoltTime());
            rep.field("worst_mixed_over_voltage", w);
        }
        rep.field("notes", List.copyOf(r.notes()));
        rep.field("caution", CAUTION);

        rep.text("power-up of " + r.machine() + ": " + Numbers.si(r.options().seconds(), SECONDS)
                + " simulated, heaters from " + f0(r.options().assumptions().ambientKelvin()) + " K to "
                + f0(r.options().assumptions().hotKelvin()) + " K; steady stage draws: "
                + (r.options().drawMode().name().equals("MEAN") ? "mean of low and high" : "highest of low and high"), "");
        rep.table(rails());
        Table soft = softStarts();
        rep.data(soft);
        rep.text(softStartLines());
        if (r.heaters().isEmpty()) {
            rep.text("heaters: none; the machine has no tubes", "");
        } else {
            rep.table(heaters());
            rep.text(heaterLines());
        }
        RelayDriverSection relays = new RelayDriverSection(r.relayChecks());
        rep.data(relays.table());
        rep.text(relays.lines());
        if (plots) {
            rep.verbatim(plotLines(plotWidth, style));
        }
        rep.table(models());
        rep.text(r.notes().stream().map(n -> "  note: " + n).toList());
        rep.text("", CAUTION);
        return rep;
    }

    private Table rails() {
        Table t = new Table("rails", "rails (currents are magnitudes; volts signed as declared)")
                .column("rail", "rail", TEXT)
                .column("nominal", "nominal", VOLTS)
                .column("limit", "limit", AMPS, "the supply's current limit")
                .column("switch_on_peak", "switch-on pk", AMPS, "inrush: the highest current before any bypass, when the "
                        + "current falls from it ('none': the current only rises)")
                .column("switch_on_peak_time", "at", SECONDS)
                .column("bypass_peak", "bypass pk", AMPS, "the highest current after the soft start's bypass")
                .column("bypass_peak_time", "at", SECONDS)
                .column("steady_state", "steady", AMPS, "the current at the end of the run, when it moved less than 1 % "
                        + "over the last tenth of it")
                .column("end", "end", AMPS, "the current at the end of the run")
                .column("peak_demand", "demand pk", AMPS, "the most the loads asked for, before any current limit")
                .column("in_limit", "in limit", SECONDS, "time the supply held its current limit")
                .column("status", "supply", TEXT, "ok, or LIMIT when the loads asked more than the limit");
        for (RailTransient rt : r.rails()) {
            if (!rt.hasLoad()) {
                continue;
            }
            boolean inrush = inrush(rt);
            t.row(rt.name(), rt.volts(), Double.isInfinite(rt.limitAmps()) ? NONE : rt.limitAmps(),
                    inrush ? rt.switchOnPeak() : NONE, inrush ? rt.switchOnTime() : NONE,
                    rt.hasSoftStart() && !Double.isNaN(rt.bypassPeak()) ? rt.bypassPeak() : NONE,
                    rt.hasSoftStart() && !Double.isNaN(rt.bypassPeak()) ? rt.bypassPeakTime() : NONE,
                    settled(rt) ? rt.finalAmps() : new Absent("not settled"), rt.finalAmps(), rt.peakDemand(),
                    rt.secondsInLimit(), rt.withinLimit() ? "ok" : "LIMIT");
        }
        return t;
    }

    /**
     * Whether the highest current before the bypass (or in the whole run without one) is an inrush:
     * a peak the current falls from, rather than the end of a rise (a B+ rail growing as cathodes warm).
     */
    static boolean inrush(RailTransient rt) {
        double[] t = rt.t();
        double[] a = rt.amps();
        double until = Double.isNaN(rt.bypassTime()) ? Double.POSITIVE_INFINITY : rt.bypassTime();
        double last = Double.NaN;
        for (int i = 0; i < t.length && t[i] <= until; i++) {
            last = a[i];
            if (t[i] == until) {
                break; // the first of the bypass's two samples: the current just before it
            }
        }
        return !Double.isNaN(last) && rt.switchOnPeak() > last * (1 + SETTLED);
    }

    /** Whether the rail's current moved less than {@link #SETTLED} of its final value over the run's last tenth. */
    static boolean settled(RailTransient rt) {
        double[] t = rt.t();
        double[] a = rt.amps();
        if (t.length == 0) {
            return false;
        }
        double from = t[t.length - 1] * 0.9;
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < t.length; i++) {
            if (t[i] >= from) {
                lo = Math.min(lo, a[i]);
                hi = Math.max(hi, a[i]);
            }
        }
        return hi - lo <= SETTLED * Math.abs(rt.finalAmps());
    }

    private Table softStarts() {
        Table t = new Table("soft_starts", "soft starts")
                .column("name", "name", TEXT)
                .column("rail", "rail", TEXT)
                .column("covers", "covers", TEXT, "the loads behind the resistor; the rest of the rail is fed ahead of it")
                .column("resistor", "resistor", OHMS)
                .column("rated", "rated", WATTS)
                .column("thyratron", "thyratron", FLAG)
                .column("trigger", "trigger", SECONDS)
                .column("bypass", "bypass", SECONDS)
                .column("energy", "energy", JOULES)
                .column("peak", "peak", WATTS)
                .column("mean", "mean", WATTS)
                .column("within_rating", "within rating", FLAG)
                .column("needed", "needed", WATTS, "the continuous rating its temperature rise asks")
                .column("suggested", "suggested", WATTS, "a commonly sold rating at least that")
                .column("contact_rating", "contacts", AMPS, "the bypass contacts' declared rating")
                .column("make", "make", AMPS, "the current the contacts make (the bypass peak)")
                .column("carry", "carry", AMPS, "the current they carry at the end of the run")
                .column("contacts_ok", "contacts ok", FLAG)
                .column("settle", "settle", SECONDS)
                .column("resting", "resting", AMPS);
        for (SoftStartResult s : r.softStarts()) {
            BypassDelay.Advice a = adviceFor(s.name());
            t.row(s.name(), r.rail(s.rail()).name(), s.covers().isEmpty() ? "whole rail" : String.join("; ", s.covers()), s.ohms(), Double.isInfinite(s.ratedWatts()) ? new Absent("no rating") : s.ratedWatts(),
                    s.thyratron(), Double.isNaN(s.triggerTime()) ? new Absent("did not fire") : s.triggerTime(),
                    s.bypassed() ? s.bypassTime() : new Absent("not bypassed"), s.joules(), s.peakWatts(), s.meanWatts(),
                    s.withinRating(), s.neededWatts(), Double.isNaN(s.suggestedWatts()) ? new Absent("beyond the common list") : s.suggestedWatts(),
                    Double.isNaN(s.contactAmps()) ? new Absent("no rating") : s.contactAmps(),
                    Double.isNaN(s.makeAmps()) ? new Absent("never closed") : s.makeAmps(), s.carryAmps(), s.contactsOk(),
                    a == null || Double.isNaN(a.settleSeconds()) ? new Absent("not settled") : a.settleSeconds(),
                    a == null ? new Absent("not settled") : a.restingAmps());
        }
        return t;
    }

    private List<String> softStartLines() {
        List<String> out = new ArrayList<>();
        for (SoftStartResult s : r.softStarts()) {
            String rail = r.rail(s.rail()).name();
            out.add("soft start " + s.name() + " on " + rail + ": " + Numbers.si(s.ohms(), OHMS)
                    + (Double.isInfinite(s.ratedWatts()) ? ", no rating declared" : ", rated " + Numbers.si(s.ratedWatts(), WATTS)));
            if (s.ohms() == 0) {
                out.add("  no resistor: the rail switches straight on");
                out.add("");
                continue;
            }
            String trig = s.thyratron()
                    ? (Double.isNaN(s.triggerTime()) ? "thyratron did not fire within the run" : "thyratron fired at " + Numbers.si(s.triggerTime(), SECONDS))
                    : (Double.isNaN(s.triggerTime()) ? "delay beyond the run" : "delay of " + Numbers.si(s.triggerTime(), SECONDS));
            if (!s.covers().isEmpty()) {
                out.add("  covers    " + String.join(", ", s.covers()) + "; the rest of rail " + rail
                        + " is fed ahead of the resistor");
            }
            out.add("  trigger   " + trig);
            out.add("  bypass    " + (s.bypassed() ? "relay closed at " + Numbers.si(s.bypassTime(), SECONDS) : "NOT within the run: the resistor stays in circuit"));
            out.add("  resistor  " + Numbers.si(s.joules(), JOULES) + " dissipated; peak " + Numbers.si(s.peakWatts(), WATTS) + ", mean "
                    + Numbers.si(s.meanWatts(), WATTS) + " while in circuit"
                    + (Double.isInfinite(s.ratedWatts()) ? "" : s.withinRating() ? ": within its rating"
                    : ": OVER its " + Numbers.si(s.ratedWatts(), WATTS) + " rating")
                    + (Double.isInfinite(s.ratedWatts()) ? "" : String.format(Locale.ROOT, " (peak %.1f x rating)", s.peakWatts() / s.ratedWatts())));
            out.add("  rating    by temperature rise, " + String.format(Locale.ROOT, "%.3g x rated power for %.3g s",
                    s.rating().multiple(), s.rating().seconds()) + " (common practice): asks at least "
                    + Numbers.si(s.neededWatts(), WATTS) + " continuous"
                    + (Double.isNaN(s.suggestedWatts()) ? "" : ", a " + Numbers.si(s.suggestedWatts(), WATTS) + " resistor"));
            if (!Double.isNaN(s.contactAmps())) {
                out.add("  contacts  make " + Numbers.si(s.makeAmps(), AMPS) + ", carry " + Numbers.si(s.carryAmps(), AMPS)
                        + " against " + Numbers.si(s.contactAmps(), AMPS) + ": " + (s.contactsOk() ? "ok" : "OVER RATING"));
            }
            BypassDelay.Advice a = adviceFor(s.name());
            if (a != null) {
                out.add("  delay     " + (Double.isNaN(a.settleSeconds()) ? "with the relay held open the current has not settled within "
                        + Numbers.si(Math.max(60, r.options().seconds()), SECONDS)
                        : "with the relay held open the current settles within 2 % of " + Numbers.si(a.restingAmps(), AMPS) + " by "
                        + Numbers.si(a.settleSeconds(), SECONDS) + "; bypassing later gains little, earlier raises the bypass peak"));
            }
            out.add("");
        }
        return out;
    }

    private Table heaters() {
        Table h = new Table("heaters", "heaters")
                .column("tube", "tube", TEXT)
                .column("rated", "rated", VOLTS)
                .column("rated", "rated", AMPS)
                .column("rail", "rail", TEXT)
                .column("string", "string", TEXT)
                .column("position", "pos", COUNT, "place in the string, from 1")
                .column("count", "count", COUNT, "identical strings")
                .column("mixed", "mixed", FLAG, "the string mixes heater types")
                .column("warm", "95 % hot", SECONDS, "when the heater reached 95 % of its operating temperature")
                .column("peak", "peak", VOLTS, "the highest voltage across the heater")
                .column("peak_deviation", "dev", PERCENT, "that voltage against its rating")
                .column("peak_time", "at", SECONDS)
                .column("final", "final", VOLTS, "the voltage across it at the end of the run")
                .column("final", "final", KELVIN, "its temperature at the end of the run");
        for (HeaterWarmup w : r.heaters()) {
            h.row(w.tube(), w.ratedVolts(), w.ratedAmps(), r.rail(w.rail()).name(), w.string(), w.position() + 1, w.count(),
                    w.mixed(), Double.isNaN(w.warmSeconds()) ? new Absent("not yet") : w.warmSeconds(),
                    w.peakVoltRatio() * w.ratedVolts(), 100 * (w.peakVoltRatio() - 1), w.peakVoltTime(), w.finalVolts(),
                    w.finalKelvin());
        }
        return h;
    }

    /** When every cathode emits (all tubes conduct) and what each rail then carries, with its sag from nominal. */
    private String conductLine() {
        double at = r.allEmitSeconds();
        if (Double.isNaN(at)) {
            return "  some cathode does NOT reach its emission threshold within the run: not every tube conducts";
        }
        StringBuilder b = new StringBuilder("  every cathode emits by " + Numbers.si(at, SECONDS) + " (all tubes conduct); then:");
        for (RailTransient rt : r.rails()) {
            if (!rt.hasLoad()) {
                continue;
            }
            int i = 0;
            while (i + 1 < rt.t().length && rt.t()[i] < at) {
                i++;
            }
            double v = rt.busVolts()[i];
            b.append(' ').append(rt.name()).append(' ').append(Numbers.si(rt.amps()[i], AMPS)).append(" at ")
                    .append(Numbers.si(Math.copySign(v, rt.volts()), VOLTS))
                    .append(String.format(Locale.ROOT, " (%+.1f %%),", 100 * (v / Math.abs(rt.volts()) - 1)));
        }
        b.setLength(b.length() - 1);
        return b.toString();
    }

    private List<String> heaterLines() {
        List<String> out = new ArrayList<>();
        double all = r.allWarmSeconds();
        out.add("  every heater at 95 % of operating temperature " + (Double.isNaN(all) ? "NOT within the run" : "by " + Numbers.si(all, SECONDS)));
        out.add(conductLine());
        HeaterWarmup worst = r.worstMixedOverVoltage();
        if (worst == null) {
            out.add("  no string mixes heater types");
        } else {
            out.add("  worst over-voltage in a mixed string: " + worst.tube() + " in " + worst.string() + ", "
                    + Numbers.si(worst.peakVoltRatio() * worst.ratedVolts(), VOLTS)
                    + String.format(Locale.ROOT, " (%+.1f %% of rated)", 100 * (worst.peakVoltRatio() - 1)) + " at "
                    + Numbers.si(worst.peakVoltTime(), SECONDS)
                    + (worst.peakVoltRatio() > 1.10 ? ": beyond the +10 % of common practice" : ""));
        }
        for (HeaterWarmup w : r.heaters()) {
            if (w.finalVolts() > 1.10 * w.ratedVolts()) {
                out.add("  WARNING: " + w.tube() + " in " + w.string() + " settles at " + Numbers.si(w.finalVolts(), VOLTS) + " on a "
                        + Numbers.si(w.ratedVolts(), VOLTS) + " heater");
            }
        }
        out.add("");
        return out;
    }


    private List<String> plotLines(int plotWidth, CurrentPlot.Style style) {
        List<String> out = new ArrayList<>();
        for (RailTransient rt : r.rails()) {
            if (!rt.hasLoad() || rt.t().length == 0) {
                continue;
            }
            if (!(rt.worstPeak() > 0)) {
                out.add("rail " + rt.name() + ": no current during the run");
                out.add("");
                continue;
            }
            List<CurrentPlot.Marker> marks = new ArrayList<>();
            if (!Double.isNaN(rt.bypassTime())) {
                marks.add(new CurrentPlot.Marker(rt.bypassTime(), "bypass " + Numbers.si(rt.bypassTime(), SECONDS)));
            }
            out.addAll(CurrentPlot.render(rt.t(), rt.amps(), plotWidth, 16,
                    "rail " + rt.name() + ": current against time, highest " + Numbers.si(rt.worstPeak(), AMPS),
                    marks, rt.limitAmps(), style));
            out.add("");
        }
        return out;
    }

    private Table models() {
        Table m = new Table("heater_models", "heater models (radiation balanced at rated power, heat capacity from the warm-up test)")
                .column("tube", "tube", TEXT)
                .column("rated", "rated", VOLTS)
                .column("rated", "rated", AMPS)
                .column("cold_hot_ratio", "cold/hot", NUMBER, "hot resistance over cold resistance")
                .column("radiation_w_per_k4", "k W/K^4", NUMBER, "radiated power = k (T^4 - T_ambient^4)")
                .column("heat_capacity_j_per_k", "C J/K", NUMBER, "heat capacity of the heater")
                .column("warmup", "warm-up", SECONDS, "the tube's warm-up time")
                .column("warmup_declared", "declared", FLAG, "no: assumed (see the notes)");
        for (HeaterModel hm : r.models()) {
            m.row(hm.tube(), hm.rating().volts(), hm.rating().amps(), hm.coldHotRatio(), hm.radiationK(), hm.heatCapacity(),
                    hm.warmupSeconds(), hm.warmupDeclared());
        }
        return m;
    }

    private static String f0(double v) {
        return String.format(Locale.ROOT, "%.0f", v);
    }
}
