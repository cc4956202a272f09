package org.thermion.power.startup;

import java.util.Map;

/**
 * What to solve: simulated seconds, soft-start resistor overrides by soft-start name (ohms;
 * 0 removes the resistor), the steady draw assumption, the spacing of recorded samples
 * (0: record nothing but the summary) and the thermal assumptions.
 */
public record PowerUpOptions(double seconds, Map<String, Double> resistorOhms, DrawMode drawMode, double sampleSeconds,
                             ThermalAssumptions assumptions) {

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
        return new PowerUpOptions(30, Map.of(), DrawMode.HIGHEST, 0.01, ThermalAssumptions.standard());
    }

    public PowerUpOptions withSeconds(double s) {
        return new PowerUpOptions(s, resistorOhms, drawMode, sampleSeconds, assumptions);
    }

    public PowerUpOptions withResistor(String softStart, double ohms) {
        Map<String, Double> m = new java.util.LinkedHashMap<>(resistorOhms);
        m.put(softStart, ohms);
        return new PowerUpOptions(seconds, m, drawMode, sampleSeconds, assumptions);
    }

    public PowerUpOptions withDrawMode(DrawMode d) {
        return new PowerUpOptions(seconds, resistorOhms, d, sampleSeconds, assumptions);
    }

    public PowerUpOptions withSampleSeconds(double s) {
        return new PowerUpOptions(seconds, resistorOhms, drawMode, s, assumptions);
    }

    public PowerUpOptions withAssumptions(ThermalAssumptions a) {
        return new PowerUpOptions(seconds, resistorOhms, drawMode, sampleSeconds, a);
    }
}
