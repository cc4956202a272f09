package org.thermion.power.startup;

import java.util.Map;

/**
 * What to solve: simulated seconds, soft-start resistor overrides by soft-start name (ohms;
 * 0 removes the resistor), the steady draw assumption, the spacing of recorded samples
 * (0: record nothing but the summary), the thermal assumptions, whether to hold every bypass
 * relay open for the whole run (to see where the current behind the resistors settles), and the
 * short-time overload rating soft-start resistors are judged by.
 */
public record PowerUpOptions(double seconds, Map<String, Double> resistorOhms, DrawMode drawMode, double sampleSeconds,
                             ThermalAssumptions assumptions, boolean holdBypass, ResistorRating resistorRating) {

    /** Shortest and longest run: below 10 ms nothing warms; an hour is far past any warm-up. */
    public static final double MIN_SECONDS = 0.01;
    public static final double MAX_SECONDS = 3600;
    /** Largest soft-start resistor taken, ohms: beyond it no heater would warm at all. */
    public static final double MAX_OHMS = 1e6;

    public PowerUpOptions {
        if (!(seconds >= MIN_SECONDS && seconds <= MAX_SECONDS)) {
            throw new IllegalArgumentException("simulated time must be between 10 ms and 1 h, got " + seconds + " s");
        }
        if (!(sampleSeconds >= 0)) {
            throw new IllegalArgumentException("sample spacing must be zero or positive");
        }
        for (Map.Entry<String, Double> e : resistorOhms.entrySet()) {
            if (!(e.getValue() >= 0 && e.getValue() <= MAX_OHMS)) {
                throw new IllegalArgumentException("soft-start resistor '" + e.getKey()
                        + "' must be between 0 and 1 Mohm, got " + e.getValue() + " ohm");
            }
        }
        resistorOhms = Map.copyOf(resistorOhms);
    }

    /** 30 s, the declared resistors, highest draws, a sample every 10 ms, standard assumptions. */
    public static PowerUpOptions defaults() {
        return new PowerUpOptions(30, Map.of(), DrawMode.HIGHEST, 0.01, ThermalAssumptions.standard(), false,
                ResistorRating.COMMON_PRACTICE);
    }

    public PowerUpOptions withSeconds(double s) {
        return new PowerUpOptions(s, resistorOhms, drawMode, sampleSeconds, assumptions, holdBypass, resistorRating);
    }

    public PowerUpOptions withResistor(String softStart, double ohms) {
        Map<String, Double> m = new java.util.LinkedHashMap<>(resistorOhms);
        m.put(softStart, ohms);
        return new PowerUpOptions(seconds, m, drawMode, sampleSeconds, assumptions, holdBypass, resistorRating);
    }

    public PowerUpOptions withDrawMode(DrawMode d) {
        return new PowerUpOptions(seconds, resistorOhms, d, sampleSeconds, assumptions, holdBypass, resistorRating);
    }

    public PowerUpOptions withSampleSeconds(double s) {
        return new PowerUpOptions(seconds, resistorOhms, drawMode, s, assumptions, holdBypass, resistorRating);
    }

    public PowerUpOptions withHoldBypass(boolean hold) {
        return new PowerUpOptions(seconds, resistorOhms, drawMode, sampleSeconds, assumptions, hold, resistorRating);
    }

    public PowerUpOptions withAssumptions(ThermalAssumptions a) {
        return new PowerUpOptions(seconds, resistorOhms, drawMode, sampleSeconds, a, holdBypass, resistorRating);
    }
}
