package org.thermion.sim;

import org.thermion.model.Machine;
import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/** Records every change of the machine's output bits on one lane, phase by phase. */
public final class OutputLog {
    private final List<Port> outputs;
    private final int lane;
    private final char[] last;
    private final List<OutputChange> changes = new ArrayList<>();

    /** Takes the outputs' present values on {@code lane} as the starting point. */
    public OutputLog(Simulator sim, int lane) {
        Machine m = sim.machine();
        this.outputs = m.outputs();
        this.lane = lane;
        this.last = new char[outputs.size()];
        for (int i = 0; i < last.length; i++) {
            last[i] = level(sim, outputs.get(i).net(), lane);
        }
    }

    /** The value of a net on a lane as '0', '1' or 'x'. */
    public static char level(Simulator sim, int net, int lane) {
        if ((sim.unknown(net) >>> lane & 1L) != 0) {
            return 'x';
        }
        return (sim.value(net) >>> lane & 1L) != 0 ? '1' : '0';
    }

    /** Compares the outputs with their last values after phase {@code phase} of cycle {@code cycle}. */
    public void observe(Simulator sim, long cycle, int phase) {
        for (int i = 0; i < last.length; i++) {
            char now = level(sim, outputs.get(i).net(), lane);
            if (now != last[i]) {
                changes.add(new OutputChange(cycle, phase, outputs.get(i).name(), now));
                last[i] = now;
            }
        }
    }

    public List<OutputChange> changes() {
        return Collections.unmodifiableList(changes);
    }
}
