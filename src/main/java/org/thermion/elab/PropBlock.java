package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The lines of one block read against its {@link PropertyTable}: unknown keys (with the
 * nearest known one), a key given twice, a block where none belongs and missing required
 * keys are reported here, once for every kind of block; the values are range-checked by
 * {@link PropReader}. Lines with an error are dropped, so their defaults apply.
 */
final class PropBlock {
    private final PropertyTable table;
    private final Map<String, List<PropLine>> lines = new LinkedHashMap<>();
    private final Map<String, PropBlock> nested = new HashMap<>();
    /** Keys written with at least one line dropped for an error (already reported). */
    private final java.util.Set<String> rejected = new java.util.HashSet<>();

    private PropBlock(PropertyTable table) {
        this.table = table;
    }

    /**
     * Reads the block of {@code owner} (a {@code rail NAME { ... }} line or a nested one);
     * {@code title} names it in messages about missing keys, e.g. {@code rail 'bplus'}.
     */
    static PropBlock read(PropertyTable table, Prop owner, String title, Span titleSpan, Diagnostics diags) {
        PropBlock b = new PropBlock(table);
        Map<String, Span> seen = new HashMap<>();
        for (Prop q : owner.block()) {
            String key = q.key().text();
            Property p = table.get(key);
            if (p == null) {
                diags.error(q.key().span(), "unknown property '" + key + "' in " + table.kind,
                        Declarations.hintFor(key, table.keys(), "expected one of: " + String.join(", ", table.keys())));
                continue;
            }
            Span earlier = seen.putIfAbsent(key, q.key().span());
            if (earlier != null && !p.repeatable()) {
                diags.error(q.key().span(), "'" + key + "' given twice in " + title,
                        "first given at line " + earlier.line() + ", column " + earlier.col() + "; keep one");
                continue;
            }
            if (q.hasBlock() && p.block() == null) {
                diags.error(q.key().span(), "'" + key + "' takes no block", "write its values on the line");
                continue;
            }
            if (p.block() != null) {
                b.nested.put(key, read(p.block(), q, title + "'s " + key, q.key().span(), diags));
            }
            PropLine line = new PropReader(q, diags).line(p);
            if (line != null) {
                b.lines.computeIfAbsent(key, k -> new ArrayList<>()).add(line);
            } else {
                b.rejected.add(key);
            }
        }
        for (Property p : table.properties) {
            if (p.isRequired() && !seen.containsKey(p.key())) {
                diags.error(titleSpan, title + " has no " + p.key(), "add `" + p.example() + "` (" + p.meaning() + ")");
            }
        }
        return b;
    }

    /** The line given for {@code key} (the last one of a repeatable key), or null. */
    PropLine line(String key) {
        List<PropLine> l = lines.get(key);
        return l == null ? null : l.get(l.size() - 1);
    }

    List<PropLine> lines(String key) {
        return lines.getOrDefault(key, List.of());
    }

    boolean has(String key) {
        return lines.containsKey(key);
    }

    /** True when a line of {@code key} was written but dropped for an error already reported. */
    boolean rejected(String key) {
        return rejected.contains(key);
    }

    /** The main number of {@code key}, or the table's default (NaN where it has none). */
    double num(String key) {
        PropLine l = line(key);
        return l != null ? l.num() : property(key).dflt();
    }

    /** The nested block of {@code key}; an empty one (all defaults) when not given. */
    PropBlock nested(String key) {
        PropBlock b = nested.get(key);
        return b != null ? b : new PropBlock(property(key).block());
    }

    /** True when the nested block {@code key} was written. */
    boolean hasBlock(String key) {
        return nested.containsKey(key);
    }

    private Property property(String key) {
        Property p = table.get(key);
        if (p == null) {
            throw new IllegalArgumentException("no property '" + key + "' in the " + table.kind + " table");
        }
        return p;
    }
}
