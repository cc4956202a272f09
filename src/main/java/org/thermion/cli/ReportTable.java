package org.thermion.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A report table held as values, so one content renders as aligned text (people), CSV
 * and JSON (tools) alike. Numbers stay in SI base units; text output scales them with
 * {@link Units}, CSV and JSON carry them raw. A NaN number or null is "no value" (text
 * and CSV an empty cell, JSON null).
 */
final class ReportTable {

    /** How a column's values read. */
    enum Kind {
        TEXT, COUNT, VOLTS, AMPS, WATTS, OHMS, PERCENT;

        String text(Object v) {
            if (v == null) {
                return "";
            }
            if (this == TEXT) {
                return v.toString();
            }
            double d = ((Number) v).doubleValue();
            if (Double.isNaN(d)) {
                return "";
            }
            return switch (this) {
                case COUNT -> String.valueOf(((Number) v).longValue());
                case VOLTS -> Units.volts(d);
                case AMPS -> Units.amps(d);
                case WATTS -> Units.watts(d);
                case OHMS -> Units.ohms(d);
                case PERCENT -> String.format(Locale.ROOT, "%+.1f %%", d);
                default -> v.toString();
            };
        }
    }

    /** A column: its key for CSV and JSON, its title for text, its kind. */
    record Column(String key, String title, Kind kind) {
    }

    final String name;
    final String title;
    final List<Column> columns = new ArrayList<>();
    final List<Object[]> rows = new ArrayList<>();

    ReportTable(String name, String title) {
        this.name = name;
        this.title = title;
    }

    ReportTable column(String key, String title, Kind kind) {
        columns.add(new Column(key, title, kind));
        return this;
    }

    /** Adds a row; values line up with the columns (String for TEXT, Number otherwise, null for none). */
    ReportTable row(Object... values) {
        if (values.length != columns.size()) {
            throw new IllegalArgumentException(name + ": " + values.length + " values for " + columns.size() + " columns");
        }
        rows.add(values);
        return this;
    }

    /** The text table. */
    Table text() {
        Table t = new Table(columns.stream().map(Column::title).toArray(String[]::new));
        for (Object[] r : rows) {
            String[] cells = new String[r.length];
            for (int i = 0; i < r.length; i++) {
                cells[i] = columns.get(i).kind().text(r[i]);
            }
            t.row(cells);
        }
        return t;
    }
}
