package org.thermion.plot;

import java.util.List;

/**
 * One plot area: its title, the two axes' titles with their units ({@code "time (s)"}), the
 * curves drawn in it and the points marked on it (a balance point, a bypass).
 */
public record Panel(String title, String xTitle, String yTitle, List<Series> series, List<Marker> markers) {
    public Panel {
        series = List.copyOf(series);
        markers = List.copyOf(markers);
    }

    /** A panel without markers. */
    public Panel(String title, String xTitle, String yTitle, List<Series> series) {
        this(title, xTitle, yTitle, series, List.of());
    }
}
