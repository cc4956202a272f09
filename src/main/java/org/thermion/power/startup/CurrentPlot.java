package org.thermion.power.startup;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Draws current against time in characters: an area chart (each column the highest current of
 * its time slice, filled up from zero with eighth-height blocks so spikes stay visible), a
 * vertical axis in amperes with round-number ticks, a time axis in seconds, a dashed line for
 * the supply limit, and marked instants (the bypass) with their labels under the axis.
 * {@link Style#ASCII} uses only printable ASCII for terminals without block characters.
 */
public final class CurrentPlot {
    private static final char[] EIGHTHS = {' ', '\u2581', '\u2582', '\u2583', '\u2584', '\u2585', '\u2586', '\u2587', '\u2588'};

    private CurrentPlot() {
    }

    /** Character repertoire. */
    public enum Style { BLOCKS, ASCII }

    /** A marked instant, e.g. the bypass. */
    public record Marker(double time, String label) {
    }

    /**
     * Renders {@code height} lines of {@code width} columns at most: a title line, the plot
     * area, the time axis, its labels and a line of marker labels.
     */
    public static List<String> render(double[] t, double[] amps, int width, int height, String title) {
        return render(t, amps, width, height, title, List.of(), Double.NaN, Style.BLOCKS);
    }

    /** As {@link #render(double[], double[], int, int, String)} with markers, a limit line (NaN: none) and a style. */
    public static List<String> render(double[] t, double[] amps, int width, int height, String title,
                                      List<Marker> markers, double limit, Style style) {
        if (t.length != amps.length) {
            throw new IllegalArgumentException("times and currents differ in length");
        }
        width = Math.max(24, width);
        height = Math.max(7, height);
        int rows = height - 4;
        List<String> out = new ArrayList<>();
        out.add(clip(title, width));
        if (t.length == 0) {
            for (int i = 1; i < height; i++) {
                out.add(i == height / 2 ? "  (no samples)" : "");
            }
            return out;
        }
        double t0 = t[0], t1 = t[t.length - 1];
        if (!(t1 > t0)) {
            t1 = t0 + 1;
        }
        double max = 0;
        for (double a : amps) {
            max = Math.max(max, a);
        }
        boolean showLimit = Double.isFinite(limit) && limit > 0 && limit <= 1.25 * Math.max(max, 1e-12);
        // Below an ampere the axis reads in milliamperes.
        String unitLabel = "A";
        double scale = 1;
        if (Math.max(max, showLimit ? limit : 0) < 1) {
            unitLabel = "mA";
            scale = 1000;
        }
        if (scale != 1) {
            double[] scaled = new double[amps.length];
            for (int i = 0; i < amps.length; i++) {
                scaled[i] = amps[i] * scale;
            }
            amps = scaled;
            max *= scale;
            limit *= scale;
        }
        double top = Math.max(max, showLimit ? limit : 0);
        double yStep = niceStep(top > 0 ? top : 1, Math.max(2, Math.min(5, rows / 2)));
        double yMax = Math.ceil((top > 0 ? top : 1) / yStep - 1e-9) * yStep;
        if (yMax <= 0) {
            yMax = yStep;
        }
        int yDec = decimals(yStep);
        // Tick labels of the vertical axis, by row from the bottom (row 0 is the time axis).
        String[] labelAt = new String[rows + 1];
        int labelWidth = 1;
        for (double v = 0; v <= yMax + yStep * 1e-6; v += yStep) {
            int row = (int) Math.round(v / yMax * rows);
            String s = String.format(Locale.ROOT, "%." + yDec + "f", v);
            labelAt[Math.min(rows, row)] = s;
            labelWidth = Math.max(labelWidth, s.length());
        }
        labelWidth = Math.max(labelWidth, unitLabel.length());
        int cols = Math.max(8, width - labelWidth - (showLimit ? 9 : 4));
        double span = t1 - t0;

        // Column values: highest current in each time slice; interpolated when a slice holds no sample.
        double[] col = new double[cols];
        Arrays.fill(col, Double.NaN);
        for (int i = 0; i < t.length; i++) {
            int c = (int) Math.min(cols - 1, Math.floor((t[i] - t0) / span * cols));
            col[c] = Double.isNaN(col[c]) ? amps[i] : Math.max(col[c], amps[i]);
        }
        for (int c = 0; c < cols; c++) {
            if (Double.isNaN(col[c])) {
                col[c] = interpolate(t, amps, t0 + (c + 0.5) * span / cols);
            }
        }
        boolean ascii = style == Style.ASCII;
        char[][] grid = new char[rows][cols];
        for (int c = 0; c < cols; c++) {
            int eighths = (int) Math.round(Math.max(0, col[c]) / yMax * rows * 8);
            for (int r = 0; r < rows; r++) {
                int bottom = rows - 1 - r;
                int k = Math.max(0, Math.min(8, eighths - bottom * 8));
                grid[r][c] = ascii ? (k >= 4 ? '#' : (k > 0 && bottom == 0 ? '_' : ' ')) : EIGHTHS[k];
            }
        }
        if (showLimit) {
            int r = rows - (int) Math.round(limit / yMax * rows);
            r = Math.max(0, Math.min(rows - 1, r));
            for (int c = 0; c < cols; c++) {
                if (grid[r][c] == ' ') {
                    grid[r][c] = ascii ? '-' : '\u254C';
                }
            }
        }
        List<int[]> markCols = new ArrayList<>();
        for (Marker mk : markers) {
            if (mk.time() < t0 || mk.time() > t1) {
                continue;
            }
            int c = (int) Math.min(cols - 1, Math.floor((mk.time() - t0) / span * cols));
            markCols.add(new int[] {c});
            for (int r = 0; r < rows; r++) {
                if (grid[r][c] == ' ' || grid[r][c] == '-' || grid[r][c] == '\u254C') {
                    grid[r][c] = ascii ? ':' : '\u250A';
                }
            }
        }
        for (int r = 0; r < rows; r++) {
            int fromBottom = rows - r;
            String lab = labelAt[fromBottom];
            if (r == 0 && lab == null) {
                lab = "";
            }
            StringBuilder sb = new StringBuilder();
            if (r == 0 && labelAt[fromBottom] == null) {
                sb.append(pad(unitLabel, labelWidth)).append(ascii ? " |" : " \u2502");
            } else {
                sb.append(pad(lab == null ? "" : lab, labelWidth)).append(lab == null ? (ascii ? " |" : " \u2502")
                        : (ascii ? " +" : " \u2524"));
            }
            sb.append(grid[r]);
            if (showLimit && r == Math.max(0, Math.min(rows - 1, rows - (int) Math.round(limit / yMax * rows)))) {
                sb.append(" limit");
            }
            out.add(clip(sb.toString().stripTrailing(), width));
        }
        // Time axis.
        double xStep = niceStep(span, Math.max(2, Math.min(10, cols / 9)));
        int xDec = decimals(xStep);
        char[] axis = new char[cols];
        Arrays.fill(axis, ascii ? '-' : '\u2500');
        char[] labels = new char[cols + 8];
        Arrays.fill(labels, ' ');
        double first = Math.ceil(t0 / xStep - 1e-9) * xStep;
        for (double v = first; v <= t1 + xStep * 1e-6; v += xStep) {
            int c = (int) Math.round((v - t0) / span * cols);
            if (c >= cols) {
                c = cols - 1;
            }
            if (c > 0) {
                axis[c] = ascii ? '+' : '\u252C';
            }
            String s = String.format(Locale.ROOT, "%." + xDec + "f", Math.abs(v) < xStep * 1e-6 ? 0.0 : v);
            int start = Math.max(0, c - (c == 0 ? 0 : s.length() / 2));
            boolean free = true;
            for (int i = Math.max(0, start - 1); i < Math.min(labels.length, start + s.length() + 1); i++) {
                free &= labels[i] == ' ';
            }
            if (free && start + s.length() <= labels.length) {
                s.getChars(0, s.length(), labels, start);
            }
        }
        for (int[] mc : markCols) {
            axis[mc[0]] = ascii ? '^' : '\u2534';
        }
        String zero = labelAt[0] == null ? "0" : labelAt[0];
        out.add(clip(pad(zero, labelWidth) + (ascii ? " +" : " \u2514") + new String(axis) + " s", width));
        out.add(clip((" ".repeat(labelWidth + 2) + new String(labels)).stripTrailing(), width));
        // Marker labels.
        StringBuilder ml = new StringBuilder(" ".repeat(labelWidth + 2 + cols + 8));
        for (int i = 0; i < markCols.size(); i++) {
            Marker mk = markers.get(i);
            String s = (ascii ? "^ " : "\u25B2 ") + mk.label();
            int start = labelWidth + 2 + markCols.get(i)[0];
            if (start + s.length() > width) {
                s = mk.label() + (ascii ? " ^" : " \u25B2");
                start = Math.max(0, start - s.length() + 1);
            }
            for (int k = 0; k < s.length() && start + k < ml.length(); k++) {
                ml.setCharAt(start + k, s.charAt(k));
            }
        }
        out.add(clip(ml.toString().stripTrailing(), width));
        return out;
    }

    /** A round step (1, 2 or 5 times a power of ten) giving about {@code ticks} intervals over {@code range}. */
    static double niceStep(double range, int ticks) {
        double raw = range / ticks;
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double f = raw / p;
        double nice = f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
        return nice * p;
    }

    private static int decimals(double step) {
        return step >= 1 ? 0 : (int) Math.min(6, Math.ceil(-Math.log10(step) - 1e-9));
    }

    private static double interpolate(double[] t, double[] a, double x) {
        int i = Arrays.binarySearch(t, x);
        if (i >= 0) {
            return a[i];
        }
        int hi = -i - 1;
        if (hi <= 0) {
            return a[0];
        }
        if (hi >= t.length) {
            return a[t.length - 1];
        }
        double f = (x - t[hi - 1]) / (t[hi] - t[hi - 1]);
        return a[hi - 1] + f * (a[hi] - a[hi - 1]);
    }

    private static String pad(String s, int w) {
        return " ".repeat(Math.max(0, w - s.length())) + s;
    }

    private static String clip(String s, int w) {
        return s.length() <= w ? s : s.substring(0, w);
    }
}
