package org.thermion.circuit;

/** Argument checks shared by the circuit records: absurd values fail at construction. */
final class Checks {
    private Checks() {
    }

    static void positive(String what, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be finite and > 0: " + v);
        }
    }

    static void finite(String what, double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be finite: " + v);
        }
    }

    /** Plate voltage at which {@link #plausibleTube} reads a model, with the grid at the cathode (and the screen). */
    static final double REFERENCE_VOLTS = 100;
    /** A model passing less than this at the reference point never conducts: a parameter off by powers of ten. */
    static final double LEAST_REFERENCE_AMPS = 1e-6;
    /** A model passing more than this at the reference point is no receiving tube: the same. */
    static final double MOST_REFERENCE_AMPS = 10;

    /**
     * A model's current at {@link #REFERENCE_VOLTS} on the plate (and screen, and across a diode) with the grid at
     * the cathode must lie within a microampere and ten amperes: receiving tubes pass about a milliampere to tens of
     * them there (Koren's 12AX7 set 1.9 mA, the 6AU6 start values 14 mA), so a figure far outside means a parameter
     * typed off by powers of ten, which would leave every circuit on the tube unsolvable or absurd.
     */
    static void plausibleTube(TubeModel m) {
        double amps;
        String where;
        if (m instanceof KorenTriode t) {
            amps = t.plateCurrent(REFERENCE_VOLTS, 0);
            where = "at 100 V on its plate with the grid at the cathode";
        } else if (m instanceof KorenPentode p) {
            amps = p.plateCurrent(REFERENCE_VOLTS, 0, REFERENCE_VOLTS) + p.screenCurrent(0, REFERENCE_VOLTS);
            where = "at 100 V on its plate and screen with the grid at the cathode";
        } else if (m instanceof ChildDiode d) {
            amps = d.current(REFERENCE_VOLTS);
            where = "at 100 V across the diode";
        } else {
            return;
        }
        if (!(amps >= LEAST_REFERENCE_AMPS && amps <= MOST_REFERENCE_AMPS)) {
            throw new IllegalArgumentException("it passes " + String.format(java.util.Locale.ROOT, "%.3g A", amps) + " "
                    + where + ", where a receiving tube passes about a milliampere to tens of them: a figure is off by "
                    + "powers of ten");
        }
    }

    /**
     * A fitted Koren set must stay within what a model line may state (elab's property table: mu up to 1000, ex
     * from 1 to 2, the others up to 10^9): the fit has no such bounds, and can run ex to nothing to pass flat
     * through points that contradict the law (a current that no grid or plate voltage changes).
     */
    static void plausibleFit(TubeModel m) {
        if (m instanceof KorenTriode t) {
            koren(t.mu(), t.ex(), t.kg1(), Double.NaN, t.kp(), t.kvb());
        } else if (m instanceof KorenPentode p) {
            koren(p.mu(), p.ex(), p.kg1(), p.kg2(), p.kp(), p.kvb());
        }
    }

    private static void koren(double mu, double ex, double kg1, double kg2, double kp, double kvb) {
        within("mu", mu, 0, 1e3);
        within("ex", ex, 1, 2);
        within("kg1", kg1, 0, 1e9);
        if (!Double.isNaN(kg2)) {
            within("kg2", kg2, 0, 1e9);
        }
        within("kp", kp, 0, 1e9);
        within("kvb", kvb, 0, 1e9);
    }

    private static void within(String name, double v, double lo, double hi) {
        boolean ok = lo == 0 ? v > 0 && v <= hi : v >= lo && v <= hi;
        if (!ok) {
            throw new IllegalArgumentException("the fit ran " + name + " to " + String.format(java.util.Locale.ROOT,
                    "%.3g", v) + ", outside the " + (lo == 0 ? "0 (excluded)" : String.format(java.util.Locale.ROOT,
                    "%.0f", lo)) + " to " + (hi == 1e9 ? "10^9" : String.format(java.util.Locale.ROOT, "%.0f", hi)) + " a model line may "
                    + "state, so no curve of the law with plausible figures passes near the points");
        }
    }

    static void nonNegative(String what, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be finite and >= 0: " + v);
        }
    }
}
