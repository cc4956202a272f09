package org.thermion.cli.report;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

import java.io.PrintWriter;
import java.util.List;
import java.util.Map;

/**
 * Writes a report as JSON through Jackson: {@code report} (the command), {@code schema_version},
 * the fields, then {@code tables}, an object of arrays of row objects keyed by column name.
 * Keys are snake_case with the unit spelled out, as in the CSV; numbers are SI base units to
 * six significant figures; an absent value is null (each schema says what null means).
 */
public final class JsonWriter {
    private static final JsonMapper MAPPER = JsonMapper.builder().build();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private JsonWriter() {
    }

    public static void write(PrintWriter out, Report report) {
        out.println(MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(tree(report)));
        out.flush();
    }

    /** The report as a JSON tree (tests read it back to check it against the schema). */
    public static ObjectNode tree(Report report) {
        ObjectNode root = NODES.objectNode();
        root.put("report", report.command());
        root.put("schema_version", report.version());
        for (Map.Entry<String, Object> f : report.fields().entrySet()) {
            root.set(f.getKey(), node(f.getValue()));
        }
        ObjectNode tables = root.putObject("tables");
        for (Table t : report.tables()) {
            ArrayNode rows = tables.putArray(t.name());
            for (Object[] r : t.rows()) {
                ObjectNode row = rows.addObject();
                for (int i = 0; i < r.length; i++) {
                    row.set(t.columns().get(i).name(), node(r[i]));
                }
            }
        }
        return root;
    }

    private static JsonNode node(Object v) {
        if (v == null || v instanceof Absent) {
            return NODES.nullNode();
        }
        if (v instanceof Boolean b) {
            return NODES.booleanNode(b);
        }
        if (v instanceof Integer || v instanceof Long) {
            return NODES.numberNode(((Number) v).longValue());
        }
        if (v instanceof Number n) {
            java.math.BigDecimal d = Numbers.decimal(n.doubleValue());
            return d == null ? NODES.nullNode() : NODES.numberNode(d);
        }
        if (v instanceof Map<?, ?> m) {
            ObjectNode o = NODES.objectNode();
            for (Map.Entry<?, ?> e : m.entrySet()) {
                o.set(e.getKey().toString(), node(e.getValue()));
            }
            return o;
        }
        if (v instanceof List<?> l) {
            ArrayNode a = NODES.arrayNode();
            l.forEach(x -> a.add(node(x)));
            return a;
        }
        return NODES.stringNode(v.toString());
    }
}
