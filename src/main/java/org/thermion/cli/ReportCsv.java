package org.thermion.cli;

/** RFC 4180 CSV fields: quoted when they hold a comma, quote or line break. */
final class ReportCsv {
    private ReportCsv() {
    }

    static String row(String... fields) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < fields.length; i++) {
            if (i > 0) {
                sb.append(',');
            }
            String f = fields[i] == null ? "" : fields[i];
            if (f.contains(",") || f.contains("\"") || f.contains("\n") || f.contains("\r")) {
                sb.append('"').append(f.replace("\"", "\"\"")).append('"');
            } else {
                sb.append(f);
            }
        }
        return sb.toString();
    }

    /** A number in plain SI units for other tools. */
    static String number(double v) {
        return ReportJson.number(v).equals("null") ? "" : ReportJson.number(v);
    }
}
