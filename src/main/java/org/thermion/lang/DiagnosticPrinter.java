package org.thermion.lang;

import java.io.PrintWriter;

/**
 * Renders diagnostics as {@code file:line:col: error: message}, the source line,
 * a caret under the span and the hint.
 */
public final class DiagnosticPrinter {
    private final SourceSet sources;

    public DiagnosticPrinter(SourceSet sources) {
        this.sources = sources;
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
            out.println(plural(e, "error") + ", " + plural(w, "warning"));
        }
        out.flush();
    }

    private static String plural(int n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
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
                String shown = text.replace('\t', ' ');
                sb.append("  ").append(shown).append('\n');
                int start = Math.max(0, Math.min(s.col() - 1, shown.length()));
                int end = s.endLine() == s.line() ? s.endCol() - 1 : shown.length();
                int width = Math.max(1, Math.min(end, shown.length()) - start);
                sb.append("  ").append(" ".repeat(start)).append('^').append("~".repeat(width - 1)).append('\n');
            }
        }
        if (d.hint() != null && !d.hint().isEmpty()) {
            sb.append("  = ").append(d.hint()).append('\n');
        }
        return sb.toString();
    }
}
