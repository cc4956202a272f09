package org.thermion.elab;

import org.thermion.lang.Span;

import java.util.ArrayList;
import java.util.List;

/**
 * How a built block (pc, rom, clock) says it is made: its {@code uses} lines, and whether it is
 * declared {@code offboard} (with the reason given, or null).
 */
record BlockSpec(List<Use> uses, boolean offboard, String because, Span offboardSpan) {
    static final BlockSpec NONE = new BlockSpec(List.of(), false, null, Span.none());

    /** One {@code uses N STAGE per UNIT} line; {@code unit} null for {@code once}. */
    record Use(int count, String stage, Span stageSpan, String unit) {
    }

    BlockSpec {
        uses = List.copyOf(uses);
    }

    static BlockSpec read(PropBlock b) {
        List<Use> uses = new ArrayList<>();
        for (PropLine l : b.lines("uses")) {
            String stage = l.word("stage");
            if (stage == null) {
                continue;
            }
            uses.add(new Use((int) l.num("value"), stage, l.span("stage"),
                    "per".equals(l.word("scale")) ? l.word("unit") : null));
        }
        PropLine off = b.line("offboard");
        return new BlockSpec(uses, off != null, off != null && off.has("because") ? off.word("value") : null,
                off != null ? off.prop().span() : Span.none());
    }
}
