package org.thermion.elab;

import org.thermion.lang.Span;

import java.util.HashMap;
import java.util.Map;

/**
 * Decides the inverters {@link StageMapper} left open once every driver is known, so the
 * netlist does not depend on whether a latch is declared before or after the places that read
 * its complement: an inverter of a latch output becomes a wire from the flip-flop's free
 * second output, an inverter of that complement a wire from the latch itself, and any other
 * stays an inverter tube, shared with an identical one (an error when no stage realizes {@code !}).
 */
final class ComplementResolver {
    private ComplementResolver() {
    }

    static void resolve(StageMapper mapper) {
        NetBuilder nb = mapper.nb;
        // A candidate's temporary output that became a plain copy of another net.
        Map<Integer, Integer> alias = new HashMap<>();
        for (int g : mapper.candidates) {
            NetBuilder.GateB gate = nb.gates.get(g);
            int in = alias.getOrDefault(gate.in[0], gate.in[0]);
            Integer source = nb.complementSource.get(in);
            int from;
            if (nb.isLatchOutput(in)) {
                from = nb.complementOf(in);
            } else if (source != null) {
                from = source;
            } else if (gate.stage < 0) {
                mapper.needStage("not", "!", gate.span == null ? Span.none() : gate.span);
                continue;
            } else {
                // A real inverter: the same stage named outright on the same net serves both,
                // as it would have had the driver been known when the inverter was asked for.
                from = nb.shareDecided(g);
                if (from < 0) {
                    continue;
                }
            }
            nb.rewire(g, from);
            alias.put(gate.out, from);
        }
    }
}
