package org.thermion.cli;

import java.util.Locale;

/** A small JSON text builder for reports (objects, arrays, strings, numbers), RFC 8259 escaping. */
final class ReportJson {
    private final StringBuilder sb = new StringBuilder();
    private boolean needComma;

    ReportJson begin() {
        comma();
        sb.append('{');
        needComma = false;
        return this;
    }

    ReportJson end() {
        sb.append('}');
        needComma = true;
        return this;
    }

    ReportJson beginArray(String key) {
        key(key);
        sb.append('[');
        needComma = false;
        return this;
    }

    ReportJson beginObject(String key) {
        key(key);
        sb.append('{');
        needComma = false;
        return this;
    }

    ReportJson endArray() {
        sb.append(']');
        needComma = true;
        return this;
    }

    ReportJson field(String key, String value) {
        key(key);
        string(value);
        needComma = true;
        return this;
    }

    ReportJson field(String key, double value) {
        key(key);
        sb.append(number(value));
        needComma = true;
        return this;
    }

    ReportJson field(String key, long value) {
        key(key);
        sb.append(value);
        needComma = true;
        return this;
    }

    ReportJson field(String key, boolean value) {
        key(key);
        sb.append(value);
        needComma = true;
        return this;
    }

    /** An array element that is a plain string. */
    ReportJson element(String value) {
        comma();
        string(value);
        needComma = true;
        return this;
    }

    private void key(String key) {
        comma();
        string(key);
        sb.append(':');
        needComma = false;
    }

    private void comma() {
        if (needComma) {
            sb.append(',');
        }
    }

    private void string(String s) {
        sb.append(s == null ? "null" : quote(s));
    }

    /** {@code s} as a JSON string: quoted, with quote, backslash and control characters escaped. */
    static String quote(String s) {
        StringBuilder b = new StringBuilder("\"");
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (c < 0x20) {
                        b.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }

    static String number(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return "null";
        }
        if (v == 0) {
            return "0";
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros().toString();
    }

    @Override
    public String toString() {
        return sb.toString();
    }
}
