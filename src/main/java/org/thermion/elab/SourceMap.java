package org.thermion.elab;

import java.util.List;

import org.thermion.lang.Span;
import org.thermion.model.MarginRules;

/**
 * Where an elaborated machine's parts were written, for messages about them: each gate's
 * (in the netlist's levelized order) and each latch's stage use, each heater rule's line, each
 * soft start's bypass line, each rail's name in its declaration (in the machine's rail order), and
 * the machine's margin rules (the {@code margins} block, or the defaults).
 */
public record SourceMap(List<Span> gates, List<Span> latches, List<Span> heaterRules, List<Span> softStarts,
                        List<Span> rails, MarginRules margins) {
    public SourceMap {
        gates = List.copyOf(gates);
        latches = List.copyOf(latches);
        heaterRules = List.copyOf(heaterRules);
        softStarts = List.copyOf(softStarts);
        rails = List.copyOf(rails);
    }

    /** No locations known (a machine built without source), default rules. */
    public static final SourceMap NONE = new SourceMap(List.of(), List.of(), List.of(), List.of(), List.of(),
            MarginRules.DEFAULT);

    /** The span of rail {@code index}'s name where it is declared, or {@link Span#none()}. */
    public Span rail(int index) {
        return index >= 0 && index < rails.size() ? rails.get(index) : Span.none();
    }

    /** The span of soft start {@code index}'s bypass line (in the machine's order), or {@link Span#none()}. */
    public Span softStart(int index) {
        return index >= 0 && index < softStarts.size() ? softStarts.get(index) : Span.none();
    }

    /** The span of gate {@code id}, or {@link Span#none()}. */
    public Span gate(int id) {
        return id >= 0 && id < gates.size() ? gates.get(id) : Span.none();
    }

    /** The span of latch {@code id}, or {@link Span#none()}. */
    public Span latch(int id) {
        return id >= 0 && id < latches.size() ? latches.get(id) : Span.none();
    }

    /** The span of heater rule {@code index}, or {@link Span#none()}. */
    public Span heaterRule(int index) {
        return index >= 0 && index < heaterRules.size() ? heaterRules.get(index) : Span.none();
    }
}
