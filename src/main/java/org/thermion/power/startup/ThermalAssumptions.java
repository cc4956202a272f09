package org.thermion.power.startup;

/**
 * The assumptions behind every heater's thermal model, in one place so reports can state them.
 *
 * @param hotKelvin        heater wire temperature at rated voltage. Heater wire runs at about
 *                         1300-1500 K while the oxide cathode it heats sits at 1000-1100 K
 *                         (REFERENCES.md, from memory); 1400 K, the middle, is the default, and
 *                         with the tungsten table gives a cold/hot ratio of 7.0
 * @param ambientKelvin    room temperature at switch-on (293 K, the table's first point)
 * @param defaultWarmup    warm-up time, seconds, for tubes that declare none: 11 s, the figure of
 *                         the controlled-warm-up types in REFERENCES.md (from memory); an
 *                         assumption, flagged in reports
 * @param cathodeKelvin    oxide cathode temperature when the heater is at {@code hotKelvin}
 *                         (oxide cathodes run at about 1000-1100 K; Metson, IEE Proc. C 1958,
 *                         analyses one at 1020 K; 1050 K, the middle of the range, is used)
 * @param workFunctionEv   effective work function of an oxide cathode, about 1 eV (from memory)
 * @param emissionReserve  available emission at operating temperature over the current a stage
 *                         draws; oxide cathodes are run far below saturation (from memory: "many
 *                         times"), 10 is taken
 * @param cathodeHeatRatio heat capacity of the cathode sleeve over that of the heater wire. The
 *                         nickel sleeve with its oxide coating and the tungsten heater with its
 *                         alumina insulation are of the same order (from memory: 1-3). The
 *                         warm-up test fixes the heater's heat capacity, not this ratio: 2.25 is
 *                         fitted so that the library's 2D21 on its rated heater voltage reaches its emission
 *                         threshold about 10 s after switch-on (observed practice, REFERENCES.md)
 */
public record ThermalAssumptions(double hotKelvin, double ambientKelvin, double defaultWarmup, double cathodeKelvin,
                                 double workFunctionEv, double emissionReserve, double cathodeHeatRatio) {

    /** The defaults documented above. */
    public static ThermalAssumptions standard() {
        return new ThermalAssumptions(1400, 293, 11, 1050, 1.0, 10, 2.25);
    }

    public ThermalAssumptions {
        if (!(hotKelvin > ambientKelvin) || !(ambientKelvin > 0) || !(defaultWarmup > 0) || !(cathodeKelvin > 0)
                || !(workFunctionEv > 0) || !(emissionReserve >= 1) || !(cathodeKelvin < hotKelvin)
                || !(cathodeKelvin > ambientKelvin) || !(cathodeHeatRatio > 0)) {
            throw new IllegalArgumentException("thermal assumptions out of range");
        }
    }

    public ThermalAssumptions withCathodeKelvin(double k) {
        return new ThermalAssumptions(hotKelvin, ambientKelvin, defaultWarmup, k, workFunctionEv, emissionReserve,
                cathodeHeatRatio);
    }

    public ThermalAssumptions withHotKelvin(double k) {
        return new ThermalAssumptions(k, ambientKelvin, defaultWarmup, cathodeKelvin, workFunctionEv, emissionReserve,
                cathodeHeatRatio);
    }

    public ThermalAssumptions withWorkFunction(double ev) {
        return new ThermalAssumptions(hotKelvin, ambientKelvin, defaultWarmup, cathodeKelvin, ev, emissionReserve,
                cathodeHeatRatio);
    }

    public ThermalAssumptions withEmissionReserve(double r) {
        return new ThermalAssumptions(hotKelvin, ambientKelvin, defaultWarmup, cathodeKelvin, workFunctionEv, r,
                cathodeHeatRatio);
    }

    public ThermalAssumptions withCathodeHeatRatio(double r) {
        return new ThermalAssumptions(hotKelvin, ambientKelvin, defaultWarmup, cathodeKelvin, workFunctionEv,
                emissionReserve, r);
    }
}
