package org.thermion.cli.report;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes a report for people, at most {@link #WIDTH} columns wide. Each table shows every
 * unit with one SI prefix, named in the column's heading ({@code peak mA}); a table too wide
 * first wraps its long text cells, then splits into column groups that repeat the first
 * column. Column explanations follow the table.
 */
public final class TextWriter {
    /** The widest line text output writes (plots excepted: their width is the user's choice). */
    public static final int WIDTH = 100;
    private static final String INDENT = "  ";
    private static final String GAP = "  ";
    private static final int WRAPPED_CELL = 30;

    private TextWriter() {
    }

    public static void write(PrintWriter out, Report report) {
        for (Report.Part p : report.parts()) {
            if (p instanceof Report.Lines l) {
                for (String line : l.lines()) {
                    if (l.wrap()) {
                        wrap(line, WIDTH).forEach(out::println);
                    } else {
                        out.println(line);
                    }
                }
            } else if (p instanceof Report.TablePart tp && tp.inText()) {
                table(out, tp.table());
                out.println();
            }
        }
        out.flush();
    }

    /** One table with its title line, columns and explanations. */
    static void table(PrintWriter out, Table t) {
        wrap(t.title() + ":", WIDTH).forEach(out::println);
        if (t.isEmpty()) {
            out.println(INDENT + "(none)");
        } else {
            grid(out, t);
        }
        for (Column c : t.columns()) {
            if (c.explanation() != null) {
                wrap(INDENT + heading(c, scales(t).get(c.unit())) + ": " + c.explanation(), WIDTH).forEach(out::println);
            }
        }
    }

    private static Map<ReportUnit, Numbers.Scale> scales(Table t) {
        Map<ReportUnit, Double> largest = new HashMap<>();
        for (Object[] r : t.rows()) {
            for (int i = 0; i < r.length; i++) {
                if (r[i] instanceof Number n && Double.isFinite(n.doubleValue())) {
                    largest.merge(t.columns().get(i).unit(), Math.abs(n.doubleValue()), Math::max);
                }
            }
        }
        Map<ReportUnit, Numbers.Scale> s = new HashMap<>();
        for (Column c : t.columns()) {
            s.put(c.unit(), Numbers.Scale.of(c.unit(), largest.getOrDefault(c.unit(), 0.0)));
        }
        return s;
    }

    private static String heading(Column c, Numbers.Scale s) {
        String sym = s == null ? "" : s.symbol();
        return sym.isEmpty() ? c.title() : c.title() + " " + sym;
    }

    private static void grid(PrintWriter out, Table t) {
        List<Column> cols = t.columns();
        Map<ReportUnit, Numbers.Scale> scales = scales(t);
        int n = cols.size();
        String[] head = new String[n];
        String[][] cells = new String[t.rows().size()][n];
        boolean[] right = new boolean[n];
        for (int i = 0; i < n; i++) {
            Column c = cols.get(i);
            Numbers.Scale s = scales.get(c.unit());
            head[i] = heading(c, s);
            right[i] = c.unit().numeric() && i > 0;
            double hi = 0;
            double lo = Double.POSITIVE_INFINITY;
            for (Object[] r : t.rows()) {
                if (r[i] instanceof Number v && Double.isFinite(v.doubleValue()) && v.doubleValue() != 0) {
                    hi = Math.max(hi, Math.abs(v.doubleValue()));
                    lo = Math.min(lo, Math.abs(v.doubleValue()));
                }
            }
            int decimals = s.decimals(hi, lo);
            List<Object[]> rows = t.rows();
            for (int r = 0; r < rows.size(); r++) {
                cells[r][i] = cell(rows.get(r)[i], c.unit(), s, decimals);
            }
        }
        int[] w = widths(head, cells);
        // Too wide: narrow the widest text column (not below WRAPPED_CELL or its heading) until the
        // table fits or no text column can give more; the rest is split into column groups.
        int room = WIDTH - INDENT.length();
        while (total(w) > room) {
            int widest = -1;
            for (int i = 0; i < n; i++) {
                if (!right[i] && w[i] > Math.max(WRAPPED_CELL, head[i].length()) && (widest < 0 || w[i] > w[widest])) {
                    widest = i;
                }
            }
            if (widest < 0) {
                break;
            }
            w[widest] = Math.max(Math.max(WRAPPED_CELL, head[widest].length()), w[widest] - (total(w) - room));
        }
        List<List<Integer>> groups = groups(w);
        for (int gi = 0; gi < groups.size(); gi++) {
            List<Integer> group = groups.get(gi);
            if (gi > 0) {
                out.println();
                out.println(INDENT + "(" + t.name().replace('_', ' ') + ", continued)");
            }
            row(out, head, group, w, right);
            StringBuilder rule = new StringBuilder(INDENT);
            for (int k = 0; k < group.size(); k++) {
                rule.append(k == 0 ? "" : GAP).append("-".repeat(w[group.get(k)]));
            }
            out.println(rule);
            for (String[] r : cells) {
                row(out, r, group, w, right);
            }
        }
    }

    private static String cell(Object v, ReportUnit unit, Numbers.Scale s, int decimals) {
        if (v == null) {
            return "";
        }
        if (v instanceof Absent a) {
            return a.word();
        }
        if (v instanceof Boolean b) {
            return b ? "yes" : "no";
        }
        if (v instanceof Number num) {
            if (v instanceof Integer || v instanceof Long) {
                return unit == ReportUnit.COUNT || unit == ReportUnit.NUMBER ? String.valueOf(num.longValue()) : s.format(num.doubleValue(), decimals);
            }
            double d = num.doubleValue();
            return Double.isFinite(d) ? s.format(d, decimals) : "-";
        }
        return v.toString();
    }

    private static int[] widths(String[] head, String[][] cells) {
        int[] w = new int[head.length];
        for (int i = 0; i < head.length; i++) {
            w[i] = head[i].length();
            for (String[] r : cells) {
                w[i] = Math.max(w[i], r[i].length());
            }
        }
        return w;
    }

    private static int total(int[] w) {
        int sum = 0;
        for (int x : w) {
            sum += x + GAP.length();
        }
        return sum - GAP.length();
    }

    /** Column groups that fit the width; every group after the first repeats column 0. */
    private static List<List<Integer>> groups(int[] w) {
        int room = WIDTH - INDENT.length();
        List<List<Integer>> groups = new ArrayList<>();
        List<Integer> g = new ArrayList<>(List.of(0));
        int used = w[0];
        for (int i = 1; i < w.length; i++) {
            if (used + GAP.length() + w[i] > room && g.size() > 1) {
                groups.add(g);
                g = new ArrayList<>(List.of(0));
                used = w[0];
            }
            g.add(i);
            used += GAP.length() + w[i];
        }
        groups.add(g);
        return groups;
    }

    private static void row(PrintWriter out, String[] cells, List<Integer> group, int[] w, boolean[] right) {
        List<List<String>> wrapped = new ArrayList<>();
        int height = 1;
        for (int i : group) {
            List<String> lines = cells[i].length() <= w[i] ? List.of(cells[i]) : wrap(cells[i], w[i], true);
            wrapped.add(lines);
            height = Math.max(height, lines.size());
        }
        for (int line = 0; line < height; line++) {
            StringBuilder sb = new StringBuilder(INDENT);
            for (int k = 0; k < group.size(); k++) {
                int i = group.get(k);
                List<String> lines = wrapped.get(k);
                String c = line < lines.size() ? lines.get(line) : "";
                if (k > 0) {
                    sb.append(GAP);
                }
                String pad = " ".repeat(Math.max(0, w[i] - c.length()));
                sb.append(right[i] ? pad + c : c + pad);
            }
            out.println(sb.toString().stripTrailing());
        }
    }

    /**
     * {@code line} broken at spaces into lines of at most {@code width} characters; a
     * continuation keeps the line's indent plus two spaces. A word longer than the width is cut.
     */
    public static List<String> wrap(String line, int width) {
        return wrap(line, width, false);
    }

    /** As {@link #wrap(String, int)}; {@code lists} prefers breaking after a comma (a cell listing items). */
    private static List<String> wrap(String line, int width, boolean lists) {
        List<String> out = new ArrayList<>();
        if (line.length() <= width) {
            out.add(line);
            return out;
        }
        int lead = 0;
        while (lead < line.length() && line.charAt(lead) == ' ') {
            lead++;
        }
        String indent = " ".repeat(Math.min(lead, width / 2));
        String more = " ".repeat(Math.min(lead + 2, width / 2));
        String rest = line.substring(lead);
        String prefix = indent;
        while (!rest.isEmpty()) {
            int room = width - prefix.length();
            if (rest.length() <= room) {
                out.add(prefix + rest);
                break;
            }
            int cut = lists ? rest.lastIndexOf(", ", room - 1) + 1 : 0;
            if (cut < room / 3) {
                cut = rest.lastIndexOf(' ', room);
            }
            if (cut <= 0) {
                cut = room;
            }
            out.add((prefix + rest.substring(0, cut)).stripTrailing());
            rest = rest.substring(cut).stripLeading();
            prefix = more;
        }
        return out;
    }
}
