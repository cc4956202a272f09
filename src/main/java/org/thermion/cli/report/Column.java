package org.thermion.cli.report;

import java.util.regex.Pattern;

/**
 * A table column: its key (CSV header and JSON name, the unit's word appended), its short
 * title for text, its unit, and an optional explanation that text prints under the table.
 */
public record Column(String key, String title, ReportUnit unit, String explanation) {
    private static final Pattern KEY = Pattern.compile("[a-z][a-z0-9]*(_[a-z0-9]+)*");

    public Column {
        if (!KEY.matcher(key).matches()) {
            throw new IllegalArgumentException("report key '" + key + "' is not a lower-case identifier");
        }
    }

    /** The name CSV and JSON carry: the key with the unit spelled out ({@code peak_amps}). */
    public String name() {
        return unit.name(key);
    }

    static boolean validKey(String key) {
        return KEY.matcher(key).matches();
    }
}
