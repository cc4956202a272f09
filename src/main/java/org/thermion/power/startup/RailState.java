package org.thermion.power.startup;

import org.thermion.model.Rail;

/**
 * One rail through a run: what hangs on its bus (heater strings, plate and bias loads tied to the
 * heaters that warm their cathodes, thyratron plate circuits fed from it), the soft starts in
 * series with it, the partial soft starts that feed some loads from the bus through their own
 * resistors, its circuit solved algebraically at each point, and its peaks so far. Plate and bias
 * loads follow their cathodes' emission, not the heater wire.
 */
final class RailState {
    final int index;
    final Rail rail;
    /** What hangs on the rail's bus. */
    final LoadNode bus;
    /** Soft starts in series with the whole rail. */
    final SoftStartState[] series;
    /** Soft starts feeding some of the rail's loads from the bus, each through its resistor to its own node. */
    final SoftStartState[] partial;
    private final SoftStartState[] all;

    // At the point last solved.
    double seriesOhms;
    double amps;
    double volts;
    double demand;

    // Seen so far.
    double peakOn;
    double peakOnTime;
    double peakBy = Double.NaN;
    double peakByTime = Double.NaN;
    double peakDemand;
    double limitSince = Double.NaN;
    double inLimit;

    RailState(int index, Rail rail, LoadNode bus, SoftStartState[] series, SoftStartState[] partial) {
        this.index = index;
        this.rail = rail;
        this.bus = bus;
        this.series = series;
        this.partial = partial;
        this.all = java.util.Arrays.copyOf(series, series.length + partial.length);
        System.arraycopy(partial, 0, all, series.length, partial.length);
    }

    /**
     * Solves the rail: the source and the whole-rail soft-start resistances in series with the bus;
     * on the bus its own loads and, through each partial soft start's resistor (shorted once
     * bypassed), that soft start's node. A node of conductance G behind R draws
     * (G v - I) / (1 + R G) at bus voltage v, I the fired thyratron branches' source current.
     */
    void solve(double[] y, Emission emission) {
        double vs = Math.abs(rail.volts());
        double rser = rail.sourceOhms();
        for (SoftStartState s : series) {
            if (!s.bypassed) {
                rser += s.ohms;
            }
        }
        seriesOhms = rser;
        bus.load(y, emission);
        for (SoftStartState s : partial) {
            s.node.load(y, emission);
        }
        double g;
        double e;
        double vn;
        // Each pass takes out thyratron branches whose node fell below the arc drop; at most one pass per node.
        for (int pass = 0; ; pass++) {
            g = bus.totalSiemens();
            e = bus.branchAmps;
            for (SoftStartState s : partial) {
                double r = s.bypassed ? 0 : s.ohms;
                double gn = s.node.totalSiemens();
                g += gn / (1 + r * gn);
                e += s.node.branchAmps / (1 + r * gn);
            }
            vn = rser > 0 ? (vs / rser + e) / (1 / rser + g) : vs;
            boolean changed = bus.clamp(vn);
            for (SoftStartState s : partial) {
                changed |= s.node.clamp(nodeVolts(s, vn));
            }
            if (!changed || pass > partial.length) {
                break;
            }
        }
        double ask = g * vn - e;   // the same as (vs - vn) / rser, without cancellation
        double a = ask;
        if (ask > rail.limitAmps()) {
            a = rail.limitAmps();
            vn = g > 0 ? Math.min(vs, (a + e) / g) : vs;
        }
        if (!Double.isFinite(a) || !Double.isFinite(vn)) {
            throw new TransientFailure("rail " + rail.name() + ": the circuit has no finite solution (" + fmtV(vs)
                    + " V through " + fmtV(rser) + " ohm to " + fmtV(g) + " S of load): check the rail's voltage, source "
                    + "resistance and soft-start resistor");
        }
        amps = a;
        volts = vn;
        demand = ask;
        bus.carry(vn);
        for (SoftStartState s : series) {
            s.dissipate(a);
        }
        for (SoftStartState s : partial) {
            double v = nodeVolts(s, vn);
            s.node.carry(v);
            s.dissipate(s.node.amps(v));
        }
    }

    /** The voltage at a partial soft start's node for bus voltage {@code bus}. */
    private static double nodeVolts(SoftStartState s, double bus) {
        double r = s.bypassed ? 0 : s.ohms;
        return (bus + r * s.node.branchAmps) / (1 + r * s.node.totalSiemens());
    }

    private static String fmtV(double v) {
        return StartupNetwork.fmt(v);
    }

    /** A soft-start resistor sits in this rail. */
    boolean hasSoftStart() {
        for (SoftStartState s : all()) {
            if (s.ohms > 0) {
                return true;
            }
        }
        return false;
    }

    /** Some soft-start resistor of this rail has been bypassed. */
    boolean bypassed() {
        for (SoftStartState s : all()) {
            if (s.bypassed && s.ohms > 0) {
                return true;
            }
        }
        return false;
    }

    /** Earliest bypass of a resistor in this rail (NaN: none). */
    double bypassTime() {
        double bt = Double.NaN;
        for (SoftStartState s : all()) {
            if (s.ohms > 0 && !Double.isNaN(s.bypassTime)) {
                bt = Double.isNaN(bt) ? s.bypassTime : Math.min(bt, s.bypassTime);
            }
        }
        return bt;
    }

    boolean hasLoad() {
        if (bus.any()) {
            return true;
        }
        for (SoftStartState s : partial) {
            if (s.node.any()) {
                return true;
            }
        }
        return false;
    }

    private SoftStartState[] all() {
        return all;
    }

    void observe(double t) {
        if (!bypassed()) {
            if (amps > peakOn) {
                peakOn = amps;
                peakOnTime = t;
            }
        } else if (Double.isNaN(peakBy) || amps > peakBy) {
            peakBy = amps;
            peakByTime = t;
        }
        peakDemand = Math.max(peakDemand, demand);
    }

    /** Accounts the time spent in current limit up to {@code t}, given whether the supply limits now. */
    void limit(double t, boolean now) {
        if (now && Double.isNaN(limitSince)) {
            limitSince = t;
        } else if (!now && !Double.isNaN(limitSince)) {
            inLimit += t - limitSince;
            limitSince = Double.NaN;
        }
    }

    boolean overLimit() {
        return demand > rail.limitAmps();
    }
}
