package org.thermion.elab;

import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.lang.ast.Value;

import java.util.List;
import java.util.Map;

/**
 * The values of one property line, read against its {@link Property}: by slot id, with the
 * span each was written at. A line is only kept when it was read without an error.
 */
record PropLine(Prop prop, Map<String, Object> values, Map<String, Span> spans) {

    /** A number (SI) or whole number under {@code id}; NaN when absent. */
    double num(String id) {
        Object v = values.get(id);
        return v instanceof Number n ? n.doubleValue() : Double.NaN;
    }

    /** The main value's number. */
    double num() {
        return num("value");
    }

    String word(String id) {
        Object v = values.get(id);
        return v instanceof String s ? s : null;
    }

    /** True when the optional word (or the value) {@code id} was written. */
    boolean has(String id) {
        return values.containsKey(id);
    }

    @SuppressWarnings("unchecked")
    List<Value> tokens(String id) {
        Object v = values.get(id);
        return v instanceof List<?> l ? (List<Value>) l : List.of();
    }

    Span span(String id) {
        Span s = spans.get(id);
        return s == null ? prop.span() : s;
    }
}
