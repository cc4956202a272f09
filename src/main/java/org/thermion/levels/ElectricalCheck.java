package org.thermion.levels;

import org.thermion.text.Nouns;
import org.thermion.text.Quantities;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.thermion.circuit.DcResult;
import org.thermion.circuit.NetAnalysis;
import org.thermion.circuit.NoDcSolution;
import org.thermion.circuit.TubeDissipation;
import org.thermion.circuit.WorstMargin;
import org.thermion.model.HeaterString;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.StageType;
import org.thermion.power.Budget;
import org.thermion.power.HeaterAnalysis;

/**
 * What {@code check} says about a machine's electrical design: a stage with no DC solution (why,
 * and the cure); a net whose worst-case margin is negative (an error) or below the declared minimum
 * (a warning); a coil that does not reach its pick-up current at its worst corner (a logic relay
 * stage's, a thyratron's, a soft start's bypass relay), or stays above its drop-out current when it
 * must release; a soft start's coil over its rated voltage (a warning);
 * a lamp outside ±{@value #LAMP_BAND_PERCENT} % of its rated current (common practice); a tube
 * over its plate or screen rating; a series heater string with a heater outside ±10 % of its
 * rating at the rail's voltage under the machine's heaviest static load (common practice).
 */
public final class ElectricalCheck {
    /** Below this a fired thyratron's coil current is the solver's leakage: the tube did not fire. */
    private static final double NEVER_FIRED_AMPS = 1e-6;
    /** A lamp is judged within ± this share of its rated current (common practice). */
    public static final int LAMP_BAND_PERCENT = 10;
    /** A relay coil held continuously above its rated voltage by more than this share runs hot (common practice). */
    public static final int COIL_OVER_PERCENT = 10;

    private ElectricalCheck() {
    }

    /** The rails the analysis stands at: corners name each rail's volts there. */
    private static org.thermion.circuit.RailSet rails(LevelAnalysis a) {
        return a.rails().solver().rails();
    }

    /** Every finding, nets worst first, then drivers, tubes and heater strings. */
    public static List<Finding> findings(Machine m, LevelAnalysis a) {
        List<Finding> out = new ArrayList<>();
        unsolved(a, out);
        margins(a, out);
        drives(a, out);
        ratings(a, out);
        Budget budget = a.rails().budget();
        drawingNothing(m, budget, out);
        supplies(m, budget, a.tolerances().rail(), out);
        heaters(m, budget, out);
        return out;
    }

    /**
     * A stage with neither a circuit nor draw lines counts as drawing nothing in the budget, the
     * supply check and power-up: a warning at its first use.
     */
    private static void drawingNothing(Machine m, Budget budget, List<Finding> out) {
        java.util.Set<Integer> seen = new java.util.HashSet<>();
        List<StageUse> uses = new ArrayList<>();
        List<Integer> stages = new ArrayList<>();
        for (org.thermion.model.Gate g : m.netlist().gates()) {
            uses.add(new StageUse(false, g.id()));
            stages.add(g.stage());
        }
        List<org.thermion.model.Latch> latches = m.netlist().latches();
        for (int i = 0; i < latches.size(); i++) {
            uses.add(new StageUse(true, i));
            stages.add(latches.get(i).stage());
        }
        for (int i = 0; i < uses.size(); i++) {
            int s = stages.get(i);
            if (s < 0 || !seen.add(s)) {
                continue;
            }
            StageType st = m.stages().get(s);
            if (budget.draw().drawsNothing(st)) {
                out.add(new Finding(false, "draws", uses.get(i), -1, "stage " + st.name()
                        + " has neither a circuit nor draw lines: budget, power-up and the supply check count it as "
                        + "drawing nothing from any rail",
                        "describe its circuit (tube, load, grid network) or give its currents with `draw` lines"));
            }
        }
    }

