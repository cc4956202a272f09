package org.thermion.elab;

import java.util.List;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.Prop;
import org.thermion.model.MarginRules;

/** Reads the {@code margins { ... }} block against {@link PropertyTable#MARGINS}; defaults where not given. */
final class MarginsReader {
    private MarginsReader() {
    }

    static MarginRules read(List<Prop> blocks, Diagnostics diags) {
        if (blocks.isEmpty()) {
            return MarginRules.DEFAULT;
        }
        if (blocks.size() > 1) {
            diags.error(blocks.get(1).key().span(), "more than one margins block", "keep one `margins { ... }`");
        }
        Prop p = blocks.get(0);
        if (!p.values().isEmpty()) {
            diags.error(p.values().get(0).span(), "a margins block takes no name", "write `margins { ... }`");
        }
        PropBlock b = PropBlock.read(PropertyTable.MARGINS, p, "margins", p.key().span(), diags);
        return new MarginRules(b.num("rails") / 100, b.num("resistors") / 100, b.num("endoflife") / 100,
                b.num("minimum"));
    }
}
