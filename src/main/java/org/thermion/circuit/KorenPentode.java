package org.thermion.circuit;

/**
 * Pentode section by Koren's 1996 equations: E1 = (Eg2/Kp)·ln(1 + exp(Kp·(1/µ + Eg1/Eg2))),
 * Ip = (E1^Ex / Kg1)·(1 + sgn E1)·atan(Ep/Kvb), Ig2 = (Eg1 + Eg2/µ)^Ex / Kg2 (zero below the
 * screen's cut-off). The same choice of the 1 + sgn E1 form as {@link KorenTriode}. The
 * suppressor is taken as tied to the cathode. With a positive grid the published formulas jump
 * to zero as the screen voltage falls to zero; both currents are multiplied by
 * Eg2²/(Eg2² + 1 V²) so they stay continuous there (our own fix for the solver; it changes the
 * currents by under 0.01 % above 100 V on the screen).
 */
public record KorenPentode(String name, double mu, double ex, double kg1, double kg2, double kp, double kvb,
                           GridCurrentLaw grid, double plateWatts, double screenWatts, String source)
        implements TubeModel {

    public KorenPentode {
        Checks.positive("mu", mu);
        Checks.positive("ex", ex);
        Checks.positive("kg1", kg1);
        Checks.positive("kg2", kg2);
        Checks.positive("kp", kp);
        Checks.positive("kvb", kvb);
    }

    /** Plate current in amperes. */
    public double plateCurrent(double vpk, double vg1k, double vg2k) {
        if (vpk <= 0 || vg2k <= 0) {
            return 0;
        }
        double e1 = vg2k / kp * TubeModel.softplus(kp * (1 / mu + vg1k / vg2k));
        return e1 <= 0 ? 0 : 2 * Math.pow(e1, ex) / kg1 * Math.atan(vpk / kvb) * screenFade(vg2k);
    }

    /** Screen-grid current in amperes. */
    public double screenCurrent(double vg1k, double vg2k) {
        double e = vg1k + vg2k / mu;
        return e <= 0 || vg2k <= 0 ? 0 : Math.pow(e, ex) / kg2 * screenFade(vg2k);
    }

    private static double screenFade(double vg2k) {
        return vg2k * vg2k / (vg2k * vg2k + 1);
    }

    KorenPentode with(double mu, double ex, double kg1, double kg2, double kp, double kvb, String source) {
        return new KorenPentode(name, mu, ex, kg1, kg2, kp, kvb, grid, plateWatts, screenWatts, source);
    }
}
