package org.thermion.circuit;

/**
 * One part of a DC circuit between numbered nodes (public so that a netlist writer can read
 * the parts a stage is solved with; see {@link StageNetlist}). {@link #addCurrents} adds, for every node it
 * touches, the current flowing out of that node into the part; the solver drives each free
 * node's sum to zero (Kirchhoff's current law).
 */
public sealed interface Element permits Element.Resistor, Element.Lamp, Element.Triode, Element.Pentode,
        Element.Diode, Element.Grid, Element.Arc {

    /** Leakage across every tube path so that a cut-off tube never leaves a singular Jacobian. */
    double GMIN = 1e-12;

    String label();

    void addCurrents(double[] v, double[] out);

    /** Node pairs the part joins for DC, flattened (grid paths excluded): the floating-node check. */
    int[] conductiveEnds();

    /** Every node the part's currents depend on or flow into: its entries in the solver's Jacobian. */
    int[] nodes();

    /** A resistor (also a relay coil). */
    record Resistor(String label, int a, int b, double ohms) implements Element {
        public void addCurrents(double[] v, double[] out) {
            double i = (v[a] - v[b]) / ohms;
            out[a] += i;
            out[b] -= i;
        }

        public int[] conductiveEnds() {
            return new int[] {a, b};
        }

        public int[] nodes() {
            return new int[] {a, b};
        }
    }

    /**
     * An incandescent lamp as a voltage-dependent resistor: R(V) = Rcold + (Rhot − Rcold)·(|V|/Vr)^a,
     * Rhot = Vr/Ir, with a chosen so that near the rating I ∝ V^0.55 (the usual tungsten-lamp rule,
     * from memory) and the cold resistance Rhot/coldRatio at zero volts.
     */
    record Lamp(String label, int a, int b, double ratedVolts, double ratedAmps, double coldRatio) implements Element {
        public void addCurrents(double[] v, double[] out) {
            double i = current(v[a] - v[b]);
            out[a] += i;
            out[b] -= i;
        }

        double current(double volts) {
            double hot = ratedVolts / ratedAmps;
            double cold = hot / coldRatio;
            double exponent = 0.45 / (1 - 1 / coldRatio);
            double r = cold + (hot - cold) * Math.pow(Math.abs(volts) / ratedVolts, exponent);
            return volts / r;
        }

        public int[] conductiveEnds() {
            return new int[] {a, b};
        }

        public int[] nodes() {
            return new int[] {a, b};
        }
    }

    /** {@code count} identical triode sections in parallel; grid current by the model's grid law. */
    record Triode(String label, KorenTriode model, int count, int p, int g, int k, double emission) implements Element {
        public void addCurrents(double[] v, double[] out) {
            double ip = count * emission * model.plateCurrent(v[p] - v[k], v[g] - v[k]) + GMIN * (v[p] - v[k]);
            double ig = count * emission * model.grid().current(v[g] - v[k]);
            out[p] += ip;
            out[g] += ig;
            out[k] -= ip + ig;
        }

        public int[] conductiveEnds() {
            return new int[] {p, k};
        }

        public int[] nodes() {
            return new int[] {p, g, k};
        }
    }

    /** {@code count} identical pentode sections in parallel, suppressor at the cathode. */
    record Pentode(String label, KorenPentode model, int count, int p, int g1, int g2, int k, double emission)
            implements Element {
        public void addCurrents(double[] v, double[] out) {
            double vg1 = v[g1] - v[k];
            double vg2 = v[g2] - v[k];
            double ip = count * emission * model.plateCurrent(v[p] - v[k], vg1, vg2) + GMIN * (v[p] - v[k]);
            double is = count * emission * model.screenCurrent(vg1, vg2) + GMIN * vg2;
            double ig = count * emission * model.grid().current(vg1);
            out[p] += ip;
            out[g2] += is;
            out[g1] += ig;
            out[k] -= ip + is + ig;
        }

        public int[] conductiveEnds() {
            return new int[] {p, k, g2, k};
        }

        public int[] nodes() {
            return new int[] {p, g1, g2, k};
        }
    }

    /** A vacuum diode, anode {@code a} to cathode {@code k}. */
    record Diode(String label, ChildDiode model, int a, int k, double emission) implements Element {
        public void addCurrents(double[] v, double[] out) {
            double i = emission * model.current(v[a] - v[k]) + GMIN * (v[a] - v[k]);
            out[a] += i;
            out[k] -= i;
        }

        public int[] conductiveEnds() {
            return new int[] {a, k};
        }

        public int[] nodes() {
            return new int[] {a, k};
        }
    }

    /** A receiving stage's grid seen as a load: grid current into its cathode. */
    record Grid(String label, GridCurrentLaw law, int g, int k, double emission) implements Element {
        public void addCurrents(double[] v, double[] out) {
            double i = emission * law.current(v[g] - v[k]);
            out[g] += i;
            out[k] -= i;
        }

        public int[] conductiveEnds() {
            return new int[0];
        }

        public int[] nodes() {
            return new int[] {g, k};
        }
    }

    /**
     * A thyratron's anode path: when conducting, a constant arc drop with a small incremental
     * resistance (numerical only: it keeps the solve smooth; 0.1 V at 100 mA); else leakage.
     */
    record Arc(String label, GasThyratron model, boolean conducting, int a, int k) implements Element {
        public static final double ARC_OHMS = 1.0;

        public void addCurrents(double[] v, double[] out) {
            double vak = v[a] - v[k];
            double i = GMIN * vak;
            if (conducting && vak > model.arcDrop()) {
                i += (vak - model.arcDrop()) / ARC_OHMS;
            }
            out[a] += i;
            out[k] -= i;
        }

        public int[] conductiveEnds() {
            return new int[] {a, k};
        }

        public int[] nodes() {
            return new int[] {a, k};
        }
    }
}
