package org.thermion.elab;

import java.util.Map;

/** The physical dimensions values can carry, and the unit words for each with their scale. */
enum Unit {
    VOLT, AMPERE, SECOND, FARAD, OHM, WATT;

    static final Map<String, Scaled> WORDS = Map.ofEntries(
            Map.entry("V", new Scaled(VOLT, 1)), Map.entry("mV", new Scaled(VOLT, 1e-3)),
            Map.entry("kV", new Scaled(VOLT, 1e3)),
            Map.entry("A", new Scaled(AMPERE, 1)), Map.entry("mA", new Scaled(AMPERE, 1e-3)),
            Map.entry("uA", new Scaled(AMPERE, 1e-6)),
            Map.entry("s", new Scaled(SECOND, 1)), Map.entry("ms", new Scaled(SECOND, 1e-3)),
            Map.entry("us", new Scaled(SECOND, 1e-6)), Map.entry("ns", new Scaled(SECOND, 1e-9)),
            Map.entry("pF", new Scaled(FARAD, 1e-12)), Map.entry("nF", new Scaled(FARAD, 1e-9)),
            Map.entry("uF", new Scaled(FARAD, 1e-6)),
            Map.entry("ohm", new Scaled(OHM, 1)), Map.entry("k", new Scaled(OHM, 1e3)),
            Map.entry("M", new Scaled(OHM, 1e6)),
            Map.entry("W", new Scaled(WATT, 1)), Map.entry("mW", new Scaled(WATT, 1e-3)));

    /** A unit word's dimension and its factor to SI. */
    record Scaled(Unit unit, double factor) {
    }

    String symbol() {
        return switch (this) {
            case VOLT -> "V";
            case AMPERE -> "A";
            case SECOND -> "s";
            case FARAD -> "F";
            case OHM -> "ohm";
            case WATT -> "W";
        };
    }

    String example() {
        return switch (this) {
            case VOLT -> "V or mV";
            case AMPERE -> "A, mA or uA";
            case SECOND -> "s, ms, us or ns";
            case FARAD -> "pF, nF or uF";
            case OHM -> "ohm, k or M";
            case WATT -> "W or mW";
        };
    }
}
