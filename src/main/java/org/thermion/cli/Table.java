package org.thermion.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

/** An aligned text table: text columns left, numeric columns right. */
public final class Table {
    private static final java.util.regex.Pattern NUMBER = java.util.regex.Pattern.compile("[-+]?[0-9.,]+\\s*[a-zA-Z%]*");
    private final String[] header;
    private final List<String[]> rows = new ArrayList<>();

    public Table(String... header) {
        this.header = header;
    }

    public Table row(String... cells) {
        rows.add(cells);
        return this;
    }

    public void print(PrintWriter out, String indent) {
        int[] w = new int[header.length];
        boolean[] numeric = new boolean[header.length];
        java.util.Arrays.fill(numeric, true);
        for (int i = 0; i < header.length; i++) {
            w[i] = header[i].length();
        }
        for (String[] r : rows) {
            for (int i = 0; i < r.length && i < w.length; i++) {
                w[i] = Math.max(w[i], r[i].length());
                if (numeric[i] && !r[i].isEmpty() && !NUMBER.matcher(r[i]).matches()) {
                    numeric[i] = false;
                }
            }
        }
        line(out, indent, header, w, numeric);
        StringBuilder rule = new StringBuilder();
        for (int i = 0; i < w.length; i++) {
            rule.append(i == 0 ? "" : "  ").append("-".repeat(w[i]));
        }
        out.println(indent + rule);
        for (String[] r : rows) {
            line(out, indent, r, w, numeric);
        }
    }

    private static void line(PrintWriter out, String indent, String[] cells, int[] w, boolean[] numeric) {
        StringBuilder sb = new StringBuilder(indent);
        for (int i = 0; i < w.length; i++) {
            String c = i < cells.length ? cells[i] : "";
            if (i > 0) {
                sb.append("  ");
            }
            if (numeric[i] && i > 0) {
                sb.append(" ".repeat(w[i] - c.length())).append(c);
            } else {
                sb.append(c).append(" ".repeat(w[i] - c.length()));
            }
        }
        out.println(sb.toString().stripTrailing());
    }
}
