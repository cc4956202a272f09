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
 * <p>Heat leaves by radiation only, {@code P = k (T^4 - T_amb^4)}, with {@code k} set so that the
 * rated power {@code V*I} balances at {@code T_hot}: rated voltage then gives exactly rated current.
 * The heat capacity {@code C} (J/K, constant) is set by {@link HeaterCalibration} from the
 * warm-up time.
 *
 * <p>Fields: tube type name, the rating wired, operating and ambient temperature, R_hot/R_cold,
 * k in W/K^4, C in J/K, the warm-up time C was calibrated to and whether the tube declared it.
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

    public HeaterModel(String tube, HeaterRating rating, double hotKelvin, double ambientKelvin, double coldHotRatio,
                       double radiationK, double heatCapacity, double warmupSeconds, boolean warmupDeclared) {
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

    public double warmupSeconds() {
        return warmupSeconds;
    }

    public boolean warmupDeclared() {
        return warmupDeclared;
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT, "HeaterModel[%s %.2f V %.3f A, T_hot %.0f K, cold/hot %.2f, k %.4g W/K^4, C %.4g J/K]",
                tube, rating.volts(), rating.amps(), hotKelvin, coldHotRatio, radiationK, heatCapacity);
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
        return new HeaterModel(tube, rating, a.hotKelvin(), a.ambientKelvin(), ratio, k, 1.0, warmup, declared);
    }

    /** The same model with another heat capacity. */
    public HeaterModel withHeatCapacity(double c) {
        return new HeaterModel(tube, rating, hotKelvin, ambientKelvin, coldHotRatio, radiationK, c, warmupSeconds,
                warmupDeclared);
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

    /** Net radiated power at {@code kelvin}, watts. */
    public double radiated(double kelvin) {
        double t2 = kelvin * kelvin;
        double a2 = ambientKelvin * ambientKelvin;
        return radiationK * (t2 * t2 - a2 * a2);
    }

    /** Temperature as a fraction of the operating temperature. */
    public double fraction(double kelvin) {
        return kelvin / hotKelvin;
    }
}
