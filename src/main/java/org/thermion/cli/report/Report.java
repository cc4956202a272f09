package org.thermion.cli.report;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One command's report: named fields, tables and text-only lines, in the order text shows
 * them. The fields and tables are the facts, written alike by every writer; text-only lines
 * (headings, explanations, plots) are for people and appear in text alone. JSON carries the
 * command's name and its schema version ({@code src/main/resources/org/thermion/schema/NAME.schema.json}).
 */
public final class Report {
    /** A part of the report, in order. */
    public sealed interface Part permits TablePart, Lines {
    }

    /**
     * A table; {@code inText} false for a table whose facts text tells in lines of its own,
     * {@code inData} false for a table laid out for people only (CSV and JSON hold its facts in another).
     */
    public record TablePart(Table table, boolean inText, boolean inData) implements Part {
    }

    /** Lines for people, shown in text only (wrapped at the text width, plots excepted). */
    public record Lines(List<String> lines, boolean wrap) implements Part {
    }

    private final String command;
    private final int version;
    private final Map<String, Object> fields = new LinkedHashMap<>();
    private final List<Part> parts = new ArrayList<>();

    public Report(String command, int version) {
        this.command = command;
        this.version = version;
    }

    /**
     * A named fact. Values: String, Number, Boolean, {@link Absent}, null, a Map of the same
     * (keys lower-case identifiers) or a List of the same.
     */
    public Report field(String key, Object value) {
        if (!Column.validKey(key) || key.equals("report") || key.equals("schema_version") || key.equals("tables")) {
            throw new IllegalArgumentException("report field '" + key + "' is not a free lower-case identifier");
        }
        fields.put(key, value);
        return this;
    }

    /** A named measurement: the key gets the unit's word ({@code final} in amps is {@code final_amps}). */
    public Report field(String key, ReportUnit unit, Object value) {
        return field(unit.name(key), value);
    }

    public Report table(Table t) {
        parts.add(new TablePart(t, true, true));
        return this;
    }

    /** A table for CSV and JSON only: the text tells its facts in lines of its own. */
    public Report data(Table t) {
        parts.add(new TablePart(t, false, true));
        return this;
    }

    /** A table for text only, laid out for people; CSV and JSON carry its facts in another table. */
    public Report view(Table t) {
        parts.add(new TablePart(t, true, false));
        return this;
    }

    /** Lines for people, wrapped at the text width. */
    public Report text(String... lines) {
        parts.add(new Lines(List.of(lines), true));
        return this;
    }

    /** Lines for people, wrapped at the text width. */
    public Report text(List<String> lines) {
        parts.add(new Lines(List.copyOf(lines), true));
        return this;
    }

    /** Lines printed as they are (plots, whose width the user chose). */
    public Report verbatim(List<String> lines) {
        parts.add(new Lines(List.copyOf(lines), false));
        return this;
    }

    public String command() {
        return command;
    }

    public int version() {
        return version;
    }

    public Map<String, Object> fields() {
        return Collections.unmodifiableMap(fields);
    }

    public List<Part> parts() {
        return Collections.unmodifiableList(parts);
    }

    /** The tables CSV and JSON carry, in order. */
    public List<Table> tables() {
        List<Table> t = new ArrayList<>();
        for (Part p : parts) {
            if (p instanceof TablePart tp && tp.inData()) {
                t.add(tp.table());
            }
        }
        return t;
    }
}