    /**
     * A rail feeding stages whose source resistance drops it, at the static peak load, further
     * than the rail tolerance: an error at the rail. Levels are figured at the loaded rails only
     * within it ({@link RailsUnderLoad}).
     */
    private static void supplies(Machine m, Budget budget, double tolerance, List<Finding> out) {
        for (Budget.Supply s : budget.supply()) {
            Rail rail = m.rails().get(s.rail());
            if (Double.isNaN(RailsUnderLoad.sagPast(rail, s, tolerance))) {
                continue;
            }
            double nominal = Math.abs(rail.volts());
            double loaded = Math.abs(s.voltsAtPeak());
            // the loads are conductances: at the nominal voltage they would draw this much
            double atNominal = loaded > 0 ? s.peakAmps() * nominal / loaded : nominal / rail.sourceOhms();
            double stiff = tolerance * nominal / atNominal;
            double sign = Math.signum(rail.volts()); // a negative rail is figured on its magnitude, told signed
            out.add(Finding.atRail(true, "supply", s.rail(), "rail " + rail.name() + " sags to " + v(sign * loaded)
                    + " under its peak load (" + ma(atNominal) + " at " + v(sign * nominal) + " nominal, behind "
                    + Quantities.ohms(rail.sourceOhms()) + " of source): " + String.format(Locale.ROOT, "%.1f %%",
                    100 * (nominal - loaded) / nominal) + " down, past its "
                    + String.format(Locale.ROOT, "±%.0f %%", 100 * tolerance) + " tolerance (levels and margins stand at "
                    + "the declared voltages until it holds)",
                    "a stiffer supply (a source resistance of " + Quantities.ohms(stiff) + " or less holds it within "
                            + String.format(Locale.ROOT, "%.0f %%", 100 * tolerance) + " at this load), or less load on it"));
        }
    }

