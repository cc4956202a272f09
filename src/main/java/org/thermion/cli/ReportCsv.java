package org.thermion.cli;

/** RFC 4180 CSV fields: quoted when they hold a comma, quote or line break. */
final class ReportCsv {
    private ReportCsv() {
    }

    /** The fields as one record (without its line end); a null field is empty. */
    static String row(String... fields) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < fields.length; i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(field(fields[i]));
        }
        return sb.toString();
    }

    /** One field, quoted (inner quotes doubled) when it holds a comma, quote or line break; null is empty. */
    static String field(String f) {
        if (f == null) {
            return "";
        }
        if (f.indexOf(',') >= 0 || f.indexOf('"') >= 0 || f.indexOf('\n') >= 0 || f.indexOf('\r') >= 0) {
            return '"' + f.replace("\"", "\"\"") + '"';
        }
        return f;
    }

    /** A number in plain SI units for other tools. */
    static String number(double v) {
        return ReportJson.number(v).equals("null") ? "" : ReportJson.number(v);
    }
}
