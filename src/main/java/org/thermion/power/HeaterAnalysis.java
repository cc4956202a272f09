package org.thermion.power;

import org.thermion.model.Envelope;
import org.thermion.model.HeaterRating;
import org.thermion.model.HeaterRule;
import org.thermion.model.HeaterString;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The voltage each heater really gets. A string is its heaters in series across its rail
 * with the declared dropping resistor, at the rail's voltage under load (the supply check's
 * loaded voltage; the rail's nominal voltage where none is given); each heater's resistance
 * follows a {@link HeaterLaw}: its hot resistance (rated volts over rated amps, held constant),
 * or the tungsten wire's equilibrium at the current it carries. The string current is the one
 * at which the string's resistances take the rail's voltage, and each heater's share is that
 * current times its resistance. Where a string mixes heater currents and the rule
 * declares {@code shunt}, every heater rated below the string's highest current gets a
 * shunt that carries the difference at its rated voltage (R = V / (Imax - I)); shunted,
 * it looks like V / Imax to the string. A parallel heater is a string of one.
 *
 * <p>Checks: heater voltage within {@link #TOLERANCE} of its rating (common practice);
 * over the band is an error (it shortens heater life), under it a warning (low emission).
 * Mixed currents without shunts are an error. A string whose ratings add up to less than
 * its rail gets a dropping-resistor suggestion sized for the string's design current.
 *
 * <p>Attribution: a string's rail current is shared among its heaters in proportion to the
 * voltage each drops, so a string spanning modules charges each module its own share and
 * the module shares add up to the rail total (dropping-resistor losses included).
 */
public final class HeaterAnalysis {
    /** Heater voltage band around the rating, common practice. */
    public static final double TOLERANCE = 0.10;
    private static final double SAME = 1e-9;

    /** One heater in a string: what it gets, and its share of the string's rail current. */
    public record Heater(int envelope, String designator, int tube, int module, HeaterRating rating, double volts,
                         double amps, double deviation, double shuntOhms, double shuntWatts, double railAmps) {
        public boolean shunted() {
            return !Double.isNaN(shuntOhms);
        }

        public boolean overVoltage() {
            return deviation > TOLERANCE + SAME;
        }

        public boolean underVoltage() {
            return deviation < -TOLERANCE - SAME;
        }
    }

    /** A dropping resistor that would bring a short string to its rating. */
    public record Suggestion(double ohms, double watts) {
    }

    /**
     * One string's result. {@code amps} flows from the rail through the chain (heaters and
     * their shunts); {@code designAmps} is the highest heater current rated in the string.
     */
    public record StringResult(int index, HeaterString string, double railVolts, double amps, double designAmps,
                               double dropVolts, double dropWatts, boolean mixed, List<Heater> heaters,
                               Suggestion suggestion, List<Finding> findings) {
        /** Power the string takes from its rail, resistors and shunts included. */
        public double watts() {
            return railVolts * amps;
        }

        public double ratedVolts() {
            return heaters.stream().mapToDouble(h -> h.rating().volts()).sum();
        }

        public boolean ok() {
            return findings.stream().noneMatch(Finding::isError);
        }
    }

    private final Machine m;
    private final double[] railVolts;
    private final HeaterLaw law;
    private final StringSolver solver;
    private final List<StringResult> strings;

    /** Every string at its rail's nominal voltage, heaters at their hot resistance. */
    public HeaterAnalysis(Machine m) {
        this(m, nominalVolts(m), HeaterLaw.HOT);
    }

    /** Every string at {@code railVolts} (magnitudes, by rail), heater resistance by {@code law}. */
    public HeaterAnalysis(Machine m, double[] railVolts, HeaterLaw law) {
        this.m = m;
        this.railVolts = railVolts.clone();
        this.law = law;
        this.solver = new StringSolver(m, law);
        List<StringResult> out = new ArrayList<>();
        for (int i = 0; i < m.heaterStrings().size(); i++) {
            out.add(analyse(i, m.heaterStrings().get(i)));
        }
        strings = List.copyOf(out);
    }

    /** The rails' nominal voltages, magnitudes. */
    public static double[] nominalVolts(Machine m) {
        double[] v = new double[m.rails().size()];
        for (int r = 0; r < v.length; r++) {
            v[r] = Math.abs(m.rails().get(r).volts());
        }
        return v;
    }

    /** The heater current {@code rail}'s strings would draw at {@code volts} (magnitude), by the same law. */
    public double railAmpsAt(int rail, double volts) {
        return solver.railAmpsAt(rail, volts);
    }

    /** The law the heaters' resistances follow. */
    public HeaterLaw law() {
        return law;
    }

    public List<StringResult> strings() {
        return strings;
    }

    /** Heater current the rail delivers to all its strings. */
    public double railAmps(int rail) {
        return strings.stream().filter(s -> s.string().rail() == rail).mapToDouble(StringResult::amps).sum();
    }

    /** Heater power the rail delivers, resistors and shunts included. */
    public double railWatts(int rail) {
        return strings.stream().filter(s -> s.string().rail() == rail).mapToDouble(StringResult::watts).sum();
    }

    /** A module's share of a rail's heater current. */
    public double moduleAmps(int module, int rail) {
        shares();
        return module >= 0 && module < shareAmps.length && rail >= 0 && rail < shareAmps[module].length
                ? shareAmps[module][rail] : 0;
    }

    /** A module's share of heater power, all rails. */
    public double moduleWatts(int module) {
        shares();
        return module >= 0 && module < shareWatts.length ? shareWatts[module] : 0;
    }

    /** Strings with at least one heater in a module (a string spanning modules counts in each). */
    public int moduleStrings(int module) {
        shares();
        return module >= 0 && module < shareStrings.length ? shareStrings[module] : 0;
    }

    // Per-module shares, summed once over the strings in string and heater order (the order the
    // per-call scans used, so the sums are the same to the last bit). Scanning every string for
    // each module was quadratic in the machine's size.
    private double[][] shareAmps;
    private double[] shareWatts;
    private int[] shareStrings;

    private void shares() {
        if (shareWatts != null) {
            return;
        }
        int modules = m.modules().size();
        int rails = m.rails().size();
        for (StringResult s : strings) {
            rails = Math.max(rails, s.string().rail() + 1);
            for (Heater h : s.heaters()) {
                modules = Math.max(modules, h.module() + 1);
            }
        }
        double[][] amps = new double[modules][rails];
        double[] watts = new double[modules];
        int[] count = new int[modules];
        int[] seenIn = new int[modules];
        java.util.Arrays.fill(seenIn, -1);
        for (StringResult s : strings) {
            int rail = s.string().rail();
            for (Heater h : s.heaters()) {
                int mod = h.module();
                if (mod < 0) {
                    continue;
                }
                amps[mod][rail] += h.railAmps();
                watts[mod] += h.railAmps() * s.railVolts();
                if (seenIn[mod] != s.index()) {
                    seenIn[mod] = s.index();
                    count[mod]++;
                }
            }
        }
        shareAmps = amps;
        shareStrings = count;
        shareWatts = watts;
    }

    /** Every string's findings, in string order. */
    public List<Finding> findings() {
        List<Finding> f = new ArrayList<>();
        for (StringResult s : strings) {
            f.addAll(s.findings());
        }
        return f;
    }

    private StringResult analyse(int index, HeaterString s) {
        double railVolts = this.railVolts[s.rail()];
        List<HeaterRating> ratings = s.ratings();
        int n = ratings.size();
        double design = 0;
        double low = Double.POSITIVE_INFINITY;
        double ratedSum = 0;
        for (HeaterRating r : ratings) {
            design = Math.max(design, r.amps());
            low = Math.min(low, r.amps());
            ratedSum += r.volts();
        }
        boolean mixed = design - low > SAME * design;
        boolean shunts = mixed && s.shunt();
        double[] law = StringSolver.effective(s);
        double amps = solver.stringAmps(s, railVolts, law);
        double[] eff = new double[n];
        double total = s.dropOhms();
        for (int i = 0; i < n; i++) {
            eff[i] = solver.ohms(s, law, i, amps);
            total += eff[i];
        }
        List<Heater> heaters = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            HeaterRating r = ratings.get(i);
            int env = s.envelopes().get(i);
            Envelope e = m.envelopes().get(env);
            double v = amps * eff[i];
            double shunt = shunts && design - r.amps() > SAME * design ? r.volts() / (design - r.amps()) : Double.NaN;
            double shuntWatts = Double.isNaN(shunt) ? Double.NaN : v * v / shunt;
            double share = eff[i] / (total - s.dropOhms());
            heaters.add(new Heater(env, e.designator(), e.tube(), e.module(), r, v,
                    Double.isNaN(shunt) ? amps : v / r.hotOhms(), v / r.volts() - 1, shunt, shuntWatts, share * amps));
        }
        double dropVolts = amps * s.dropOhms();
        Suggestion suggestion = null;
        boolean over = heaters.stream().anyMatch(Heater::overVoltage);
        if (over && ratedSum < railVolts) {
            double excess = railVolts - ratedSum;
            suggestion = new Suggestion(excess / design, excess * design);
        }
        List<Finding> findings = new ArrayList<>();
        String subject = subject(index, s);
        if (mixed && !s.shunt()) {
            StringBuilder need = new StringBuilder();
            for (Heater h : heaters) {
                if (design - h.rating().amps() > SAME * design) {
                    need.append(need.length() == 0 ? "" : "; ").append(h.designator()).append(' ')
                            .append(tubeName(h.tube())).append(" needs ")
                            .append(num(h.rating().volts() / (design - h.rating().amps()))).append(" ohm across it");
                }
            }
            findings.add(new Finding(Finding.Severity.ERROR, subject,
                    "mixes heater currents " + currents(ratings) + " without shunts",
                    "declare `shunt` on the rule and fit the shunts: " + need));
        }
        if (shunts) {
            StringBuilder list = new StringBuilder();
            for (Heater h : heaters) {
                if (h.shunted()) {
                    list.append(list.length() == 0 ? "" : "; ").append(h.designator()).append(' ')
                            .append(tubeName(h.tube())).append(": ").append(num(h.shuntOhms())).append(" ohm, ")
                            .append(num(h.shuntWatts())).append(" W");
                }
            }
            findings.add(new Finding(Finding.Severity.NOTE, subject,
                    "mixes heater currents " + currents(ratings) + "; shunts carry the difference", "fit " + list));
        }
        for (Heater h : heaters) {
            if (h.overVoltage() || h.underVoltage()) {
                String what = h.designator() + " " + tubeName(h.tube()) + " gets " + num(h.volts()) + " V against "
                        + num(h.rating().volts()) + " V rated (" + pct(h.deviation()) + ")";
                String advice = null;
                if (h.overVoltage() && suggestion != null) {
                    advice = (s.dropOhms() > 0 ? "replace the declared " + num(s.dropOhms()) + " ohm with a" : "fit a")
                            + " dropping resistor of " + num(suggestion.ohms()) + " ohm dissipating "
                            + num(suggestion.watts()) + " W (rate it at twice that or more)";
                } else if (h.overVoltage()) {
                    advice = "rearrange the string so its ratings add up to the rail voltage";
                } else {
                    advice = "the string's ratings add up to " + num(ratedSum) + " V on a " + num(railVolts)
                            + " V rail" + (s.dropOhms() > 0 ? " with a " + num(s.dropOhms()) + " ohm dropper" : "")
                            + ": shorten the string";
                }
                HeaterRule rule = s.rule() >= 0 && s.rule() < m.heaterRules().size() ? m.heaterRules().get(s.rule()) : null;
                if (rule != null && rule.series() && n < rule.count()) {
                    advice = "the rule strings " + rule.count() + " in series but only " + n
                            + (n == 1 ? " heater was" : " heaters were") + " left for this string; " + advice
                            + (suggestion != null ? "; declare it with `rest drop " + num(suggestion.ohms())
                            + " ohm` on the rule" : "");
                }
                findings.add(new Finding(h.overVoltage() ? Finding.Severity.ERROR : Finding.Severity.WARNING,
                        subject, what + ", outside the +-" + Math.round(TOLERANCE * 100) + " % band", advice));
            }
        }
        return new StringResult(index, s, railVolts, amps, design, dropVolts, dropVolts * amps, mixed,
                List.copyOf(heaters), suggestion, List.copyOf(findings));
    }

    private String subject(int index, HeaterString s) {
        StringBuilder b = new StringBuilder("heater string ").append(index + 1).append(" on ")
                .append(m.rails().get(s.rail()).name()).append(" (");
        for (int i = 0; i < s.envelopes().size(); i++) {
            Envelope e = m.envelopes().get(s.envelopes().get(i));
            b.append(i == 0 ? "" : " + ").append(e.designator()).append(' ').append(tubeName(e.tube()));
        }
        return b.append(')').toString();
    }

    private String tubeName(int tube) {
        return m.tubes().get(tube).name();
    }

    private static String currents(List<HeaterRating> ratings) {
        return String.join(" and ", ratings.stream().map(r -> num(r.amps()) + " A").distinct().toList());
    }

    /** Three significant figures, no exponent. */
    static String num(double v) {
        double a = Math.abs(v);
        String f = a >= 100 ? "%.0f" : a >= 10 ? "%.1f" : a >= 1 ? "%.2f" : "%.3f";
        return String.format(Locale.ROOT, f, v);
    }

    /** Amperes for a message: mA below 1 A. */
    static String amps(double a) {
        return Math.abs(a) < 1 ? num(a * 1e3) + " mA" : num(a) + " A";
    }

    static String pct(double fraction) {
        return String.format(Locale.ROOT, "%+.1f %%", fraction * 100);
    }
}
