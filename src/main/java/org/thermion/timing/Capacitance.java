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
     * Input capacitance of one input of {@code st}. A triode grid sees Cgk plus the Miller
     * multiplied grid-plate capacitance Cgp (1 + |A|), A the stage's gain (J. M. Miller,
     * NBS Scientific Papers 15, 1920); pentodes, diodes and thyratrons their declared cin.
     * A stage without a declared gain counts |A| = 1.
     */
    public static double input(StageType st, TubeType tube) {
        return input(st, tube, st.gain());
    }

    /** As {@link #input(StageType, TubeType)} with the stage's gain given (NaN: counted 1). */
    public static double input(StageType st, TubeType tube, double stageGain) {
        if (tube == null) {
            return 0;
        }
        if (tube.kind() == TubeKind.TRIODE) {
            double gain = Double.isNaN(stageGain) ? 1 : Math.abs(stageGain);
            return orZero(tube.cgk()) + orZero(tube.cgp()) * (1 + gain);
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
