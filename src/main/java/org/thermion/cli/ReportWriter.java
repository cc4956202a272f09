package org.thermion.cli;

import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Writes a report (named fields, tables, closing lines) as text, as RFC 4180 CSV or as
 * JSON. CSV: first the report's fields as {@code report,FIELD,VALUE} records (nested
 * fields as {@code FIELD.KEY}), then one block per table: a header record whose first field
 * is {@code table}, then data records whose first field names the table. Records are
 * padded to one width so every record has as many fields. Lines end in CRLF.
 */
final class ReportWriter {
    private ReportWriter() {
    }

    static void text(PrintWriter out, List<String> head, List<ReportTable> tables, List<String> tail) {
        head.forEach(out::println);
        for (ReportTable t : tables) {
            out.println();
            out.println(t.title + ":");
            if (t.rows.isEmpty()) {
                out.println("  (none)");
            } else {
                t.text().print(out, "  ");
            }
        }
        if (!tail.isEmpty()) {
            out.println();
            tail.forEach(out::println);
        }
    }

    static void csv(PrintWriter out, Map<String, Object> fields, List<ReportTable> tables) {
        int width = 3;
        for (ReportTable t : tables) {
            width = Math.max(width, t.columns.size() + 1);
        }
        record(out, width, "table", "field", "value");
        for (Map.Entry<String, Object> f : fields.entrySet()) {
            if (f.getValue() instanceof Map<?, ?> sub) {
                for (Map.Entry<?, ?> e : sub.entrySet()) {
                    record(out, width, "report", f.getKey() + "." + e.getKey(), raw(e.getValue()));
                }
            } else {
                record(out, width, "report", f.getKey(), raw(f.getValue()));
            }
        }
        for (ReportTable t : tables) {
            String[] h = new String[t.columns.size() + 1];
            h[0] = "table";
            for (int i = 0; i < t.columns.size(); i++) {
                h[i + 1] = t.columns.get(i).key();
            }
            record(out, width, h);
            for (Object[] r : t.rows) {
                String[] c = new String[r.length + 1];
                c[0] = t.name;
                for (int i = 0; i < r.length; i++) {
                    c[i + 1] = raw(r[i]);
                }
                record(out, width, c);
            }
        }
    }

    static void json(PrintWriter out, Map<String, Object> fields, List<ReportTable> tables) {
        StringBuilder b = new StringBuilder("{\n");
        boolean first = true;
        for (Map.Entry<String, Object> f : fields.entrySet()) {
            b.append(first ? "" : ",\n").append("  ").append(ReportJson.quote(f.getKey())).append(": ");
            value(b, f.getValue(), "  ");
            first = false;
        }
        b.append(first ? "" : ",\n").append("  \"tables\": {");
        for (int ti = 0; ti < tables.size(); ti++) {
            ReportTable t = tables.get(ti);
            b.append(ti == 0 ? "\n" : ",\n").append("    ").append(ReportJson.quote(t.name)).append(": [");
            for (int ri = 0; ri < t.rows.size(); ri++) {
                Object[] r = t.rows.get(ri);
                b.append(ri == 0 ? "\n" : ",\n").append("      {");
                for (int i = 0; i < r.length; i++) {
                    b.append(i == 0 ? "" : ", ").append(ReportJson.quote(t.columns.get(i).key())).append(": ");
                    cell(b, r[i], t.columns.get(i).kind());
                }
                b.append('}');
            }
            b.append(t.rows.isEmpty() ? "]" : "\n    ]");
        }
        b.append(tables.isEmpty() ? "}" : "\n  }").append("\n}");
        out.println(b);
    }

    private static void value(StringBuilder b, Object v, String indent) {
        if (v == null) {
            b.append("null");
        } else if (v instanceof Number n) {
            number(b, n);
        } else if (v instanceof Boolean z) {
            b.append(z);
        } else if (v instanceof Map<?, ?> m) {
            b.append('{');
            boolean first = true;
            for (Map.Entry<?, ?> e : m.entrySet()) {
                b.append(first ? "" : ", ").append(ReportJson.quote(e.getKey().toString())).append(": ");
                value(b, e.getValue(), indent);
                first = false;
            }
            b.append('}');
        } else {
            b.append(ReportJson.quote(v.toString()));
        }
    }

    private static void cell(StringBuilder b, Object v, ReportTable.Kind kind) {
        if (v == null) {
            b.append("null");
        } else if (kind == ReportTable.Kind.TEXT) {
            b.append(ReportJson.quote(v.toString()));
        } else {
            number(b, (Number) v);
        }
    }

    private static void number(StringBuilder b, Number n) {
        if (n instanceof Integer || n instanceof Long) {
            b.append(n.longValue());
            return;
        }
        double d = n.doubleValue();
        if (Double.isNaN(d) || Double.isInfinite(d)) {
            b.append("null");
        } else {
            b.append(num(d));
        }
    }

    /** A plain decimal of nine significant figures: enough for any planning figure, free of binary noise. */
    static String num(double d) {
        if (d == 0) {
            return "0";
        }
        return new BigDecimal(d).round(new MathContext(9)).stripTrailingZeros().toPlainString();
    }

    private static String raw(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Number n) {
            if (n instanceof Integer || n instanceof Long) {
                return String.valueOf(n.longValue());
            }
            double d = n.doubleValue();
            return Double.isNaN(d) || Double.isInfinite(d) ? "" : num(d);
        }
        return v.toString();
    }

    private static void record(PrintWriter out, int width, String... cells) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < width; i++) {
            if (i > 0) {
                b.append(',');
            }
            if (i < cells.length) {
                b.append(ReportCsv.field(cells[i]));
            }
        }
        out.print(b);
        out.print("\r\n");
    }
}
