package org.thermion.cli;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.thermion.elab.SourceMap;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.levels.Finding;

/**
 * {@code check}'s electrical findings as diagnostics at the stage use (heater rule, soft start) they
 * concern. A line that places many stages (a module used many times, a loop) gets one
 * diagnostic per kind of finding: the worst one, and how many more there are.
 */
final class ElectricalDiagnostics {
    private ElectricalDiagnostics() {
    }

    static Diagnostics of(List<Finding> findings, SourceMap where) {
        Map<String, Finding> first = new LinkedHashMap<>();
        Map<String, Integer> count = new LinkedHashMap<>();
        Map<String, Span> spans = new LinkedHashMap<>();
        for (Finding f : findings) {
            Span s = f.use() != null ? (f.use().latch() ? where.latch(f.use().index()) : where.gate(f.use().index()))
                    : f.softStart() >= 0 ? where.softStart(f.softStart())
                    : f.rail() >= 0 ? where.rail(f.rail()) : where.heaterRule(f.heaterRule());
            String key = s + "|" + f.kind() + "|" + f.error();
            if (first.putIfAbsent(key, f) == null) {
                spans.put(key, s);
            }
            count.merge(key, 1, Integer::sum);
        }
        Diagnostics d = new Diagnostics();
        for (Map.Entry<String, Finding> e : first.entrySet()) {
            Finding f = e.getValue();
            int more = count.get(e.getKey()) - 1;
            String msg = f.message() + (more > 0 ? " (and " + more + " more like it from this line)" : "");
            if (f.error()) {
                d.error(spans.get(e.getKey()), msg, f.fix());
            } else {
                d.warning(spans.get(e.getKey()), msg, f.fix());
            }
        }
        return d;
    }
}
