package org.thermion.power;

import org.thermion.model.HeaterRating;
import org.thermion.model.HeaterString;
import org.thermion.model.Machine;

import java.util.List;

/**
 * The current of a heater string at a voltage when each heater's resistance follows a
 * {@link HeaterLaw}: a shunted heater shows the string a fixed resistance, every other one the
 * law's at the string current. Identical strings are solved once per rail (the loaded-rail
 * solve asks a rail's heater current at many voltages).
 */
final class StringSolver {
    private static final double SAME = 1e-9;

    private final Machine m;
    private final HeaterLaw law;

    StringSolver(Machine m, HeaterLaw law) {
        this.m = m;
        this.law = law;
    }

    /** The heater current {@code rail}'s strings draw at {@code volts} (magnitude). */
    double railAmpsAt(int rail, double volts) {
        if (kinds == null) {
            kinds = new java.util.LinkedHashMap<>();
            for (HeaterString s : m.heaterStrings()) {
                StringBuilder key = new StringBuilder().append(s.rail()).append('|').append(s.dropOhms()).append('|')
                        .append(s.shunt());
                for (int i = 0; i < s.envelopes().size(); i++) {
                    key.append('|').append(m.envelopes().get(s.envelopes().get(i)).tube()).append(':')
                            .append(s.ratings().get(i));
                }
                kinds.computeIfAbsent(key.toString(), k -> new java.util.ArrayList<>()).add(s);
            }
        }
        double a = 0;
        for (List<HeaterString> same : kinds.values()) {
            HeaterString s = same.get(0);
            if (s.rail() == rail) {
                a += same.size() * stringAmps(s, volts, effective(s));
            }
        }
        return a;
    }

    // Identical strings (rail, dropper, shunt flag, tubes and ratings in order), found once: a
    // rail's current is asked at many voltages while its loaded voltage is solved.
    private java.util.Map<String, List<HeaterString>> kinds;

    /**
     * Per heater of the string: -1 where its resistance follows the law, else the fixed resistance
     * a shunted heater shows the string (rated volts over the string's design current).
     */
    static double[] effective(HeaterString s) {
        List<HeaterRating> ratings = s.ratings();
        double design = 0;
        double low = Double.POSITIVE_INFINITY;
        for (HeaterRating r : ratings) {
            design = Math.max(design, r.amps());
            low = Math.min(low, r.amps());
        }
        boolean shunts = design - low > SAME * design && s.shunt();
        double[] eff = new double[ratings.size()];
        for (int i = 0; i < eff.length; i++) {
            eff[i] = shunts ? ratings.get(i).volts() / design : -1;
        }
        return eff;
    }

    /** Ohms of heater {@code i} of the string at string current {@code amps}. */
    double ohms(HeaterString s, double[] eff, int i, double amps) {
        return eff[i] >= 0 ? eff[i] : law.ohms(m.envelopes().get(s.envelopes().get(i)).tube(), s.ratings().get(i), amps);
    }

    /**
     * The string current at {@code volts}: the root of I (R_drop + sum R_i(I)) = V, found by
     * bisection (each R_i grows with its current, so the left side rises monotonically).
     */
    double stringAmps(HeaterString s, double volts, double[] eff) {
        if (law == HeaterLaw.HOT) {
            double total = s.dropOhms();
            for (int i = 0; i < eff.length; i++) {
                total += eff[i] >= 0 ? eff[i] : s.ratings().get(i).hotOhms();
            }
            return volts / total;
        }
        double lo = 0;
        double hi = 0;
        for (int i = 0; i < eff.length; i++) {
            hi = Math.max(hi, 4 * s.ratings().get(i).amps());
        }
        hi = Math.max(hi, volts / Math.max(s.dropOhms(), 1e-9));
        for (int k = 0; k < 100 && hi - lo > 1e-10 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            double v = mid * s.dropOhms();
            for (int i = 0; i < eff.length; i++) {
                v += mid * ohms(s, eff, i, mid);
            }
            if (v > volts) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

}
