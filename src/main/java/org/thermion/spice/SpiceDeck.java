package org.thermion.spice;

import java.util.ArrayList;
import java.util.List;

/**
 * A SPICE3 deck: the title line, then comment lines and element cards in order, then the
 * control lines ({@code .op}, {@code .end}). {@link #text()} writes it with lines wrapped at
 * {@link #WIDTH} columns by SPICE's '+' continuation.
 */
public record SpiceDeck(String title, List<Line> lines) {
    /** Longest line written. */
    public static final int WIDTH = 78;

    /** A comment or an element card. */
    public record Line(String comment, SpiceCard card) {
        public static Line note(String text) {
            return new Line(text, null);
        }

        public static Line of(SpiceCard card) {
            return new Line(null, card);
        }
    }

    public SpiceDeck {
        lines = List.copyOf(lines);
    }

    /** The element cards alone. */
    public List<SpiceCard> cards() {
        List<SpiceCard> out = new ArrayList<>();
        for (Line l : lines) {
            if (l.card() != null) {
                out.add(l.card());
            }
        }
        return out;
    }

    /** The card named {@code name} (case-insensitive, as SPICE reads names), or null. */
    public SpiceCard card(String name) {
        for (SpiceCard c : cards()) {
            if (c.name().equalsIgnoreCase(name)) {
                return c;
            }
        }
        return null;
    }

    /** The deck as text. */
    public String text() {
        StringBuilder sb = new StringBuilder();
        sb.append(title.replace('\n', ' ')).append('\n');
        for (Line l : lines) {
            if (l.card() == null) {
                wrapComment(sb, l.comment());
            } else {
                wrap(sb, l.card().line());
            }
        }
        sb.append(".op\n.end\n");
        return sb.toString();
    }

    /** A comment, broken at spaces into lines of at most {@link #WIDTH} columns, each starting "* ". */
    private static void wrapComment(StringBuilder sb, String text) {
        if (text.isEmpty()) {
            sb.append("*\n");
            return;
        }
        String rest = text;
        while (rest.length() + 2 > WIDTH) {
            int cut = rest.lastIndexOf(' ', WIDTH - 2);
            if (cut <= 0) {
                break;
            }
            sb.append("* ").append(rest, 0, cut).append('\n');
            rest = rest.substring(cut + 1);
        }
        sb.append("* ").append(rest).append('\n');
    }

    /** Breaks a long card at spaces; each continuation starts with "+ ". */
    private static void wrap(StringBuilder sb, String line) {
        String rest = line;
        String lead = "";
        while (lead.length() + rest.length() > WIDTH) {
            int room = WIDTH - lead.length();
            int cut = rest.lastIndexOf(' ', room);
            if (cut <= 0) {
                cut = rest.indexOf(' ', room);
                if (cut < 0) {
                    break;
                }
            }
            sb.append(lead).append(rest, 0, cut).append('\n');
            rest = rest.substring(cut + 1);
            lead = "+ ";
        }
        sb.append(lead).append(rest).append('\n');
    }
}
