package org.thermion.plot;

import java.util.List;

/**
 * A picture of one or more panels stacked one above the other, sharing a title and a closing
 * line (the caution a power report carries). Values, not drawing: {@link SvgWriter} draws it.
 */
public record Figure(String title, List<Panel> panels, String footnote) {
    public Figure {
        if (panels.isEmpty()) {
            throw new IllegalArgumentException("a figure needs at least one panel");
        }
        panels = List.copyOf(panels);
    }
}
