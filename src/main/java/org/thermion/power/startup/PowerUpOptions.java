package org.thermion.power.startup;

import java.util.Map;

/**
 * What to solve: simulated seconds, soft-start resistor overrides by soft-start name (ohms;
 * 0 removes the resistor), the steady draw assumption, the spacing of recorded samples
 * (0: record nothing but the summary), the thermal assumptions, and whether to hold every bypass
 * relay open for the whole run (to see where the current behind the resistors settles).
 */
public record PowerUpOptions(double seconds, Map<String, Double> resistorOhms, DrawMode drawMode, double sampleSeconds,
                             ThermalAssumptions assumptions, boolean holdBypass) {

    public PowerUpOptions {
        if (!(seconds > 0) || Double.isInfinite(seconds)) {
            throw new IllegalArgumentException("simulated time must be positive, got " + seconds);
        }
        if (!(sampleSeconds >= 0)) {
            throw new IllegalArgumentException("sample spacing must be zero or positive");
        }
        for (Map.Entry<String, Double> e : resistorOhms.entrySet()) {
            if (!(e.getValue() >= 0) || Double.isInfinite(e.getValue())) {
                throw new IllegalArgumentException("soft-start resistor '" + e.getKey() + "' must be zero or positive ohms");
            }
        }
        resistorOhms = Map.copyOf(resistorOhms);
    }

    /** 30 s, the declared resistors, highest draws, a sample every 10 ms, standard assumptions. */
    public static PowerUpOptions defaults() {
        return new PowerUpOptions(30, Map.of(), DrawMode.HIGHEST, 0.01, ThermalAssumptions.standard(), false);
    }

    public PowerUpOptions withSeconds(double s) {
        return new PowerUpOptions(s, resistorOhms, drawMode, sampleSeconds, assumptions, holdBypass);
    }

    public PowerUpOptions withResistor(String softStart, double ohms) {
        Map<String, Double> m = new java.util.LinkedHashMap<>(resistorOhms);
        m.put(softStart, ohms);
        return new PowerUpOptions(seconds, m, drawMode, sampleSeconds, assumptions, holdBypass);
    }

    public PowerUpOptions withDrawMode(DrawMode d) {
        return new PowerUpOptions(seconds, resistorOhms, d, sampleSeconds, assumptions, holdBypass);
    }

    public PowerUpOptions withSampleSeconds(double s) {
        return new PowerUpOptions(seconds, resistorOhms, drawMode, s, assumptions, holdBypass);
    }

    public PowerUpOptions withHoldBypass(boolean hold) {
        return new PowerUpOptions(seconds, resistorOhms, drawMode, sampleSeconds, assumptions, hold);
    }

    public PowerUpOptions withAssumptions(ThermalAssumptions a) {
        return new PowerUpOptions(seconds, resistorOhms, drawMode, sampleSeconds, a, holdBypass);
    }
}
