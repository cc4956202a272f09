package org.thermion.power.startup;

/**
 * The loads at one node of a rail through a run: the rail's bus, or the far side of a partial soft
 * start's resistor. Heater strings and plate loads are conductances; a fired thyratron's plate
 * circuit is a conductance behind its arc drop, conducting only while the node stands above it.
 */
final class LoadNode {
    final StringState[] strings;
    final HeaterState[] plateHeaters;
    final double[] plateSiemens;
    final double alwaysSiemens;
    final SoftStartState[] branches;

    // At the point last solved: load conductance, fired branches' conductance and its current source.
    double siemens;
    double branchSiemens;
    double branchAmps;
    /** The fired branches stopped conducting: the node fell below their arc drop. */
    boolean branchesOff;
    double volts;

    LoadNode(StringState[] strings, HeaterState[] plateHeaters, double[] plateSiemens, double alwaysSiemens,
             SoftStartState[] branches) {
        this.strings = strings;
        this.plateHeaters = plateHeaters;
        this.plateSiemens = plateSiemens;
        this.alwaysSiemens = alwaysSiemens;
        this.branches = branches;
    }

    /** Sums the conductances for the temperatures in {@code y}; plate loads follow their cathodes' emission. */
    void load(double[] y, Emission emission) {
        double g = alwaysSiemens;
        for (StringState st : strings) {
            g += st.count * st.siemens;
        }
        for (int i = 0; i < plateHeaters.length; i++) {
            g += plateSiemens[i] * plateHeaters[i].emission(y, emission);
        }
        siemens = g;
        branchesOff = false;
        branches();
    }

    private void branches() {
        double bg = 0, bge = 0;
        if (!branchesOff) {
            for (SoftStartState s : branches) {
                if (s.fired) {
                    bg += s.soft.branchSiemens();
                    bge += s.soft.branchSiemens() * s.soft.branchVolts();
                }
            }
        }
        branchSiemens = bg;
        branchAmps = bge;
    }

    /** Takes the fired branches out when the node at {@code v} stands below their arc drop; true when it did. */
    boolean clamp(double v) {
        if (branchSiemens > 0 && v < branchAmps / branchSiemens) {
            branchesOff = true;
            branches();
            return true;
        }
        return false;
    }

    /** All the conductance at the node. */
    double totalSiemens() {
        return siemens + branchSiemens;
    }

    /** Current the node draws at {@code v}. */
    double amps(double v) {
        return totalSiemens() * v - branchAmps;
    }

    /** Sets the node's voltage: the strings' currents and the relay coils' voltages follow. */
    void carry(double v) {
        volts = v;
        for (SoftStartState s : branches) {
            // A fired branch conducts while the node stands above the arc drop.
            double ib = s.fired && branchSiemens > 0 ? Math.max(0, v - s.soft.branchVolts()) * s.soft.branchSiemens() : 0;
            s.coilVolts = ib * s.soft.check().relay().coilOhms();
            s.plateVolts = ib * s.soft.check().plateOhms();
            s.busVolts = v;
        }
        for (StringState st : strings) {
            st.carry(v);
        }
    }

    boolean any() {
        return strings.length > 0 || plateHeaters.length > 0 || alwaysSiemens > 0 || branches.length > 0;
    }
}
