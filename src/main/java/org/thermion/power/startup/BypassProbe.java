package org.thermion.power.startup;

import org.hipparchus.ode.sampling.ODEStateInterpolator;

import java.util.Arrays;

/**
 * Asks this run (which holds every relay open) what closing soft start {@code soft}'s bypass at
 * each of {@code times} (ascending) would give: the rail's switch-on peak up to then, its current
 * the instant after closing (the bypass peak, since warming heaters only lower it afterwards), and
 * the continuous rating the resistor's temperature rise asks by then. One trajectory serves every
 * bypass time up to the moment of bypass.
 */
final class BypassProbe {
    private final TransientCircuit circuit;
    private final SoftStartState probed;
    private final double[] times;
    private int next;
    private final double[] on;
    private final double[] by;
    private final double[] watts;

    BypassProbe(TransientCircuit circuit, int soft, double[] times) {
        this.circuit = circuit;
        this.probed = circuit.softs[soft];
        this.times = times.clone();
        on = new double[times.length];
        by = new double[times.length];
        watts = new double[times.length];
        Arrays.fill(on, Double.NaN);
        Arrays.fill(by, Double.NaN);
        Arrays.fill(watts, Double.NaN);
    }

    /** Takes every probe due by the end of the step just taken, {@code tc}. */
    void takeDue(ODEStateInterpolator in, double tc) {
        while (next < times.length && times[next] <= tc + 1e-12) {
            double tp = Math.min(times[next], tc);
            take(next++, in.getInterpolatedState(tp).getPrimaryState());
        }
    }

    private void take(int i, double[] y) {
        RailState rail = circuit.rails[probed.soft.rail()];
        circuit.evaluate(y);
        on[i] = Math.max(rail.peakOn, rail.amps);
        watts[i] = Math.max(probed.neededWatts, y[probed.heat]);
        probed.bypassed = true;
        circuit.evaluate(y);
        by[i] = rail.amps;
        probed.bypassed = false;
        circuit.evaluate(y);
    }

    double[] switchOn() {
        return on.clone();
    }

    double[] bypass() {
        return by.clone();
    }

    double[] watts() {
        return watts.clone();
    }
}
