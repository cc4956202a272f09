package org.thermion.levels;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.thermion.circuit.DcResult;
import org.thermion.circuit.NetAnalysis;
import org.thermion.circuit.TubeDissipation;
import org.thermion.circuit.WorstMargin;
import org.thermion.model.HeaterString;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.power.Budget;
import org.thermion.power.HeaterAnalysis;

/**
 * What {@code check} says about a machine's electrical design: a net whose worst-case margin is
 * negative (an error) or below the declared minimum (a warning); a coil that does not reach its
 * pick-up current at its worst corner, or stays above its drop-out current when it must release;
 * a lamp outside ±{@value #LAMP_BAND_PERCENT} % of its rated current (common practice); a tube
 * over its plate or screen rating; a series heater string with a heater outside ±10 % of its
 * rating at the rail's voltage under the machine's heaviest static load (common practice).
 */
public final class ElectricalCheck {
    /** A lamp is judged within ± this share of its rated current (common practice). */
    public static final int LAMP_BAND_PERCENT = 10;

    private ElectricalCheck() {
    }

    /** Every finding, nets worst first, then drivers, tubes and heater strings. */
    public static List<Finding> findings(Machine m, LevelAnalysis a) {
        List<Finding> out = new ArrayList<>();
        margins(a, out);
        drives(a, out);
        ratings(a, out);
        heaters(m, out);
        return out;
    }

    private static void margins(LevelAnalysis a, List<Finding> out) {
        for (NetLevel n : a.nets()) {
            if (n.high() == null && n.restoring() && n.loads() > 0 && n.voh() - n.vol() < 2 * a.minMargin()) {
                // no margin of its own (it feeds diode gates or followers), yet its output hardly moves
                out.add(new Finding(true, "swing", n.use(), -1, "net '" + n.name() + "' (" + n.stage()
                        + ") swings only from " + v(n.vol()) + " to " + v(n.voh()) + " at nominal values, less than "
                        + "twice the minimum margin (" + v(2 * a.minMargin()) + "): the stage does not switch at "
                        + "these rails", "check the stage's grid dividers against the bias rail, or use another stage"));
                continue;
            }
            WorstMargin w = n.worse();
            if (w == null || n.stage().isEmpty() || !(w.worst() < a.minMargin())) {
                continue;
            }
            boolean high = w.side() == WorstMargin.Side.HIGH;
            String levels = high ? "V_OH " + v(n.voh()) + " against V_IH " + v(n.vih())
                    : "V_OL " + v(n.vol()) + " against V_IL " + v(n.vil());
            String msg = "net '" + n.name() + "' (" + n.stage() + ", " + n.loads() + " load" + (n.loads() == 1 ? "" : "s")
                    + ": " + n.receivers() + ") has a worst-case " + (high ? "high" : "low") + " noise margin of "
                    + v(w.worst()) + (w.worst() < 0 ? "" : ", below the minimum " + v(a.minMargin())) + " at "
                    + w.corner().describe() + " (nominal " + v(w.nominal()) + "; " + levels + " nominal)";
            String fix;
            if (n.fanOutLimit() > 0 && n.fanOutLimit() < n.loads()) {
                fix = "feed at most " + n.fanOutLimit() + " " + n.limitKind() + " inputs from it (buffer the rest through a "
                        + "cathode follower), or use a stronger driving stage";
            } else if (n.fanOutLimit() == 0) {
                fix = "this stage cannot drive even one " + n.limitKind() + " input with that margin: use another "
                        + "driving stage or change the receivers' grid dividers";
            } else {
                fix = high ? "raise the high level (a smaller plate load, a higher B+) or the receivers' dividers"
                        : "lower the low level (a stronger tube, a larger plate load) or move the receivers' dividers";
            }
            out.add(new Finding(w.worst() < 0, "margin", n.use(), -1, msg, fix));
        }
    }

