package org.thermion.cli.report;

/**
 * What a report value measures. A physical unit names CSV and JSON keys (its {@link #word()}
 * is appended to the key: {@code peak} in amps is {@code peak_amps}) and lets text choose one
 * SI prefix per table; values are always carried in the SI base unit.
 */
public enum ReportUnit {
    /** Words: names, states, explanations. */
    TEXT(null, null, false),
    /** Whole numbers: tube counts, cycles, positions. */
    COUNT(null, null, false),
    /** true or false. */
    FLAG(null, null, false),
    /** A plain number without unit (a ratio, a gain). */
    NUMBER(null, "", false),
    VOLTS("volts", "V", true),
    AMPS("amps", "A", true),
    WATTS("watts", "W", true),
    OHMS("ohms", "ohm", true),
    SECONDS("seconds", "s", true),
    JOULES("joules", "J", true),
    FARADS("farads", "F", true),
    HERTZ("hertz", "Hz", true),
    KELVIN("kelvin", "K", false),
    PERCENT("percent", "%", false);

    private final String word;
    private final String symbol;
    private final boolean prefixed;

    ReportUnit(String word, String symbol, boolean prefixed) {
        this.word = word;
        this.symbol = symbol;
        this.prefixed = prefixed;
    }

    /** The unit spelled out for keys ({@code amps}), or null for words, counts and flags. */
    public String word() {
        return word;
    }

    /** The SI symbol for text ({@code A}), or null when the value has none. */
    public String symbol() {
        return symbol;
    }

    /** Whether text may scale the value with an SI prefix (milli, micro, kilo...). */
    public boolean prefixed() {
        return prefixed;
    }

    /** Whether values are numbers (rather than words or flags). */
    public boolean numeric() {
        return this != TEXT && this != FLAG;
    }

    /** {@code key} with this unit's word appended (once), the name CSV and JSON use. */
    public String name(String key) {
        if (word == null || key.equals(word) || key.endsWith("_" + word)) {
            return key;
        }
        return key + "_" + word;
    }
}
