package org.thermion.lang;

import org.thermion.text.Nouns;
import java.io.PrintWriter;

/**
 * Renders diagnostics as {@code file:line:col: error: message}, the source line,
 * a caret under the span and the hint.
 */
public final class DiagnosticPrinter {
    /** Longest stretch of a source line quoted under a message. */
    static final int WINDOW = 120;

    private final SourceSet sources;
    private final LanguageSections sections;

    public DiagnosticPrinter(SourceSet sources) {
        this(sources, false);
    }

    /** With {@code pointers}, each error also names the section of the language reference that explains it. */
    public DiagnosticPrinter(SourceSet sources, boolean pointers) {
        this.sources = sources;
        this.sections = pointers ? new LanguageSections(sources) : null;
    }

    public void print(Diagnostics diags, PrintWriter out) {
        for (Diagnostic d : diags.all()) {
            out.print(format(d));
        }
        if (diags.dropped() > 0) {
            out.println("... and " + diags.dropped() + " more errors not shown");
        }
        int e = diags.errorCount();
        int w = diags.warnings().size();
        if (e > 0 || w > 0) {
            out.println(Nouns.count(e, "error") + ", " + Nouns.count(w, "warning"));
        }
        out.flush();
    }

    /** Tabs as spaces and other control characters as '?', so the caret stays under its column. */
    private static String visible(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            b.append(c == '\t' ? ' ' : c < 0x20 || c == 0x7F ? '?' : c);
        }
        return b.toString();
    }

    public String format(Diagnostic d) {
        StringBuilder sb = new StringBuilder();
        Span s = d.span();
        String kind = d.severity().name().toLowerCase();
        if (s != null && s.isKnown()) {
            sb.append(s.file()).append(':').append(s.line()).append(':').append(s.col()).append(": ");
        }
        sb.append(kind).append(": ").append(d.message()).append('\n');
        if (s != null && s.isKnown()) {
            String text = sources.line(s.file(), s.line());
            if (text != null) {
                String shown = visible(text);
                int start = Math.max(0, Math.min(s.col() - 1, shown.length()));
                int end = s.endLine() == s.line() ? s.endCol() - 1 : shown.length();
                int width = Math.max(1, Math.min(end, shown.length()) - start);
                // A very long line is shown as a window around the caret.
                int from = shown.length() <= WINDOW ? 0 : Math.max(0, Math.min(start - WINDOW / 2, shown.length() - WINDOW));
                int to = Math.min(shown.length(), from + WINDOW);
                String lead = from > 0 ? "..." : "";
                sb.append("  ").append(lead).append(shown, from, to).append(to < shown.length() ? "..." : "").append('\n');
                width = Math.max(1, Math.min(width, to - start));
                sb.append("  ").append(" ".repeat(lead.length() + start - from)).append('^').append("~".repeat(width - 1)).append('\n');
            }
        }
        if (d.hint() != null && !d.hint().isEmpty()) {
            sb.append("  = ").append(d.hint()).append('\n');
        }
        String pointer = sections != null && d.isError() ? sections.pointer(d) : null;
        if (pointer != null) {
            sb.append("  = language reference: ").append(pointer).append('\n');
        }
        return sb.toString();
    }
}