    private static void drives(LevelAnalysis a, List<Finding> out) {
        for (LoadDrive d : a.drives()) {
            if (d.kind() == LoadDrive.Kind.COIL) {
                if (!(d.onWorstAmps() >= d.ratedAmps())) {
                    out.add(new Finding(true, "coil", d.use(), -1, "relay coil of '" + d.name() + "' (" + d.stage()
                            + ") gets " + ma(d.onWorstAmps()) + " at " + d.onCorner().describe() + " (nominal "
                            + ma(d.onAmps()) + ") against its pick-up current of " + ma(d.ratedAmps())
                            + ": it may never pull in",
                            "a coil of lower resistance or current, more tube sections in parallel, or a higher rail"));
                }
                if (d.dropoutAmps() > 0 && d.offWorstAmps() > d.dropoutAmps()) {
                    out.add(new Finding(true, "coil", d.use(), -1, "relay coil of '" + d.name() + "' (" + d.stage()
                            + ") keeps " + ma(d.offWorstAmps()) + " when cut off at " + d.offCorner().describe()
                            + ", above its drop-out current of " + ma(d.dropoutAmps()) + ": it may never release",
                            "cut the tube off harder (a more negative bias at its grid) or use a coil with a higher "
                                    + "drop-out current"));
                }
            } else {
                double dev = d.onAmps() / d.ratedAmps() - 1;
                if (!(Math.abs(dev) <= LAMP_BAND_PERCENT / 100.0)) {
                    out.add(new Finding(true, "lamp", d.use(), -1, "lamp of '" + d.name() + "' (" + d.stage() + ") gets "
                            + ma(d.onAmps()) + " against its rated " + ma(d.ratedAmps()) + " ("
                            + String.format(Locale.ROOT, "%+.0f %%", 100 * dev) + "; within ±" + LAMP_BAND_PERCENT
                            + " % is common practice): " + (dev < 0 ? "under-driven" : "over-driven"),
                            dev < 0 ? "a lamp of lower current or voltage, more tube sections in parallel, or a higher "
                                    + "rail" : "a series resistor or a lamp of higher rating"));
                }
            }
        }
    }

    private static void ratings(LevelAnalysis a, List<Finding> out) {
        List<NetAnalysis> points = a.points();
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (int i = 0; i < points.size(); i++) {
            for (DcResult r : points.get(i).points()) {
                if (!r.solved()) {
                    continue;
                }
                for (TubeDissipation t : r.point().tubes()) {
                    if (!t.overRating()) {
                        continue;
                    }
                    StageUse use = a.pointUses().get(i);
                    if (!seen.add(use + t.label())) {
                        continue;
                    }
                    boolean plate = t.plateWatts() > t.plateRating();
                    out.add(new Finding(true, "rating", use, -1, "tube " + t.tube() + " in stage " + r.point().stage()
                            + " dissipates " + w(plate ? t.plateWatts() : t.screenWatts()) + " per section on its "
                            + (plate ? "plate" : "screen") + ", over its rating of "
                            + w(plate ? t.plateRating() : t.screenRating()),
                            "a larger plate load, a lower rail or a tube of higher rating"));
                }
            }
        }
    }

    /**
     * Series strings at the rail's voltage under the machine's static load: the budget's heater
     * analysis already takes each rail at its loaded voltage ({@code power.LoadedRail}).
     */
    private static void heaters(Machine m, List<Finding> out) {
        if (m.heaterStrings().isEmpty()) {
            return;
        }
        HeaterAnalysis h = new Budget(m).heaters();
        for (HeaterAnalysis.StringResult s : h.strings()) {
            HeaterString hs = s.string();
            if (hs.envelopes().size() < 2) {
                continue;
            }
            Rail rail = m.rails().get(hs.rail());
            for (HeaterAnalysis.Heater x : s.heaters()) {
                if (x.overVoltage() || x.underVoltage()) {
                    out.add(new Finding(true, "heater", null, hs.rule(), "series heater string " + (s.index() + 1)
                            + " on " + rail.name() + ": " + x.designator() + " " + m.tubes().get(x.tube()).name()
                            + " gets " + v(x.volts()) + " against " + v(x.rating().volts()) + " rated ("
                            + String.format(Locale.ROOT, "%+.0f %%", 100 * x.deviation()) + ") with the rail at "
                            + v(s.railVolts()) + " under load (" + v(Math.abs(rail.volts()))
                            + " nominal; within ±10 % is common practice)",
                            x.deviation() > 0 ? "a dropping resistor in the string, or more heaters in series"
                                    : "fewer heaters in the string, or a higher rail"));
                    break;
                }
            }
        }
    }

    static String v(double volts) {
        return String.format(Locale.ROOT, "%.2f V", volts);
    }

    static String ma(double amps) {
        return String.format(Locale.ROOT, "%.2f mA", amps * 1e3);
    }

    static String w(double watts) {
        return String.format(Locale.ROOT, "%.2f W", watts);
    }
}
