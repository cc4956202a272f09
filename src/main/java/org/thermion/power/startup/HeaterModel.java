package org.thermion.power.startup;

import org.thermion.model.HeaterRating;

/**
 * Thermal and electrical model of one heater type at one rating.
 *
 * <p>Resistance follows tungsten: {@code R(T) = R_hot * rho(T) / rho(T_hot)} with the table of
 * {@link TungstenResistivity}. When the tube declares its own cold/hot ratio {@code r}, the
 * tungsten curve is rescaled so that it still passes through {@code R_hot} at {@code T_hot} but
 * through {@code R_hot / r} at ambient: {@code R(T) = R_hot * (a + (1 - a) * s(T))}, {@code a = 1/r},
 * {@code s(T) = (rho(T) - rho(T_amb)) / (rho(T_hot) - rho(T_amb))}; with the table's own ratio
 * this is exactly the plain formula. Heater alloys with a lower temperature coefficient than pure
 * tungsten are so represented without moving the operating point.
 *
 * <p>Two thermal bodies: the heater wire ({@code T_h}, heat capacity {@code C}) and the cathode
 * sleeve it heats ({@code T_k}, heat capacity {@code C_k = r C}). The wire passes its heat to the
 * sleeve by radiation across the gap, {@code g (T_h^4 - T_k^4)}; the sleeve radiates to the cold
 * surroundings, {@code k_k (T_k^4 - T_amb^4)}. Both constants are set so that rated power {@code V*I}
 * flows through at the assumed operating temperatures ({@code T_hot} for the wire, {@code T_k,op} for
 * the cathode): rated voltage then gives exactly rated current, and in the steady state the pair
 * loses {@code k (T_h^4 - T_amb^4)} with {@code 1/k = 1/g + 1/k_k} ({@link #radiated}). The heat
 * capacity {@code C} is set by {@link HeaterCalibration} from the warm-up time; {@code r} is an
 * assumption ({@link ThermalAssumptions#cathodeHeatRatio}).
 *
 * <p>Fields: tube type name, the rating wired, operating and ambient temperature, R_hot/R_cold,
 * k in W/K^4, C in J/K, the warm-up time C was calibrated to and whether the tube declared it, the
 * cathode's operating temperature and heat-capacity ratio.
 */
public final class HeaterModel {

    private static final TungstenResistivity RHO = TungstenResistivity.table();

    private final String tube;
    private final HeaterRating rating;
    private final double hotKelvin;
    private final double ambientKelvin;
    private final double coldHotRatio;
    private final double radiationK;
    private final double heatCapacity;
    private final double warmupSeconds;
    private final boolean warmupDeclared;
    private final double rhoAmbient;
    private final double rhoSpan;
    private final double coldFraction;
    private final double cathodeKelvin;
    private final double cathodeRatio;
    private final double couplingK;
    private final double cathodeLossK;
    private final double cathodeHeatCapacity;

    public HeaterModel(String tube, HeaterRating rating, double hotKelvin, double ambientKelvin, double coldHotRatio,
                       double radiationK, double heatCapacity, double warmupSeconds, boolean warmupDeclared,
                       double cathodeKelvin, double cathodeRatio) {
        if (!(cathodeKelvin > ambientKelvin && cathodeKelvin < hotKelvin) || !(cathodeRatio > 0)) {
            throw new IllegalArgumentException("cathode temperature must lie between ambient and the heater's, "
                    + "and its heat-capacity ratio be positive");
        }
        this.tube = tube;
        this.rating = rating;
        this.hotKelvin = hotKelvin;
        this.ambientKelvin = ambientKelvin;
        this.coldHotRatio = coldHotRatio;
        this.radiationK = radiationK;
        this.heatCapacity = heatCapacity;
        this.warmupSeconds = warmupSeconds;
        this.warmupDeclared = warmupDeclared;
        this.rhoAmbient = RHO.at(ambientKelvin);
        this.rhoSpan = RHO.at(hotKelvin) - rhoAmbient;
        this.coldFraction = 1 / coldHotRatio;
        this.cathodeKelvin = cathodeKelvin;
        this.cathodeRatio = cathodeRatio;
        double w = rating.watts();
        this.couplingK = w / (pow4(hotKelvin) - pow4(cathodeKelvin));
        this.cathodeLossK = w / (pow4(cathodeKelvin) - pow4(ambientKelvin));
        this.cathodeHeatCapacity = cathodeRatio * heatCapacity;
    }

