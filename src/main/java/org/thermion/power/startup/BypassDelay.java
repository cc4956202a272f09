package org.thermion.power.startup;

import java.util.ArrayList;
import java.util.List;

/**
 * A bypass delay to suggest: with every relay held open, the time after which the current
 * behind a soft-start resistor stays within 2 % of where it comes to rest. Bypassing earlier
 * leaves heaters cooler and the bypass peak higher; bypassing later gains almost nothing.
 */
public final class BypassDelay {
    /** Fraction of the resting current taken as settled. */
    public static final double BAND = 0.02;

    private BypassDelay() {
    }

    /**
     * One soft start's suggestion: settle time (NaN when not settled within the run) and the
     * resting current of its rail with the resistor in circuit.
     */
    public record Advice(String softStart, double settleSeconds, double restingAmps) {
    }

    /** Runs {@code net} with the bypasses held open for at least a minute (or {@code o.seconds()}, if longer). */
    public static List<Advice> suggest(StartupNetwork net, PowerUpOptions o) {
        double span = Math.max(60, o.seconds());
        PowerUpResult held = net.solve(o.withHoldBypass(true).withSeconds(span).withSampleSeconds(span / 2000));
        List<Advice> out = new ArrayList<>();
        for (SoftStartResult s : held.softStarts()) {
            if (s.ohms() == 0) {
                continue;
            }
            RailTransient rt = held.rail(s.rail());
            double[] a = rt.amps();
            double rest = a[a.length - 1];
            // Settled only if the last tenth of the run is already flat: otherwise the run is too short to say.
            double settle = Double.NaN;
            int i = a.length - 1;
            while (i > 0 && Math.abs(a[i - 1] - rest) <= BAND * rest) {
                i--;
            }
            if (rt.t()[i] < 0.9 * span) {
                settle = rt.t()[i];
            }
            out.add(new Advice(s.name(), settle, rest));
        }
        return out;
    }
}
