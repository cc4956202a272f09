package org.thermion.timing;

import org.thermion.model.StageType;
import org.thermion.model.TubeKind;
import org.thermion.model.TubeType;

/**
 * Capacitances a stage presents: at one of its inputs (what a driver must charge) and at
 * its output (its own plates or cathodes). Values in farads; undeclared values count 0.
 */
public final class Capacitance {
    private Capacitance() {
    }

    /**
     * Input capacitance of one input of {@code st} with its declared gain (see
     * {@link #input(TubeType, StageDrive.GridGains)} and {@link StageDrive.GridGains#declared(StageType)}).
     */
    public static double input(StageType st, TubeType tube) {
        return input(tube, StageDrive.GridGains.declared(st));
    }

    /**
     * Input capacitance of one triode input with grid gains {@code g}: each capacitance from the grid
     * multiplied by one less the gain across it (J. M. Miller, NBS Scientific Papers 15, 1920),
     * Cgp (1 - Ap) + Cgk (1 - Ak): Cgk + Cgp (1 + |A|) for a plate stage with a grounded cathode,
     * Cgp + Cgk (1 - A) for a cathode follower. Pentodes, diodes and thyratrons: their declared cin.
     */
    public static double input(TubeType tube, StageDrive.GridGains g) {
        if (tube == null) {
            return 0;
        }
        if (tube.kind() == TubeKind.TRIODE) {
            return orZero(tube.cgk()) * (1 - g.cathode()) + orZero(tube.cgp()) * (1 - g.plate());
        }
        return orZero(tube.cin());
    }

    /**
     * Output capacitance of a stage instance using {@code sections} sections: the tube's
     * cout per section; a triode without a declared cout counts plate-to-cathode plus
     * grid-to-plate capacitance (Cpk + Cgp) per section, the two capacitances at its plate.
     */
    public static double output(TubeType tube, int sections) {
        if (tube == null) {
            return 0;
        }
        double per;
        if (!Double.isNaN(tube.cout())) {
            per = tube.cout();
        } else if (tube.kind() == TubeKind.TRIODE) {
            per = orZero(tube.cpk()) + orZero(tube.cgp());
        } else {
            per = 0;
        }
        return per * Math.max(1, sections);
    }

    static double orZero(double v) {
        return Double.isNaN(v) ? 0 : v;
    }
}