    private static double pow4(double x) {
        double x2 = x * x;
        return x2 * x2;
    }

    public String tube() {
        return tube;
    }

    public HeaterRating rating() {
        return rating;
    }

    public double hotKelvin() {
        return hotKelvin;
    }

    public double ambientKelvin() {
        return ambientKelvin;
    }

    public double coldHotRatio() {
        return coldHotRatio;
    }

    public double radiationK() {
        return radiationK;
    }

    public double heatCapacity() {
        return heatCapacity;
    }

    /** Cathode temperature at rated heater power, kelvin. */
    public double cathodeKelvin() {
        return cathodeKelvin;
    }

    /** Heat capacity of the cathode sleeve, J/K. */
    public double cathodeHeatCapacity() {
        return cathodeHeatCapacity;
    }

    public double warmupSeconds() {
        return warmupSeconds;
    }

    public boolean warmupDeclared() {
        return warmupDeclared;
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT, "HeaterModel[%s %.2f V %.3f A, T_hot %.0f K, cold/hot %.2f, k %.4g W/K^4, C %.4g J/K, "
                + "T_k %.0f K, C_k %.4g J/K]", tube, rating.volts(), rating.amps(), hotKelvin, coldHotRatio, radiationK,
                heatCapacity, cathodeKelvin, cathodeHeatCapacity);
    }

    /** A model with unit heat capacity, before calibration. */
    static HeaterModel uncalibrated(String tube, HeaterRating rating, ThermalAssumptions a, double declaredRatio,
                                    double warmup, boolean declared) {
        double ratio = Double.isNaN(declaredRatio) ? RHO.at(a.hotKelvin()) / RHO.at(a.ambientKelvin()) : declaredRatio;
        if (!(ratio > 1)) {
            throw new IllegalArgumentException("tube " + tube + ": cold/hot heater ratio must exceed 1, got " + ratio);
        }
        double t4 = Math.pow(a.hotKelvin(), 4) - Math.pow(a.ambientKelvin(), 4);
        double k = rating.watts() / t4;
        return new HeaterModel(tube, rating, a.hotKelvin(), a.ambientKelvin(), ratio, k, 1.0, warmup, declared,
                a.cathodeKelvin(), a.cathodeHeatRatio());
    }

    /** The same model with another heater heat capacity (the cathode's keeps its ratio). */
    public HeaterModel withHeatCapacity(double c) {
        return new HeaterModel(tube, rating, hotKelvin, ambientKelvin, coldHotRatio, radiationK, c, warmupSeconds,
                warmupDeclared, cathodeKelvin, cathodeRatio);
    }

    public double hotOhms() {
        return rating.hotOhms();
    }

    public double coldOhms() {
        return rating.hotOhms() / coldHotRatio;
    }

    /** Resistance at temperature {@code kelvin}. */
    public double resistance(double kelvin) {
        double s = (RHO.at(kelvin) - rhoAmbient) / rhoSpan;
        return rating.hotOhms() * (coldFraction + (1 - coldFraction) * s);
    }

    /** Power the heater-cathode pair loses in the steady state with the wire at {@code kelvin}, watts. */
    public double radiated(double kelvin) {
        return radiationK * (pow4(kelvin) - pow4(ambientKelvin));
    }

    /** Heat flowing from the wire at {@code wire} to the sleeve at {@code cathode}, watts. */
    public double toCathode(double wire, double cathode) {
        return couplingK * (pow4(wire) - pow4(cathode));
    }

    /** Heat the sleeve at {@code cathode} radiates to the surroundings, watts. */
    public double cathodeRadiated(double cathode) {
        return cathodeLossK * (pow4(cathode) - pow4(ambientKelvin));
    }

    /** Heater wire temperature as a fraction of its operating temperature. */
    public double fraction(double kelvin) {
        return kelvin / hotKelvin;
    }

    /** Cathode temperature as a fraction of its operating temperature. */
    public double cathodeFraction(double kelvin) {
        return kelvin / cathodeKelvin;
    }
}
