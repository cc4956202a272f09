package org.thermion.power;

import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.StageType;
import org.thermion.model.TubeKind;
import org.thermion.model.TubeType;

/**
 * An approximate plate dissipation for a stage instance in one output state, in watts.
 * Without a tube model the plate voltage is not known, so: the current a stage draws from
 * the positive rail its plate load hangs on is taken to flow through that load, and the
 * tube to drop what the load leaves of the rail, but never less than the current times the
 * stage's conducting resistance ({@code ron}), since a declared draw may include screen
 * current that bypasses the load: {@code P = I x max(V - I x Rload, I x Ron)}, at most
 * {@code I x V}. Current from another positive rail (a cathode follower's plate) is taken
 * at the full rail voltage, an upper bound. A conducting gas thyratron drops its arc
 * voltage, {@code P = I x Varc}. Draws from negative rails feed grid dividers and cathode
 * resistors: resistor losses, not counted here. Used for declared figures only: where a stage's
 * figures are computed, {@link StageDraw#plateWatts} takes the tubes' own dissipation.
 */
public final class PlateDissipation {
    private PlateDissipation() {
    }

    /** The approximation for a stage whose draws are {@code amps} per rail (declared figures) in that state. */
    static double watts(Machine m, StageType st, double[] amps) {
        TubeType tube = m.tubes().get(st.tube());
        double w = 0;
        for (int r = 0; r < m.rails().size(); r++) {
            Rail rail = m.rails().get(r);
            if (rail.volts() <= 0) {
                continue;
            }
            double i = amps[r];
            if (i <= 0) {
                continue;
            }
            if (r == st.loadRail() && tube.kind() == TubeKind.THYRATRON && !Double.isNaN(tube.arcDropVolts())) {
                w += i * tube.arcDropVolts();
            } else if (r == st.loadRail() && st.loadOhms() > 0 && !Double.isNaN(st.loadOhms())) {
                double ron = Double.isNaN(st.outputOhmsLow()) ? 0 : st.outputOhmsLow();
                double drop = Math.max(rail.volts() - i * st.loadOhms(), i * ron);
                w += i * Math.min(rail.volts(), Math.max(0, drop));
            } else {
                w += i * rail.volts();
            }
        }
        return w;
    }
}
