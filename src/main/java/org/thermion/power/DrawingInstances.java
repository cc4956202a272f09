package org.thermion.power;

import org.thermion.model.BuiltBlock;
import org.thermion.model.BypassTrigger;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.SoftStart;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.List;

/**
 * Every stage instance of a machine that draws current. Free cells (stage -1) draw
 * nothing and are left out. A soft start bypassed by a warm thyratron adds that
 * thyratron: once the machine runs it has fired and holds the relay, so it sits in its
 * high (conducting) state for good.
 */
public final class DrawingInstances {
    private DrawingInstances() {
    }

    public static List<DrawingInstance> of(Machine m) {
        List<DrawingInstance> out = new ArrayList<>();
        for (Gate g : m.netlist().gates()) {
            if (g.stage() >= 0) {
                out.add(new DrawingInstance(DrawingInstance.Kind.GATE, g.id(), g.stage(), g.module(),
                        m.gateEnvelope(g.id()), g.output(), false));
            }
        }
        for (Latch l : m.netlist().latches()) {
            if (l.stage() >= 0) {
                out.add(new DrawingInstance(DrawingInstance.Kind.LATCH, l.id(), l.stage(), l.module(),
                        m.latchEnvelope(l.id()), l.output(), false));
            }
        }
        for (int i = 0; i < m.softStarts().size(); i++) {
            SoftStart ss = m.softStarts().get(i);
            if (ss.trigger() instanceof BypassTrigger.ThyratronWarm t) {
                int stage = bypassStage(m, t);
                if (stage >= 0) {
                    out.add(new DrawingInstance(DrawingInstance.Kind.BYPASS, i, stage,
                            m.envelopes().get(t.envelope()).module(), t.envelope(), -1, true));
                }
            }
        }
        for (int b = 0; b < m.built().size(); b++) {
            BuiltBlock bb = m.built().get(b);
            for (BuiltBlock.Instances in : bb.stages()) {
                for (int i = 0; i < in.count(); i++) {
                    out.add(new DrawingInstance(DrawingInstance.Kind.BUILT, b, in.stage(), bb.module(), in.envelope(i),
                            -1, false));
                }
            }
        }
        return out;
    }

    /** The relay stage the bypass names: the thyratron relay driver with the trigger's tube, plate resistor and rail. */
    static int bypassStage(Machine m, BypassTrigger.ThyratronWarm t) {
        for (int s = 0; s < m.stages().size(); s++) {
            StageType st = m.stages().get(s);
            if (st.function() == StageFunction.RELAY && st.tube() == t.tube() && st.loadRail() == t.fromRail()
                    && st.loadOhms() == t.plateOhms()) {
                return s;
            }
        }
        return -1;
    }
}
