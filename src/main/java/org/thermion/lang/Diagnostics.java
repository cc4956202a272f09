package org.thermion.lang;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Collects diagnostics for one run. After {@link #LIMIT} errors further ones are
 * counted but not kept, so a badly broken file still gives a readable report.
 */
public final class Diagnostics {
    public static final int LIMIT = 20;

    private final List<Diagnostic> items = new ArrayList<>();
    /**
     * Every placed diagnostic kept or counted: a second report of the same words at the same place is dropped
     * (unplaced ones are not: a caller may count errors past the limit with alike placeholders).
     */
    private final java.util.Set<Diagnostic> seen = new java.util.HashSet<>();
    private int errors;
    private int dropped;

    public void error(Span span, String message, String hint) {
        add(Diagnostic.error(span, message, hint));
    }

    public void error(Span span, String message) {
        add(Diagnostic.error(span, message, null));
    }

    public void warning(Span span, String message, String hint) {
        add(Diagnostic.warning(span, message, hint));
    }

    public void add(Diagnostic d) {
        if (d.span() != null && d.span().isKnown() && !seen.add(d)) {
            return; // two readers of one line (a stage's rail checked for its load and for its circuit) said it alike
        }
        if (d.isError()) {
            errors++;
            if (errors > LIMIT) {
                dropped++;
                return;
            }
        }
        items.add(d);
    }

    public boolean hasErrors() {
        return errors > 0;
    }

    public int errorCount() {
        return errors;
    }

    /** True once the error limit is reached; long-running stages may stop early. */
    public boolean full() {
        return errors >= LIMIT;
    }

    public int dropped() {
        return dropped;
    }

    public List<Diagnostic> all() {
        return Collections.unmodifiableList(items);
    }

    public List<Diagnostic> warnings() {
        return items.stream().filter(d -> d.severity() == Diagnostic.Severity.WARNING).toList();
    }
}
