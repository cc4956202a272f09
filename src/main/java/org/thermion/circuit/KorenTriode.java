package org.thermion.circuit;

/**
 * Triode section by Koren's 1996 equations (N. Koren, "Improved vacuum tube models for SPICE
 * simulations", Glass Audio 1996): E1 = (Ep/Kp)·ln(1 + exp(Kp·(1/µ + Eg/√(Kvb + Ep²)))),
 * Ip = (E1^Ex / Kg1)·(1 + sgn E1). We use this form (the factor 1 + sgn E1 is 2 when the
 * tube conducts), not the republished variant that divides by 2·Kg1: with the published 12AU7
 * set only this form reproduces the data sheet's 10.5 mA at 250 V, −8.5 V (KorenTriodeTest).
 *
 * @param plateWatts rated plate dissipation per section (NaN when unknown)
 */
public record KorenTriode(String name, double mu, double ex, double kg1, double kp, double kvb,
                          GridCurrentLaw grid, double plateWatts, String source) implements TubeModel {

    public KorenTriode {
        Checks.positive("mu", mu);
        Checks.positive("ex", ex);
        Checks.positive("kg1", kg1);
        Checks.positive("kp", kp);
        Checks.positive("kvb", kvb);
    }

    /** Plate current in amperes at plate-to-cathode {@code vpk} and grid-to-cathode {@code vgk}. */
    public double plateCurrent(double vpk, double vgk) {
        if (vpk <= 0) {
            return 0;
        }
        double e1 = vpk / kp * TubeModel.softplus(kp * (1 / mu + vgk / Math.sqrt(kvb + vpk * vpk)));
        return e1 <= 0 ? 0 : 2 * Math.pow(e1, ex) / kg1;
    }

    /** The same set with other parameters (used by the fitter). */
    KorenTriode with(double mu, double ex, double kg1, double kp, double kvb, String source) {
        return new KorenTriode(name, mu, ex, kg1, kp, kvb, grid, plateWatts, source);
    }
}
