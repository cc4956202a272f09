package org.thermion.power;

import java.util.List;
import java.util.function.IntPredicate;

import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.StageType;

/**
 * The rails' voltages with the machine in one logic state: each rail its declared voltage less
 * its source resistance times what that state draws from it (each stage instance at the draw of
 * its output there, heater strings at their steady state; loads as conductances, as the budget's
 * supply check takes them). A built block the simulation does not model (program counter, clock
 * generator) is counted halfway between its lowest and highest draw. What a meter reads on each
 * rail with the machine held in that state.
 */
public final class StateRails {
    private final Machine m;
    private final StageDraw draw;
    private final List<DrawingInstance> instances;
    private final HeaterAnalysis heaters;

    public StateRails(Machine m, StageDraw draw) {
        this.m = m;
        this.draw = draw;
        this.instances = DrawingInstances.of(m);
        this.heaters = new HeaterAnalysis(m);
    }

    /** Each rail's voltage (signed, in the machine's rail order) with net {@code n} high when {@code high.test(n)}. */
    public double[] volts(IntPredicate high) {
        int rails = m.rails().size();
        double[] amps = new double[rails];
        for (DrawingInstance d : instances) {
            StageType st = m.stages().get(d.stage());
            for (int r = 0; r < rails; r++) {
                if (d.unsimulated()) {
                    amps[r] += 0.5 * (draw.minAmps(st, r) + draw.maxAmps(st, r));
                } else {
                    amps[r] += draw.amps(st, r, d.followsNet() ? high.test(d.net()) : d.fixedHigh());
                }
            }
        }
        double[] out = new double[rails];
        for (int r = 0; r < rails; r++) {
            Rail rail = m.rails().get(r);
            out[r] = Math.signum(rail.volts()) * LoadedRail.volts(rail, heaters, r, amps[r]);
        }
        return out;
    }
}
