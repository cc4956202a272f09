package org.thermion.elab;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
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

    /** Spellings builders use for unit words Thermion reads, by their lower case; a case slip is found apart. */
    private static final Map<String, String> SPELLINGS = Map.ofEntries(
            Map.entry("volt", "V"), Map.entry("volts", "V"), Map.entry("vdc", "V"), Map.entry("kilovolt", "kV"),
            Map.entry("amp", "A"), Map.entry("amps", "A"), Map.entry("mamp", "mA"), Map.entry("milliamp", "mA"),
            Map.entry("milliamps", "mA"), Map.entry("sec", "s"), Map.entry("secs", "s"), Map.entry("msec", "ms"),
            Map.entry("usec", "us"), Map.entry("nsec", "ns"), Map.entry("ohms", "ohm"), Map.entry("r", "ohm"),
            Map.entry("kohm", "k"), Map.entry("kohms", "k"), Map.entry("kr", "k"), Map.entry("meg", "M"),
            Map.entry("mohm", "M"), Map.entry("megohm", "M"), Map.entry("megohms", "M"), Map.entry("watt", "W"),
            Map.entry("watts", "W"));

    /**
     * The unit word of dimension {@code want} that {@code word} was likely meant as ({@code K} for {@code k},
     * {@code ma} for {@code mA}, {@code kohm}, {@code volts}, {@code meg}); null when none is near.
     */
    static String meant(String word, Unit want) {
        String lower = word.toLowerCase(Locale.ROOT);
        String spelt = SPELLINGS.get(lower);
        if (spelt != null && WORDS.get(spelt).unit() == want) {
            return spelt;
        }
        String found = null;
        for (Map.Entry<String, Scaled> e : WORDS.entrySet()) {
            if (e.getValue().unit() == want && e.getKey().toLowerCase(Locale.ROOT).equals(lower)) {
                if (found != null) {
                    return null; // 'm' could be milli or mega: name neither
                }
                found = e.getKey();
            }
        }
        return found;
    }

    /** The unit word of any dimension that {@code word} was likely meant as, or null (a word that is no unit). */
    static String meant(String word) {
        for (Unit u : values()) {
            String m = meant(word, u);
            if (m != null) {
                return m;
            }
        }
        return null;
    }

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

    /** The plural noun, for messages: "amperes given, volts expected". */
    String plural() {
        return name().toLowerCase(Locale.ROOT) + "s";
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

    /**
     * An SI value written with this unit's own words as a user would write it ({@code 22 k},
     * {@code 2.4 mA}): four significant digits at most, and never a wrapped-around integer.
     */
    String format(double si) {
        if (!Double.isFinite(si)) {
            return (Double.isNaN(si) ? "?" : si > 0 ? "infinite" : "-infinite");
        }
        if (si == 0) {
            return "0 " + baseWord();
        }
        List<Map.Entry<String, Scaled>> words = WORDS.entrySet().stream().filter(e -> e.getValue().unit() == this)
                .sorted(Comparator.comparingDouble(e -> e.getValue().factor())).toList();
        Map.Entry<String, Scaled> pick = words.get(0);
        for (Map.Entry<String, Scaled> e : words) {
            if (Math.abs(si) >= e.getValue().factor() * (1 - 1e-12)) {
                pick = e;
            }
        }
        return number(si / pick.getValue().factor()) + " " + pick.getKey();
    }

    private String baseWord() {
        return this == FARAD ? "pF" : symbol();
    }

    /** A plain number with at most four significant digits; scientific notation outside 1e-3..1e6. */
    static String number(double x) {
        if (!Double.isFinite(x)) {
            return Double.isNaN(x) ? "?" : x > 0 ? "infinite" : "-infinite";
        }
        double a = Math.abs(x);
        BigDecimal d = new BigDecimal(x).round(new MathContext(4)).stripTrailingZeros();
        if (a != 0 && (a >= 1e6 || a < 1e-3)) {
            return d.toString().replace("E+", "e").replace("E", "e");
        }
        return d.toPlainString();
    }
}
