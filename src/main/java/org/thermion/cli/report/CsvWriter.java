package org.thermion.cli.report;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Writes a report as RFC 4180 CSV, lines ending in CRLF. The first record is the header
 * {@code table,field,value}; then the report's fields as {@code report,KEY,VALUE} records
 * (first {@code report} and {@code schema_version}; a nested field's key joins its parents'
 * with {@code _}, a list repeats its key); then one block per table: a header record whose
 * first field is {@code table} followed by the column names, and data records whose first
 * field names the table. Every record is padded to one width. Numbers are in SI base units
 * (the unit is in the column name), a flag is {@code true} or {@code false}, an absent value empty.
 */
public final class CsvWriter {
    private CsvWriter() {
    }

    public static void write(PrintWriter out, Report report) {
        int width = 3;
        for (Table t : report.tables()) {
            width = Math.max(width, t.columns().size() + 1);
        }
        record(out, width, "table", "field", "value");
        record(out, width, "report", "report", report.command());
        record(out, width, "report", "schema_version", String.valueOf(report.version()));
        for (Map.Entry<String, Object> f : report.fields().entrySet()) {
            field(out, width, f.getKey(), f.getValue());
        }
        for (Table t : report.tables()) {
            List<String> h = new ArrayList<>(List.of("table"));
            t.columns().forEach(c -> h.add(c.name()));
            record(out, width, h.toArray(String[]::new));
            for (Object[] r : t.rows()) {
                String[] c = new String[r.length + 1];
                c[0] = t.name();
                for (int i = 0; i < r.length; i++) {
                    c[i + 1] = value(r[i]);
                }
                record(out, width, c);
            }
        }
        out.flush();
    }

    private static void field(PrintWriter out, int width, String key, Object v) {
        if (v instanceof Map<?, ?> m) {
            for (Map.Entry<?, ?> e : m.entrySet()) {
                field(out, width, key + "_" + e.getKey(), e.getValue());
            }
        } else if (v instanceof List<?> l) {
            for (Object x : l) {
                field(out, width, key, x);
            }
        } else {
            record(out, width, "report", key, value(v));
        }
    }

    /** A cell's text for tools: numbers in SI base units, absent values empty. */
    static String value(Object v) {
        if (v == null || v instanceof Absent) {
            return "";
        }
        if (v instanceof Integer || v instanceof Long) {
            return v.toString();
        }
        if (v instanceof Number n) {
            return Numbers.plain(n.doubleValue());
        }
        return v.toString();
    }

    /** The fields as one RFC 4180 record (without its line end): quoted when they hold a comma, quote or line break. */
    public static String row(String... fields) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < fields.length; i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(quote(fields[i]));
        }
        return sb.toString();
    }

    /** One field, quoted (inner quotes doubled) when it holds a comma, quote or line break; null is empty. */
    public static String quote(String f) {
        if (f == null) {
            return "";
        }
        if (f.indexOf(',') >= 0 || f.indexOf('"') >= 0 || f.indexOf('\n') >= 0 || f.indexOf('\r') >= 0) {
            return '"' + f.replace("\"", "\"\"") + '"';
        }
        return f;
    }

    private static void record(PrintWriter out, int width, String... cells) {
        String[] padded = new String[width];
        System.arraycopy(cells, 0, padded, 0, Math.min(cells.length, width));
        out.print(row(padded));
        out.print("\r\n");
    }
}
