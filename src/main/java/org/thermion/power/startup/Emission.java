package org.thermion.power.startup;

/**
 * How much of its steady plate and bias current a stage draws while its cathode warms.
 *
 * <p>The cathode temperature is taken proportional to the heater's ({@code T_k = f * T_k,op}
 * with {@code f = T_heater / T_hot}). Available emission follows Richardson's law,
 * {@code J ~ T^2 exp(-W / kT)}, relative to operating temperature; a stage draws what its circuit
 * asks once the emission available exceeds it, and the operating reserve is {@code emissionReserve}
 * times the demand. The factor is the smooth saturation
 * {@code x / (1 + x^4)^(1/4)} of {@code x = reserve * J(T)/J(T_op)}, then normalised to 1 at
 * operating temperature: continuous and smooth, so the integrator needs no event for it.
 * With the standard assumptions a stage reaches half its draw at about 80 % of heater temperature.
 */
public final class Emission {
    private static final double BOLTZMANN_EV = 8.617333262e-5;
    private final double cathodeKelvin;
    private final double wOverK;
    private final double reserve;
    private final double norm;

    public Emission(ThermalAssumptions a) {
        this.cathodeKelvin = a.cathodeKelvin();
        this.wOverK = a.workFunctionEv() / BOLTZMANN_EV;
        this.reserve = a.emissionReserve();
        this.norm = saturate(reserve);
    }

    /** Fraction (0..1) of its steady draw a stage takes at heater temperature fraction {@code f}. */
    public double factor(double f) {
        if (f <= 0) {
            return 0;
        }
        double tk = f * cathodeKelvin;
        double rel = f * f * Math.exp(-wOverK * (1 / tk - 1 / cathodeKelvin));
        return Math.min(1, saturate(reserve * rel) / norm);
    }

    private static double saturate(double x) {
        double x2 = x * x;
        return x / Math.sqrt(Math.sqrt(1 + x2 * x2));
    }
}
