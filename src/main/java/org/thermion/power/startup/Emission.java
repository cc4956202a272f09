package org.thermion.power.startup;

/**
 * How much of its steady plate and bias current a stage draws while its cathode warms, and when
 * a thyratron's cathode can fire it.
 *
 * <p>Available emission follows Richardson's law, {@code J ~ T^2 exp(-W / kT)}, of the cathode
 * sleeve's own temperature, relative to its operating temperature. The operating reserve is
 * {@code emissionReserve} times the demand, so {@code x = reserve * J(T)/J(T_op)} is the emission
 * available over what the circuit asks. The <em>emission threshold</em> is {@code x = 1}: the
 * cathode can just supply its circuit (about 85 % of operating temperature with the standard
 * assumptions). A stage draws {@code x / (1 + x^4)^(1/4)}, normalised to 1 at operating
 * temperature: continuous and smooth, so the integrator needs no event for it. A thyratron fires
 * when its cathode crosses the threshold.
 */
public final class Emission {
    private static final double BOLTZMANN_EV = 8.617333262e-5;
    private final double cathodeKelvin;
    private final double wOverK;
    private final double reserve;
    private final double norm;
    private final double threshold;

    public Emission(ThermalAssumptions a) {
        this.cathodeKelvin = a.cathodeKelvin();
        this.wOverK = a.workFunctionEv() / BOLTZMANN_EV;
        this.reserve = a.emissionReserve();
        this.norm = saturate(reserve);
        // reserve * relative(f) rises monotonically in f from 0 to reserve >= 1: bisect for 1.
        double lo = 0.05, hi = 1;
        for (int i = 0; i < 60; i++) {
            double mid = 0.5 * (lo + hi);
            if (reserve * relative(mid) < 1) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        this.threshold = hi;
    }

    /** Emission available at cathode temperature fraction {@code f} relative to operating temperature. */
    private double relative(double f) {
        double tk = f * cathodeKelvin;
        return f * f * Math.exp(-wOverK * (1 / tk - 1 / cathodeKelvin));
    }

    /** Fraction (0..1) of its steady draw a stage takes at cathode temperature fraction {@code f}. */
    public double factor(double f) {
        if (f <= 0) {
            return 0;
        }
        return Math.min(1, saturate(reserve * relative(f)) / norm);
    }

    /** The emission threshold as a fraction of the cathode's operating temperature. */
    public double thresholdFraction() {
        return threshold;
    }

    private static double saturate(double x) {
        double x2 = x * x;
        return x / Math.sqrt(Math.sqrt(1 + x2 * x2));
    }
}
