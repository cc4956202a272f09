package org.thermion.circuit;

/**
 * Grid current when a grid is positive of its cathode: Ig = K·Vgk^1.5 for Vgk > 0, else 0
 * (grid and cathode treated as a diode, a simplification in common use; REFERENCES.md).
 *
 * @param k      amperes per volt^1.5
 * @param source where K comes from
 */
public record GridCurrentLaw(double k, String source) {

    /** No grid current at all (for tubes whose grid is never driven positive in a model). */
    public static final GridCurrentLaw NONE = new GridCurrentLaw(0, "none");

    /**
     * K matched to the grid path of Koren's published netlists (a 2 kOhm grid resistance in series
     * with a diode, republished with his parameter sets): at Vgk = 1 V both give 0.5 mA.
     */
    public static final GridCurrentLaw KOREN_NETLIST = new GridCurrentLaw(0.5e-3,
            "matched at Vgk = 1 V to the 2 kOhm grid resistance of Koren's 1996 netlists");

    public GridCurrentLaw {
        if (!(k >= 0) || Double.isInfinite(k)) {
            throw new IllegalArgumentException("grid current K must be finite and >= 0: " + k);
        }
    }

    /** Grid current in amperes (grid to cathode) at grid-to-cathode voltage {@code vgk}. */
    public double current(double vgk) {
        return vgk > 0 ? k * vgk * Math.sqrt(vgk) : 0;
    }
}