    /** A stage use with no DC solution in some input state, once per use: why, and the cure. */
    private static void unsolved(LevelAnalysis a, List<Finding> out) {
        for (int i = 0; i < a.points().size(); i++) {
            for (DcResult r : a.points().get(i).points()) {
                if (r instanceof NoDcSolution no) {
                    out.add(new Finding(true, "nodc", a.pointUses().get(i), -1, "stage " + no.stage()
                            + " has no DC solution at the machine's rails: " + no.reason(), no.fix()));
                    break;
                }
            }
        }
        for (LoadDrive d : a.drives()) {
            if (d.unsolved() != null) {
                out.add(new Finding(true, "nodc", d.use(), -1, d.softStart(), "stage " + d.stage() + " driving "
                        + (d.use() == null ? "the bypass relay of soft start '" : "'") + d.name()
                        + "' has no DC solution at the machine's rails: " + d.unsolved().reason(), d.unsolved().fix()));
            }
        }
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
            if (Double.isInfinite(w.worst())) {
                out.add(new Finding(true, "nodc", n.use(), -1, "stage " + n.stage() + " driving net '" + n.name()
                        + "' has a DC solution at nominal values but none at the tolerance corner " + w.corner().describe(rails(a))
                        + " (nominal " + (w.side() == WorstMargin.Side.HIGH ? "high" : "low") + " margin "
                        + v(w.nominal()) + "): the circuit is on the edge of what its parts allow",
                        "run `thermion levels` for the net's figures; give the stage's rails and loads more room"));
                continue;
            }
            boolean high = w.side() == WorstMargin.Side.HIGH;
            String levels = high ? "V_OH " + v(n.voh()) + " against V_IH " + v(n.vih())
                    : "V_OL " + v(n.vol()) + " against V_IL " + v(n.vil());
            String msg = "net '" + n.name() + "' (" + n.stage() + ", " + Nouns.count(n.loads(), "load")
                    + ": " + n.receivers() + ") has a worst-case " + (high ? "high" : "low") + " noise margin of "
                    + v(w.worst()) + (w.worst() < 0 ? "" : ", below the minimum " + v(a.minMargin())) + " at "
                    + w.corner().describe(rails(a)) + " (nominal " + v(w.nominal()) + "; " + levels + " nominal)";
            String fix;
            if (n.fanOutLimit() > 0 && n.fanOutLimit() < n.loads()) {
                fix = "feed at most " + n.fanOutLimit() + " " + n.limitKind() + " " + Nouns.agree(n.fanOutLimit(), "input") + " from it (buffer the rest through a "
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
            if (d.unsolved() != null) {
                continue; // reported as having no DC solution
            }
            if (d.kind() == LoadDrive.Kind.COIL) {
                coil(d, rails(a), out);
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

    /** A relay coil: pick-up at its worst corner, drop-out when cut off, a soft start's coil against its rating. */
    private static void coil(LoadDrive d, org.thermion.circuit.RailSet at, List<Finding> out) {
        String what = d.use() == null ? "bypass relay coil of soft start '" + d.name() + "' (driven by " + d.stage() + ")"
                : "relay coil of '" + d.name() + "' (" + d.stage() + ")";
        if (Double.isNaN(d.ratedAmps())) {
            out.add(new Finding(false, "coil", d.use(), -1, d.softStart(), what + " is a plain "
                    + Quantities.ohms(d.coilOhms()) + " resistor: its pick-up current is not stated, so whether it pulls in "
                    + "(" + ma(d.onAmps()) + " nominal) cannot be judged",
                    "write the load as `load coil " + Quantities.ohms(d.coilOhms()) + " pickup <amps> from <rail>`"));
            return;
        }
        if (!(d.onWorstAmps() >= d.ratedAmps())) {
            double share = d.onWorstAmps() / d.ratedAmps();
            String volts = Double.isNaN(d.coilOhms()) ? "" : " (" + v(d.onWorstAmps() * d.coilOhms()) + " across it against "
                    + v(d.ratedAmps() * d.coilOhms()) + " to pick up)";
            String fix;
            if (d.follower()) {
                fix = "a cathode follower gives its load at most the grid's swing less the grid-to-cathode voltage: put "
                        + "the coil in the plate circuit of a stage that cuts off and saturates, or use a coil that picks "
                        + "up at " + ma(d.onWorstAmps() * 0.9) + " or less";
            } else if (d.use() == null && d.onWorstAmps() < NEVER_FIRED_AMPS) {
                fix = "its thyratron never fires: stage " + d.stage() + "'s grid network (input on the highest rail, as "
                        + "the wire list wires it) holds the grid below its critical voltage; raise the grid with a "
                        + "smaller series resistor or a larger one to the bias rail";
            } else if (d.use() == null) {
                fix = "a smaller `series` plate resistor in stage " + d.stage() + ", a coil of lower pick-up voltage, or a "
                        + "higher rail";
            } else if (d.onWorstAmps() < NEVER_FIRED_AMPS) {
                fix = "stage " + d.stage() + " never conducts here: its grid network never lifts the grid to where the "
                        + "tube turns on (for a thyratron, its critical grid voltage); a smaller series resistor or a larger "
                        + "one to the bias rail in its grid network";
            } else {
                fix = "a coil of lower resistance or current, more tube sections in parallel, or a higher rail";
            }
            out.add(new Finding(true, "coil", d.use(), -1, d.softStart(), what + " gets " + ma(d.onWorstAmps())
                    + volts + " at " + d.onCorner().describe(at) + " (nominal " + ma(d.onAmps()) + "), "
                    + String.format(Locale.ROOT, "%.0f %%", 100 * share) + " of its pick-up current of "
                    + ma(d.ratedAmps()) + ": it may never pull in", fix));
        }
        if (d.dropoutAmps() > 0 && d.offWorstAmps() > d.dropoutAmps()) {
            out.add(new Finding(true, "coil", d.use(), -1, what + " keeps " + ma(d.offWorstAmps()) + " when cut off at "
                    + d.offCorner().describe(at) + ", above its drop-out current of " + ma(d.dropoutAmps())
                    + ": it may never release",
                    "cut the tube off harder (a more negative bias at its grid) or use a coil with a higher "
                            + "drop-out current"));
        }
        double coilVolts = d.onAmps() * d.coilOhms();
        if (d.ratedVolts() > 0 && coilVolts > (1 + COIL_OVER_PERCENT / 100.0) * d.ratedVolts()) {
            out.add(new Finding(false, "coil", d.use(), -1, d.softStart(), what + " gets " + v(coilVolts)
                    + " at nominal values against its rated " + v(d.ratedVolts()) + " (more than +" + COIL_OVER_PERCENT
                    + " % is common practice's limit for continuous duty): it runs hot",
                    "a larger series plate resistor, or a coil rated for the rail"));
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
    private static void heaters(Machine m, Budget budget, List<Finding> out) {
        if (m.heaterStrings().isEmpty()) {
            return;
        }
        HeaterAnalysis h = budget.heaters();
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

    /** A current in its own unit (uA, mA or A), so no figure reads 0.00 or 100000.00. */
    static String ma(double amps) {
        return Quantities.amps(amps);
    }

    static String w(double watts) {
        return Math.abs(watts) < 0.1 ? String.format(Locale.ROOT, "%.1f mW", watts * 1e3)
                : String.format(Locale.ROOT, "%.2f W", watts);
    }
}
