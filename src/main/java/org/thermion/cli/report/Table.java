package org.thermion.cli.report;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * A report table held as values, so one content renders as aligned text, CSV and JSON.
 * Cells are a String (TEXT), a Number (COUNT and physical units, in SI base units), a Boolean
 * (FLAG), an {@link Absent} or null (an empty cell).
 */
public final class Table {
    private final String name;
    private final String title;
    private final List<Column> columns = new ArrayList<>();
    private final List<Object[]> rows = new ArrayList<>();

    /** {@code name} keys the table in CSV and JSON; {@code title} heads it in text. */
    public Table(String name, String title) {
        if (!Column.validKey(name)) {
            throw new IllegalArgumentException("table name '" + name + "' is not a lower-case identifier");
        }
        this.name = name;
        this.title = title;
    }

    public Table column(String key, String title, ReportUnit unit) {
        return column(key, title, unit, null);
    }

    /** Adds a column whose {@code explanation} text prints under the table. */
    public Table column(String key, String title, ReportUnit unit, String explanation) {
        Column c = new Column(key, title, unit, explanation);
        if (columns.stream().anyMatch(x -> x.name().equals(c.name()))) {
            throw new IllegalArgumentException(name + ": two columns named " + c.name());
        }
        columns.add(c);
        return this;
    }

    /** Adds a row; values line up with the columns. */
    public Table row(Object... values) {
        if (values.length != columns.size()) {
            throw new IllegalArgumentException(name + ": " + values.length + " values for " + columns.size() + " columns");
        }
        for (int i = 0; i < values.length; i++) {
            Object v = values[i];
            ReportUnit u = columns.get(i).unit();
            boolean fits = v == null || v instanceof Absent
                    || (u == ReportUnit.TEXT ? v instanceof String : u == ReportUnit.FLAG ? v instanceof Boolean : v instanceof Number);
            if (!fits) {
                throw new IllegalArgumentException(name + "." + columns.get(i).name() + ": " + v.getClass().getSimpleName()
                        + " in a " + u + " column");
            }
        }
        rows.add(values.clone());
        return this;
    }

    public String name() {
        return name;
    }

    public String title() {
        return title;
    }

    public List<Column> columns() {
        return Collections.unmodifiableList(columns);
    }

    /** The rows (each a copy, so the table stays as built). */
    public List<Object[]> rows() {
        return rows.stream().map(Object[]::clone).toList();
    }

    public boolean isEmpty() {
        return rows.isEmpty();
    }
}
