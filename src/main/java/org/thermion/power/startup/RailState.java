package org.thermion.power.startup;

import org.thermion.model.Rail;

/**
 * One rail through a run: what hangs on it (heater strings, plate and bias loads tied to the
 * heaters that warm their cathodes, thyratron plate circuits fed from it, the soft starts in
 * series with it), its circuit solved algebraically at each point, and its peaks so far. Plate
 * and bias loads follow their cathodes' emission, not the heater wire.
 */
final class RailState {
    final int index;
    final Rail rail;
    final StringState[] strings;
    final HeaterState[] plateHeaters;
    final double[] plateSiemens;
    final double alwaysSiemens;
    final SoftStartState[] series;
    final SoftStartState[] thyratronBranches;

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

    RailState(int index, Rail rail, StringState[] strings, HeaterState[] plateHeaters, double[] plateSiemens,
              double alwaysSiemens, SoftStartState[] series, SoftStartState[] thyratronBranches) {
        this.index = index;
        this.rail = rail;
        this.strings = strings;
        this.plateHeaters = plateHeaters;
        this.plateSiemens = plateSiemens;
        this.alwaysSiemens = alwaysSiemens;
        this.series = series;
        this.thyratronBranches = thyratronBranches;
    }

    /**
     * Solves the rail: source and soft-start resistances in series with the strings, the plate loads
     * (scaled by emission) and the fired thyratron branches (a conductance behind the arc drop).
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
        double g = alwaysSiemens;
        for (StringState st : strings) {
            g += st.count * st.siemens;
        }
        for (int i = 0; i < plateHeaters.length; i++) {
            HeaterState h = plateHeaters[i];
            g += plateSiemens[i] * h.emission(y, emission);
        }
        double bg = 0, bge = 0;
        for (SoftStartState s : thyratronBranches) {
            if (s.fired) {
                bg += s.soft.branchSiemens();
                bge += s.soft.branchSiemens() * s.soft.branchVolts();
            }
        }
        double vn;
        double ask;
        if (rser > 0) {
            vn = (vs / rser + bge) / (1 / rser + g + bg);
            if (bg > 0 && vn < bge / bg) {
                bg = 0;
                bge = 0;
                vn = vs / (1 + g * rser);
            }
            ask = (g + bg) * vn - bge;   // the same as (vs - vn) / rser, without cancellation
        } else {
            vn = vs;
            ask = g * vs + Math.max(0, bg * vs - bge);
        }
        double a = ask;
        if (ask > rail.limitAmps()) {
            a = rail.limitAmps();
            double gt = g + bg;
            vn = gt > 0 ? Math.min(vs, (a + bge) / gt) : vs;
        }
        if (!Double.isFinite(a) || !Double.isFinite(vn)) {
            throw new TransientFailure("rail " + rail.name() + ": the circuit has no finite solution (" + fmtV(vs)
                    + " V through " + fmtV(rser) + " ohm to " + fmtV(g) + " S of load): check the rail's voltage, source "
                    + "resistance and soft-start resistor");
        }
        amps = a;
        volts = vn;
        demand = ask;
        for (SoftStartState s : thyratronBranches) {
            // A fired branch conducts while the bus stands above the arc drop (bg is zeroed when it does not).
            double ib = s.fired && bg > 0 ? Math.max(0, vn - s.soft.branchVolts()) * s.soft.branchSiemens() : 0;
            s.coilVolts = ib * s.soft.check().relay().coilOhms();
            s.plateVolts = ib * s.soft.check().plateOhms();
            s.busVolts = vn;
        }
        for (StringState st : strings) {
            st.carry(vn);
        }
        for (SoftStartState s : series) {
            s.dissipate(a);
        }
    }

    private static String fmtV(double v) {
        return StartupNetwork.fmt(v);
    }

    /** A soft-start resistor sits in this rail. */
    boolean hasSoftStart() {
        for (SoftStartState s : series) {
            if (s.ohms > 0) {
                return true;
            }
        }
        return false;
    }

    /** Some soft-start resistor of this rail has been bypassed. */
    boolean bypassed() {
        for (SoftStartState s : series) {
            if (s.bypassed && s.ohms > 0) {
                return true;
            }
        }
        return false;
    }

    /** Earliest bypass of a resistor in this rail (NaN: none). */
    double bypassTime() {
        double bt = Double.NaN;
        for (SoftStartState s : series) {
            if (s.ohms > 0 && !Double.isNaN(s.bypassTime)) {
                bt = Double.isNaN(bt) ? s.bypassTime : Math.min(bt, s.bypassTime);
            }
        }
        return bt;
    }

    boolean hasLoad() {
        return strings.length > 0 || plateHeaters.length > 0 || alwaysSiemens > 0 || thyratronBranches.length > 0;
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
