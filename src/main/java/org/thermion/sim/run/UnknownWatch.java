package org.thermion.sim.run;

import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.sim.Simulator;
import org.thermion.sim.UnknownReport;

import java.util.ArrayList;
import java.util.List;

/**
 * In a three-valued run, reports where an unknown value reaches an output (once per output) or
 * decides the jump, and which outputs are still unknown at the end. Lane 0.
 */
public final class UnknownWatch implements RunObserver {
    private final Simulator sim;
    private final Machine machine;
    private final List<Port> outputs;
    private final boolean[] known;
    private final boolean[] reported;
    private final int[] outputLatch;
    private final int pcPhase;
    private boolean jumpReported;
    private final List<UnknownReport> reports = new ArrayList<>();

    public UnknownWatch(Simulator sim) {
        this.sim = sim;
        this.machine = sim.machine();
        this.outputs = machine.outputs();
        this.known = new boolean[outputs.size()];
        this.reported = new boolean[outputs.size()];
        this.outputLatch = new int[outputs.size()];
        int[] latchOfNet = new int[machine.netlist().netCount()];
        java.util.Arrays.fill(latchOfNet, -1);
        List<Latch> latches = machine.netlist().latches();
        for (int i = 0; i < latches.size(); i++) {
            latchOfNet[latches.get(i).output()] = i;
        }
        for (int o = 0; o < outputLatch.length; o++) {
            outputLatch[o] = latchOfNet[outputs.get(o).net()];
        }
        this.pcPhase = machine.pc() == null ? -1 : machine.pc().phase();
    }

    private boolean unknown(int net) {
        return (sim.unknown(net) & 1L) != 0;
    }

    @Override
    public void begin(long cycle) {
        for (int o = 0; o < known.length; o++) {
            known[o] = !unknown(outputs.get(o).net());
        }
    }

    @Override
    public void phaseSettled(long cycle, int phase) {
        if (!sim.threeValued()) {
            return;
        }
        for (int o = 0; o < outputs.size(); o++) {
            boolean x = unknown(outputs.get(o).net());
            if (x && !reported[o]) {
                String what = null;
                if (known[o]) {
                    what = "output becomes unknown";
                } else if (outputLatch[o] >= 0 && loadedNow(machine.netlist().latches().get(outputLatch[o]), phase)) {
                    what = "output latch loaded with an unknown value";
                }
                if (what != null) {
                    reports.add(new UnknownReport(cycle, phase, outputs.get(o).name(), what));
                    reported[o] = true;
                }
            }
            known[o] |= !x;
        }
        if (phase == pcPhase && !jumpReported && unknown(machine.pc().jumpNet())) {
            reports.add(new UnknownReport(cycle, phase, machine.netlist().netName(machine.pc().jumpNet()),
                    "jump decision unknown"));
            jumpReported = true;
        }
    }

    private boolean loadedNow(Latch l, int phase) {
        if (l.phase() != phase) {
            return false;
        }
        // An enable that is 1 or unknown may have loaded the latch.
        return l.enable() < 0 || ((sim.value(l.enable()) | sim.unknown(l.enable())) & 1L) != 0;
    }

    @Override
    public void end(long cycles, Halt halt) {
        if (!sim.threeValued()) {
            return;
        }
        for (int o = 0; o < outputs.size(); o++) {
            if (!reported[o] && unknown(outputs.get(o).net())) {
                reports.add(new UnknownReport(cycles, 0, outputs.get(o).name(), "output still unknown at the end of the run"));
            }
        }
    }

    public List<UnknownReport> reports() {
        return List.copyOf(reports);
    }
}
