package org.thermion.plot;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Draws a {@link Figure} as one SVG 1.1 document (W3C): per panel a framed plot area with
 * round-valued ticks, titled axes, one polyline per curve (split at gaps) and a legend beside
 * it; the figure's footnote below. Each panel's group carries its axis ranges
 * ({@code data-xmin ... data-ymax}) and each curve its legend name ({@code data-name}), so a
 * reader can map the drawing back to values. Our own small writer: the charting libraries on
 * offer draw through AWT and need a further library for SVG, for curves this plain.
 */
public final class SvgWriter {
    /** Written into every picture, so a later run knows the file as its own ({@code OutputFiles}). */
    public static final String GENERATOR = "thermion plot";
    static final double WIDTH = 800, PANEL_HEIGHT = 300, TOP = 44, LEFT = 84, PLOT_WIDTH = 500, PLOT_HEIGHT = 220;
    private static final String[] COLOURS = {"#1f5fa8", "#c2410c", "#15803d", "#7e22ce", "#b91c1c", "#0e7490",
        "#a16207", "#475569"};
    private static final int FOOT_CHARS = 118;

    private SvgWriter() {
    }

    /** The figure as SVG text. */
    public static String write(Figure f) {
        List<String> foot = wrap(f.footnote() == null ? "" : f.footnote(), FOOT_CHARS);
        double height = TOP + f.panels().size() * PANEL_HEIGHT + 16 * foot.size() + 12;
        StringBuilder b = new StringBuilder();
        b.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        b.append("<!-- ").append(GENERATOR).append(" -->\n");
        b.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").append(n(WIDTH))
                .append("\" height=\"").append(n(height)).append("\" viewBox=\"0 0 ").append(n(WIDTH)).append(' ')
                .append(n(height)).append("\" font-family=\"sans-serif\" font-size=\"12\">\n");
        b.append("<title>").append(esc(f.title())).append("</title>\n");
        b.append("<rect width=\"100%\" height=\"100%\" fill=\"white\"/>\n");
        b.append(text(WIDTH / 2, 26, "middle", "figure-title", f.title(), "font-size=\"16\" font-weight=\"bold\""));
        for (int p = 0; p < f.panels().size(); p++) {
            panel(b, f.panels().get(p), TOP + p * PANEL_HEIGHT);
        }
        double y = TOP + f.panels().size() * PANEL_HEIGHT + 4;
        for (String line : foot) {
            b.append(text(16, y, "start", "footnote", line, "font-size=\"11\" fill=\"#7f1d1d\""));
            y += 16;
        }
        b.append("</svg>\n");
        return b.toString();
    }

    private static void panel(StringBuilder b, Panel p, double top) {
        double xmin = Double.POSITIVE_INFINITY, xmax = Double.NEGATIVE_INFINITY;
        double ymin = Double.POSITIVE_INFINITY, ymax = Double.NEGATIVE_INFINITY;
        for (Series s : p.series()) {
            for (int i = 0; i < s.size(); i++) {
                if (Double.isFinite(s.xAt(i)) && Double.isFinite(s.yAt(i))) {
                    xmin = Math.min(xmin, s.xAt(i));
                    xmax = Math.max(xmax, s.xAt(i));
                    ymin = Math.min(ymin, s.yAt(i));
                    ymax = Math.max(ymax, s.yAt(i));
                }
            }
        }
        if (ymin > 0 && ymin < 0.5 * ymax) {
            ymin = 0; // a current or a peak reads best from zero
        }
        Ticks xt = Ticks.of(xmin, xmax), yt = Ticks.of(ymin, ymax);
        double x0 = LEFT, y0 = top + 30, w = PLOT_WIDTH, h = PLOT_HEIGHT;
        Mapping m = new Mapping(xt.low(), xt.high(), yt.low(), yt.high(), x0, y0, w, h);
        b.append("<g class=\"panel\" data-xmin=\"").append(v(xt.low())).append("\" data-xmax=\"").append(v(xt.high()))
                .append("\" data-ymin=\"").append(v(yt.low())).append("\" data-ymax=\"").append(v(yt.high())).append("\">\n");
        b.append(text(x0 + w / 2, top + 18, "middle", "panel-title", p.title(), "font-weight=\"bold\""));
        b.append("<rect class=\"plot-area\" x=\"").append(n(x0)).append("\" y=\"").append(n(y0)).append("\" width=\"")
                .append(n(w)).append("\" height=\"").append(n(h)).append("\" fill=\"none\" stroke=\"#333\"/>\n");
        for (double t : xt.values()) {
            double px = m.px(t);
            b.append(line(px, y0, px, y0 + h, "#e5e7eb"));
            b.append(text(px, y0 + h + 15, "middle", "tick", Ticks.label(t), ""));
        }
        for (double t : yt.values()) {
            double py = m.py(t);
            b.append(line(x0, py, x0 + w, py, "#e5e7eb"));
            b.append(text(x0 - 6, py + 4, "end", "tick", Ticks.label(t), ""));
        }
        b.append(text(x0 + w / 2, y0 + h + 34, "middle", "x-title", p.xTitle(), ""));
        double yc = y0 + h / 2;
        b.append("<text class=\"y-title\" x=\"").append(n(22)).append("\" y=\"").append(n(yc))
                .append("\" text-anchor=\"middle\" transform=\"rotate(-90 22 ").append(n(yc)).append(")\">")
                .append(esc(p.yTitle())).append("</text>\n");
        for (int k = 0; k < p.series().size(); k++) {
            Series s = p.series().get(k);
            String colour = COLOURS[k % COLOURS.length];
            for (String pts : polylines(s, m)) {
                b.append("<polyline class=\"series\" data-name=\"").append(esc(s.name())).append("\" fill=\"none\" stroke=\"")
                        .append(colour).append("\" stroke-width=\"1.5\" points=\"").append(pts).append("\"/>\n");
            }
            double ly = y0 + 10 + k * 18;
            b.append("<g class=\"legend-entry\">");
            b.append(line(x0 + w + 16, ly, x0 + w + 40, ly, colour).replace("stroke-width=\"1\"", "stroke-width=\"3\"").trim());
            b.append(text(x0 + w + 46, ly + 4, "start", "legend", s.name(), "").trim()).append("</g>\n");
        }
        for (Marker mk : p.markers()) {
            double px = m.px(mk.x()), py = m.py(mk.y());
            b.append("<circle class=\"marker\" data-label=\"").append(esc(mk.label())).append("\" cx=\"").append(n(px))
                    .append("\" cy=\"").append(n(py)).append("\" r=\"5\" fill=\"none\" stroke=\"black\" stroke-width=\"2\"/>\n");
            b.append(text(px + 8, py - 8, "start", "marker-label", mk.label(), "font-size=\"11\""));
        }
        b.append("</g>\n");
    }

