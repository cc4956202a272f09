package org.thermion.elab;

import java.util.List;
import java.util.Map;

/**
 * The language reference for property blocks, rendered from the {@link PropertyTable}s as
 * Markdown: one table per block kind with each key's values, units, allowed range, default
 * and source. {@code src/docs/properties.md} is this text; a test keeps the two equal.
 */
public final class PropertyReference {
    private PropertyReference() {
    }

    /** Every block kind's table as Markdown. */
    public static String markdown() {
        StringBuilder b = new StringBuilder();
        b.append("# Property blocks\n\n");
        b.append("Generated from the property tables (`org.thermion.elab.PropertyTable`); do not edit by hand.\n");
        b.append("Values in `<angle brackets>` are numbers with a unit word (V, mA, k, pF ...), `[...]` is optional,\n");
        b.append("`a|b` one of the words. Required keys are marked with *.\n");
        for (PropertyTable t : PropertyTable.ALL) {
            b.append("\n## ").append(t.kind).append("\n\n`").append(t.heading).append("`\n\n");
            b.append("| key | values | allowed | default | source |\n|---|---|---|---|---|\n");
            for (Property p : t.properties) {
                b.append("| `").append(p.key()).append('`').append(p.isRequired() ? " *" : "")
                        .append(" | ").append(cell(syntax(p))).append(" — ").append(cell(p.meaning()))
                        .append(" | ").append(cell(ranges(p.slots())))
                        .append(" | ").append(cell(defaultText(p)))
                        .append(" | ").append(cell(p.source())).append(" |\n");
            }
        }
        return b.toString();
    }

    /** The line as written: {@code load <ohms> from <rail>}. */
    static String syntax(Property p) {
        String s = slots(p.slots());
        String line = s.isEmpty() ? p.key() : p.key() + " " + s;
        return "`" + line + (p.block() != null ? " { ... }" : "") + "`";
    }

    private static String slots(List<Slot> slots) {
        StringBuilder b = new StringBuilder();
        for (Slot s : slots) {
            if (b.length() > 0) {
                b.append(' ');
            }
            b.append(slot(s));
        }
        return b.toString();
    }

    private static String slot(Slot s) {
        if (s instanceof Slot.Quantity q) {
            return "<" + q.unit().plural() + ">";
        } else if (s instanceof Slot.Plain) {
            return "<number>";
        } else if (s instanceof Slot.Whole) {
            return "<n>";
        } else if (s instanceof Slot.Name n) {
            return n.choices().isEmpty() ? "<" + n.id() + ">" : String.join("|", n.choices());
        } else if (s instanceof Slot.Names n) {
            return "<" + n.id() + ">...";
        } else if (s instanceof Slot.Text) {
            return "\"text\"";
        } else if (s instanceof Slot.Word w) {
            return w.word();
        } else if (s instanceof Slot.Optional o) {
            return "[" + (o.then().isEmpty() ? o.word() : o.word() + " " + slots(o.then())) + "]";
        } else if (s instanceof Slot.Choice c) {
            StringBuilder b = new StringBuilder();
            for (Map.Entry<String, List<Slot>> e : c.branches().entrySet()) {
                b.append(b.length() > 0 ? " | " : "").append(e.getKey());
                if (!e.getValue().isEmpty()) {
                    b.append(' ').append(slots(e.getValue()));
                }
            }
            if (c.otherwise() != null) {
                b.append(" | ").append(slots(c.otherwise()));
            }
            return "(" + b + ")";
        } else if (s instanceof Slot.AnyOrder a) {
            StringBuilder b = new StringBuilder();
            for (Slot.Optional o : a.options()) {
                b.append(b.length() > 0 ? " " : "").append(slot(o));
            }
            return b.toString();
        }
        throw new IllegalArgumentException("unknown slot " + s);
    }

    /** The allowed ranges of the line's numbers: "plate load above 0 ohm and at most 100 M". */
    private static String ranges(List<Slot> slots) {
        StringBuilder b = new StringBuilder();
        for (Slot s : slots) {
            String r = range(s);
            if (!r.isEmpty()) {
                b.append(b.length() > 0 ? "; " : "").append(r);
            }
        }
        return b.toString();
    }

    private static String range(Slot s) {
        if (s instanceof Slot.Quantity q) {
            return q.what() + " " + PropReader.rangeText(q.range(), q.unit());
        } else if (s instanceof Slot.Plain p) {
            return p.what() + " " + PropReader.rangeText(p.range(), null);
        } else if (s instanceof Slot.Whole w) {
            return w.what() + " from " + w.min() + " to " + w.max();
        } else if (s instanceof Slot.Optional o) {
            return ranges(o.then());
        } else if (s instanceof Slot.Choice c) {
            StringBuilder b = new StringBuilder();
            c.branches().values().forEach(v -> b.append(ranges(v)));
            if (c.otherwise() != null) {
                b.append(ranges(c.otherwise()));
            }
            return b.toString();
        } else if (s instanceof Slot.AnyOrder a) {
            return ranges(List.copyOf(a.options()));
        }
        return "";
    }

    private static String defaultText(Property p) {
        if (!p.defaultRule().isEmpty()) {
            return p.defaultRule();
        }
        if (Double.isNaN(p.dflt())) {
            return p.isRequired() ? "required" : "";
        }
        for (Slot s : p.slots()) {
            if (s instanceof Slot.Quantity q) {
                return q.unit().format(p.dflt());
            }
        }
        return Unit.number(p.dflt());
    }

    private static String cell(String text) {
        return text.replace("|", "\\|").replace("\n", " ");
    }
}
