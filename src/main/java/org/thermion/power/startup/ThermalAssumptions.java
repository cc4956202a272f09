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
 *                         (Metson, IEE Proc. C 1958, analyses one at 1020 K; 1050 K used)
 * @param workFunctionEv   effective work function of an oxide cathode, about 1 eV (from memory)
 * @param emissionReserve  available emission at operating temperature over the current a stage
 *                         draws; oxide cathodes are run far below saturation (from memory: "many
 *                         times"), 10 is taken
 */
public record ThermalAssumptions(double hotKelvin, double ambientKelvin, double defaultWarmup, double cathodeKelvin,
                                 double workFunctionEv, double emissionReserve) {

    /** The defaults documented above. */
    public static ThermalAssumptions standard() {
        return new ThermalAssumptions(1400, 293, 11, 1050, 1.0, 10);
    }

    public ThermalAssumptions {
        if (!(hotKelvin > ambientKelvin) || !(ambientKelvin > 0) || !(defaultWarmup > 0) || !(cathodeKelvin > 0)
                || !(workFunctionEv > 0) || !(emissionReserve >= 1)) {
            throw new IllegalArgumentException("thermal assumptions out of range");
        }
    }
}
