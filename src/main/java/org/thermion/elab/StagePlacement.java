package org.thermion.elab;

import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Puts every stage instance into an envelope, in an order that does not depend on the order of
 * the statements that made them: by module, tube type, sections (widest first), then gates
 * before latches in creation order. The packer fills each module's open envelope of a type in
 * turn, so the order it is given decides the tube count; widest first also wastes fewer sections.
 */
final class StagePlacement {
    final int[] gateEnvelope;
    final int[] latchEnvelope;

    private StagePlacement(int[] gateEnvelope, int[] latchEnvelope) {
        this.gateEnvelope = gateEnvelope;
        this.latchEnvelope = latchEnvelope;
    }

    /** One stage instance waiting for its envelope. */
    private record Item(int module, int tube, int sections, boolean latch, int index) {
    }

    static StagePlacement place(NetBuilder nb, Parts parts, Packer packer) {
        List<Item> items = new ArrayList<>();
        for (int i = 0; i < nb.gates.size(); i++) {
            NetBuilder.GateB g = nb.gates.get(i);
            if (g.stage >= 0) {
                StageType st = parts.stages.get(g.stage);
                items.add(new Item(g.module, st.tube(), st.sectionsFor(g.in.length), false, i));
            }
        }
        for (int i = 0; i < nb.latches.size(); i++) {
            NetBuilder.LatchB l = nb.latches.get(i);
            if (l.stage() >= 0) {
                StageType st = parts.stages.get(l.stage());
                items.add(new Item(l.module(), st.tube(), st.sectionsFor(1), true, i));
            }
        }
        items.sort(Comparator.comparingInt(Item::module).thenComparingInt(Item::tube)
                .thenComparing(Comparator.comparingInt(Item::sections).reversed())
                .thenComparing(Item::latch).thenComparingInt(Item::index));
        int[] gateEnvelope = new int[nb.gates.size()];
        int[] latchEnvelope = new int[nb.latches.size()];
        java.util.Arrays.fill(gateEnvelope, -1);
        java.util.Arrays.fill(latchEnvelope, -1);
        for (Item it : items) {
            int env = packer.place(it.tube(), it.module(), it.sections(), it.latch(), it.index());
            (it.latch() ? latchEnvelope : gateEnvelope)[it.index()] = env;
        }
        return new StagePlacement(gateEnvelope, latchEnvelope);
    }
}
