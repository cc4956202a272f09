package org.thermion.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Checks a parsed JSON value against the subset of JSON Schema (2020-12) our report
 * schemas use: type (one or a list), enum, properties, required, additionalProperties
 * (boolean), items, minimum, and $ref to "#/$defs/NAME". Returns every violation with its
 * JSON path; an unsupported keyword in the schema is itself reported, so the schema cannot
 * silently promise more than is checked.
 */
final class SchemaCheck {
    private static final List<String> KNOWN = List.of("$schema", "title", "description", "type", "enum", "properties",
            "required", "additionalProperties", "items", "minimum", "$ref", "$defs");
    private final Map<String, Object> root;
    private final List<String> problems = new ArrayList<>();

    private SchemaCheck(Map<String, Object> root) {
        this.root = root;
    }

    @SuppressWarnings("unchecked")
    static List<String> check(Object schema, Object value) {
        SchemaCheck c = new SchemaCheck((Map<String, Object>) schema);
        c.check(c.root, value, "$");
        return c.problems;
    }

    @SuppressWarnings("unchecked")
    private void check(Map<String, Object> schema, Object v, String path) {
        for (String k : schema.keySet()) {
            if (!KNOWN.contains(k)) {
                problems.add(path + ": schema keyword '" + k + "' is not supported by this checker");
            }
        }
        if (schema.containsKey("$ref")) {
            String ref = (String) schema.get("$ref");
            String prefix = "#/$defs/";
            Map<String, Object> defs = (Map<String, Object>) root.get("$defs");
            if (!ref.startsWith(prefix) || defs == null || !defs.containsKey(ref.substring(prefix.length()))) {
                problems.add(path + ": unresolved $ref " + ref);
                return;
            }
            check((Map<String, Object>) defs.get(ref.substring(prefix.length())), v, path);
        }
        if (schema.containsKey("type")) {
            Object t = schema.get("type");
            List<Object> types = t instanceof List<?> l ? (List<Object>) l : List.of(t);
            if (types.stream().noneMatch(x -> is((String) x, v))) {
                problems.add(path + ": expected " + types + ", found " + describe(v));
                return;
            }
        }
        if (schema.containsKey("enum") && !((List<Object>) schema.get("enum")).contains(v)) {
            problems.add(path + ": " + describe(v) + " is not one of " + schema.get("enum"));
        }
        if (schema.containsKey("minimum") && v instanceof Number n
                && n.doubleValue() < ((Number) schema.get("minimum")).doubleValue()) {
            problems.add(path + ": " + n + " is below the minimum " + schema.get("minimum"));
        }
        if (v instanceof Map<?, ?> obj) {
            Map<String, Object> props = (Map<String, Object>) schema.getOrDefault("properties", Map.of());
            for (Object req : (List<Object>) schema.getOrDefault("required", List.of())) {
                if (!obj.containsKey(req)) {
                    problems.add(path + ": missing required key '" + req + "'");
                }
            }
            for (Map.Entry<?, ?> e : obj.entrySet()) {
                String key = (String) e.getKey();
                if (props.containsKey(key)) {
                    check((Map<String, Object>) props.get(key), e.getValue(), path + "." + key);
                } else if (Boolean.FALSE.equals(schema.get("additionalProperties"))) {
                    problems.add(path + ": key '" + key + "' is not in the schema");
                }
            }
        }
        if (v instanceof List<?> arr && schema.containsKey("items")) {
            for (int k = 0; k < arr.size(); k++) {
                check((Map<String, Object>) schema.get("items"), arr.get(k), path + "[" + k + "]");
            }
        }
    }

    private static boolean is(String type, Object v) {
        return switch (type) {
            case "object" -> v instanceof Map;
            case "array" -> v instanceof List;
            case "string" -> v instanceof String;
            case "integer" -> v instanceof Long;
            case "number" -> v instanceof Number;
            case "boolean" -> v instanceof Boolean;
            case "null" -> v == null;
            default -> false;
        };
    }

    private static String describe(Object v) {
        return v == null ? "null" : v instanceof String s ? "\"" + s + "\"" : v.getClass().getSimpleName() + " " + v;
    }
}