    /** Pixel strings of a curve, one per unbroken run of finite points. */
    private static List<String> polylines(Series s, Mapping m) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        double lastY = Double.NaN;
        for (int i = 0; i < s.size(); i++) {
            double x = s.xAt(i), y = s.yAt(i);
            if (!Double.isFinite(x) || !Double.isFinite(y)) {
                flush(out, cur);
                lastY = Double.NaN;
                continue;
            }
            if (s.steps() && !Double.isNaN(lastY)) {
                cur.append(n(m.px(x))).append(',').append(n(m.py(lastY))).append(' ');
            }
            cur.append(n(m.px(x))).append(',').append(n(m.py(y))).append(' ');
            lastY = y;
        }
        flush(out, cur);
        return out;
    }

    private static void flush(List<String> out, StringBuilder cur) {
        if (cur.length() > 0) {
            out.add(cur.toString().trim());
            cur.setLength(0);
        }
    }

    /** Data to pixels: y grows upwards in the data and downwards on the page. */
    record Mapping(double xlo, double xhi, double ylo, double yhi, double x0, double y0, double w, double h) {
        double px(double x) {
            return x0 + (x - xlo) / (xhi - xlo) * w;
        }

        double py(double y) {
            return y0 + h - (y - ylo) / (yhi - ylo) * h;
        }
    }

    private static String line(double x1, double y1, double x2, double y2, String colour) {
        return "<line x1=\"" + n(x1) + "\" y1=\"" + n(y1) + "\" x2=\"" + n(x2) + "\" y2=\"" + n(y2) + "\" stroke=\""
                + colour + "\" stroke-width=\"1\"/>\n";
    }

    private static String text(double x, double y, String anchor, String cls, String s, String extra) {
        return "<text class=\"" + cls + "\" x=\"" + n(x) + "\" y=\"" + n(y) + "\" text-anchor=\"" + anchor + "\""
                + (extra.isEmpty() ? "" : " " + extra) + ">" + esc(s) + "</text>\n";
    }

    static List<String> wrap(String s, int width) {
        List<String> lines = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        for (String word : s.split("\\s+")) {
            if (word.isEmpty()) {
                continue;
            }
            if (cur.length() > 0 && cur.length() + 1 + word.length() > width) {
                lines.add(cur.toString());
                cur.setLength(0);
            }
            cur.append(cur.length() == 0 ? "" : " ").append(word);
        }
        if (cur.length() > 0) {
            lines.add(cur.toString());
        }
        return lines;
    }

    /** A pixel coordinate, to 0.01 px. */
    private static String n(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.endsWith(".00") ? s.substring(0, s.length() - 3) : s;
    }

    /** A data value, in full. */
    private static String v(double d) {
        return Double.toString(d);
    }

    static String esc(String s) {
        StringBuilder b = new StringBuilder();
        for (char c : s.toCharArray()) {
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                default -> b.append(c < 0x20 && c != '\t' ? ' ' : c);
            }
        }
        return b.toString();
    }
}
