package org.thermion.power.startup;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.nonstiff.DormandPrince54Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;
import org.thermion.model.Rail;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One solve of a {@link StartupNetwork}. The heater temperatures are the only dynamic states
 * (plus energy integrals for the report); the electrical circuit of every rail is algebraic and
 * solved at each evaluation, because its time constants are microseconds beside the heaters'
 * seconds. The run is split into segments at the relay closures: within a segment the circuit's
 * topology is fixed, so every event function stays continuous. Thyratron firing ends a segment
 * (the relay then closes one operate time later); supply current-limit crossings and each
 * heater's 95 % point are located by event detectors without ending the segment.
 */
final class TransientRun {
    private final StartupNetwork net;
    private final PowerUpOptions o;
    private final int n;
    private final int nr;
    private final int ns;
    private final double[] ohms;
    private final boolean[] bypassed;
    private final boolean[] fired;
    private final double[] fireTime;
    private final double[] bypassAt;
    private final double[] bypassTime;
    private final HeaterModel[] model;

    // scratch, filled by evaluate()
    private final double[] railAmps;
    private final double[] railVolts;
    private final double[] railDemand;
    private final double[] heaterVolts;
    private final double[] heaterPower;
    private final double[] softPower;
    private final double[] groupPerVolt;
    private final double[] elementOhms;
    private final double[] heaterOhms;
    private final double[] railSeries;

    // tracking
    private final double[] peakOn;
    private final double[] peakOnTime;
    private final double[] peakBy;
    private final double[] peakByTime;
    private final double[] peakDemand;
    private final double[] limitSince;
    private final double[] inLimit;
    private final double[] peakRatio;
    private final double[] peakRatioTime;
    private final double[] peakSoftWatts;
    private final double[] warmTime;
    private final List<double[]> samples = new ArrayList<>();
    private long evaluations;

    TransientRun(StartupNetwork net, PowerUpOptions o) {
        this.net = net;
        this.o = o;
        this.n = net.states;
        this.nr = net.machine.rails().size();
        this.ns = net.softs.size();
        ohms = new double[ns];
        for (int k = 0; k < ns; k++) {
            StartupNetwork.Soft s = net.softs.get(k);
            ohms[k] = o.resistorOhms().getOrDefault(s.name(), s.declaredOhms());
        }
        bypassed = new boolean[ns];
        fired = new boolean[ns];
        fireTime = nan(ns);
        bypassAt = nan(ns);
        bypassTime = nan(ns);
        model = new HeaterModel[n];
        for (int s = 0; s < n; s++) {
            model[s] = net.models.get(net.stateModel[s]);
        }
        railAmps = new double[nr];
        railVolts = new double[nr];
        railDemand = new double[nr];
        heaterVolts = new double[n];
        heaterPower = new double[n];
        softPower = new double[ns];
        groupPerVolt = new double[net.groupRail.length];
        elementOhms = new double[n];
        heaterOhms = new double[n];
        railSeries = new double[nr];
        peakOn = new double[nr];
        peakOnTime = new double[nr];
        peakBy = nan(nr);
        peakByTime = nan(nr);
        peakDemand = new double[nr];
        limitSince = nan(nr);
        inLimit = new double[nr];
        peakRatio = new double[n];
        peakRatioTime = new double[n];
        peakSoftWatts = new double[ns];
        warmTime = nan(n);
    }

    private static double[] nan(int k) {
        double[] a = new double[k];
        Arrays.fill(a, Double.NaN);
        return a;
    }

    /** Solves the circuit for heater temperatures {@code y} under the present relay states. */
    private void evaluate(double[] y) {
        evaluations++;
        for (int s = 0; s < n; s++) {
            double rh = model[s].resistance(y[s]);
            heaterOhms[s] = rh;
            double sh = net.stateShunt[s];
            elementOhms[s] = Double.isInfinite(sh) ? rh : rh * sh / (rh + sh);
        }
        for (int g = 0; g < groupPerVolt.length; g++) {
            double r = net.groupDrop[g];
            for (int s : net.groupStates[g]) {
                r += elementOhms[s];
            }
            groupPerVolt[g] = 1 / r;
        }
        for (int r = 0; r < nr; r++) {
            Rail rail = net.machine.rails().get(r);
            double vs = Math.abs(rail.volts());
            double rser = rail.sourceOhms();
            for (int k = 0; k < ns; k++) {
                if (net.softs.get(k).rail() == r && !bypassed[k]) {
                    rser += ohms[k];
                }
            }
            railSeries[r] = rser;
            double g = net.alwaysSiemens[r];
            for (int gi : net.railGroups[r]) {
                g += net.groupCount[gi] * groupPerVolt[gi];
            }
            int[] ps = net.plateState[r];
            for (int i = 0; i < ps.length; i++) {
                int s = ps[i];
                g += net.plateSiemens[r][i] * net.emission.factor(model[s].fraction(y[s]));
            }
            // Thyratron plate circuits on this rail: conductance with an offset (the arc drop).
            double bg = 0, bge = 0;
            for (int k = 0; k < ns; k++) {
                StartupNetwork.Soft sk = net.softs.get(k);
                if (fired[k] && sk.fromRail() == r) {
                    bg += sk.branchSiemens();
                    bge += sk.branchSiemens() * sk.branchVolts();
                }
            }
            double vn;
            double demand;
            if (rser > 0) {
                vn = (vs / rser + bge) / (1 / rser + g + bg);
                if (bg > 0 && vn < bge / bg) {
                    bg = 0;
                    bge = 0;
                    vn = vs / (1 + g * rser);
                }
                demand = (g + bg) * vn - bge;   // the same as (vs - vn) / rser, without cancellation
            } else {
                vn = vs;
                demand = g * vs + Math.max(0, bg * vs - bge);
            }
            double amps = demand;
            if (demand > rail.limitAmps()) {
                amps = rail.limitAmps();
                double gt = g + bg;
                vn = gt > 0 ? Math.min(vs, (amps + bge) / gt) : vs;
            }
            railAmps[r] = amps;
            railVolts[r] = vn;
            railDemand[r] = demand;
        }
        for (int s = 0; s < n; s++) {
            int g = net.stateGroup[s];
            double i = railVolts[net.groupRail[g]] * groupPerVolt[g];
            double v = i * elementOhms[s];
            heaterVolts[s] = v;
            heaterPower[s] = v * v / heaterOhms[s];
        }
        for (int k = 0; k < ns; k++) {
            double i = railAmps[net.softs.get(k).rail()];
            softPower[k] = bypassed[k] ? 0 : i * i * ohms[k];
        }
    }

    private final OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
        @Override
        public int getDimension() {
            return 3 * n + ns;
        }

        @Override
        public double[] computeDerivatives(double t, double[] y) {
            evaluate(y);
            double[] d = new double[3 * n + ns];
            for (int s = 0; s < n; s++) {
                double rad = model[s].radiated(y[s]);
                d[s] = (heaterPower[s] - rad) / model[s].heatCapacity();
                d[n + ns + s] = heaterPower[s];
                d[2 * n + ns + s] = rad;
            }
            for (int k = 0; k < ns; k++) {
                d[n + k] = softPower[k];
            }
            return d;
        }
    };

    /** Records peaks and over-voltages at a point; adds a sample row when {@code keep}. */
    private void observe(double t, double[] y, boolean keep) {
        evaluate(y);
        for (int r = 0; r < nr; r++) {
            boolean after = railBypassed(r);
            double a = railAmps[r];
            if (!after) {
                if (a > peakOn[r]) {
                    peakOn[r] = a;
                    peakOnTime[r] = t;
                }
            } else if (Double.isNaN(peakBy[r]) || a > peakBy[r]) {
                peakBy[r] = a;
                peakByTime[r] = t;
            }
            peakDemand[r] = Math.max(peakDemand[r], railDemand[r]);
        }
        for (int s = 0; s < n; s++) {
            double ratio = heaterVolts[s] / model[s].rating().volts();
            if (ratio > peakRatio[s]) {
                peakRatio[s] = ratio;
                peakRatioTime[s] = t;
            }
        }
        for (int k = 0; k < ns; k++) {
            peakSoftWatts[k] = Math.max(peakSoftWatts[k], softPower[k]);
        }
        if (keep) {
            double[] row = new double[1 + 2 * nr + n];
            row[0] = t;
            for (int r = 0; r < nr; r++) {
                row[1 + r] = railAmps[r];
                row[1 + nr + r] = railVolts[r];
            }
            System.arraycopy(y, 0, row, 1 + 2 * nr, n);
            samples.add(row);
        }
    }

    private boolean railBypassed(int r) {
        for (int k = 0; k < ns; k++) {
            if (net.softs.get(k).rail() == r && bypassed[k] && ohms[k] > 0) {
                return true;
            }
        }
        return false;
    }

    private boolean railHasSoft(int r) {
        for (int k = 0; k < ns; k++) {
            if (net.softs.get(k).rail() == r && ohms[k] > 0) {
                return true;
            }
        }
        return false;
    }

    private void updateLimits(double t) {
        for (int r = 0; r < nr; r++) {
            boolean now = railDemand[r] > net.machine.rails().get(r).limitAmps();
            if (now && Double.isNaN(limitSince[r])) {
                limitSince[r] = t;
            } else if (!now && !Double.isNaN(limitSince[r])) {
                inLimit[r] += t - limitSince[r];
                limitSince[r] = Double.NaN;
            }
        }
    }

    PowerUpResult run() {
        double end = o.seconds();
        double dt = o.sampleSeconds();
        double[] y = new double[3 * n + ns];
        for (int s = 0; s < n; s++) {
            y[s] = model[s].ambientKelvin();
        }
        for (int k = 0; k < ns; k++) {
            StartupNetwork.Soft s = net.softs.get(k);
            if (ohms[k] == 0) {
                bypassed[k] = true;   // no resistor: nothing to bypass
            } else if (o.holdBypass()) {
                bypassAt[k] = Double.NaN;
            } else if (!s.thyratron()) {
                bypassAt[k] = s.delay() + s.operate();
            }
        }
        double t = 0;
        observe(0, y, true);
        updateLimits(0);
        long[] nextSample = {1};
        if (y.length == 0) {
            // Nothing warms: the rails carry only what is always on, and nothing changes with time.
            t = end;
        }
        while (t < end) {
            double segEnd = end;
            for (int k = 0; k < ns; k++) {
                if (!bypassed[k] && bypassAt[k] > t && bypassAt[k] < segEnd) {
                    segEnd = bypassAt[k];
                }
            }
            DormandPrince54Integrator dp = integrator(end);
            List<Threshold> thy = new ArrayList<>();
            int[] thyIndex = new int[ns];
            Arrays.fill(thyIndex, -1);
            for (int k = 0; k < ns; k++) {
                StartupNetwork.Soft s = net.softs.get(k);
                if (s.thyratron() && !fired[k] && !bypassed[k]) {
                    int st = s.thyState();
                    double hot = model[st].hotKelvin();
                    double frac = s.warmFraction();
                    Threshold th = new Threshold(x -> x.getPrimaryState()[st] / hot - frac, Action.STOP, true);
                    thyIndex[k] = thy.size();
                    thy.add(th);
                    dp.addEventDetector(th);
                }
            }
            for (int s = 0; s < n; s++) {
                if (Double.isNaN(warmTime[s])) {
                    int si = s;
                    double hot = model[s].hotKelvin();
                    dp.addEventDetector(new Threshold(x -> x.getPrimaryState()[si] / hot - 0.95, Action.CONTINUE, true,
                            (time, up) -> {
                                if (up && Double.isNaN(warmTime[si])) {
                                    warmTime[si] = time;
                                }
                            }));
                }
            }
            for (int r = 0; r < nr; r++) {
                double lim = net.machine.rails().get(r).limitAmps();
                if (Double.isFinite(lim)) {
                    int ri = r;
                    dp.addEventDetector(new Threshold(x -> {
                        evaluate(x.getPrimaryState());
                        return railDemand[ri] - lim;
                    }, Action.RESET_DERIVATIVES, false, (time, up) -> {
                        if (up && Double.isNaN(limitSince[ri])) {
                            limitSince[ri] = time;
                        } else if (!up && !Double.isNaN(limitSince[ri])) {
                            inLimit[ri] += time - limitSince[ri];
                            limitSince[ri] = Double.NaN;
                        }
                    }));
                }
            }
            dp.addStepHandler(new ODEStepHandler() {
                @Override
                public void handleStep(ODEStateInterpolator in) {
                    double tc = in.getCurrentState().getTime();
                    if (dt > 0) {
                        while (nextSample[0] * dt <= tc + 1e-12 && nextSample[0] * dt <= end + 1e-12) {
                            double ts = Math.min(nextSample[0] * dt, tc);
                            observe(ts, in.getInterpolatedState(ts).getPrimaryState(), true);
                            nextSample[0]++;
                        }
                    }
                    observe(tc, in.getCurrentState().getPrimaryState(), false);
                }
            });
            ODEStateAndDerivative fin = dp.integrate(ode, new ODEState(t, y), segEnd);
            evaluations += dp.getEvaluations();
            t = fin.getTime();
            y = fin.getPrimaryState().clone();
            for (int k = 0; k < ns; k++) {
                if (thyIndex[k] >= 0 && !Double.isNaN(thy.get(thyIndex[k]).firstTime())) {
                    fired[k] = true;
                    fireTime[k] = thy.get(thyIndex[k]).firstTime();
                    if (net.softs.get(k).picksUp() && !o.holdBypass()) {
                        bypassAt[k] = fireTime[k] + net.softs.get(k).operate();
                    }
                }
            }
            boolean changed = false;
            for (int k = 0; k < ns; k++) {
                if (!bypassed[k] && bypassAt[k] <= t + 1e-12) {
                    if (!changed && (samples.isEmpty() || samples.get(samples.size() - 1)[0] < t) && dt > 0) {
                        observe(t, y, true);
                    }
                    bypassed[k] = true;
                    bypassTime[k] = t;
                    changed = true;
                }
            }
            boolean anyFired = false;
            for (int k = 0; k < ns; k++) {
                anyFired |= thyIndex[k] >= 0 && fired[k];
            }
            if (changed || anyFired) {
                evaluate(y);
                updateLimits(t);
                observe(t, y, true);
            }
        }
        if (samples.get(samples.size() - 1)[0] < end) {
            observe(end, y, true);
        }
        evaluate(y);
        updateLimits(end);
        for (int r = 0; r < nr; r++) {
            if (!Double.isNaN(limitSince[r])) {
                inLimit[r] += end - limitSince[r];
            }
        }
        return result(y, end);
    }

    private DormandPrince54Integrator integrator(double end) {
        int dim = 3 * n + ns;
        double[] abs = new double[dim];
        double[] rel = new double[dim];
        Arrays.fill(abs, 1e-3);
        Arrays.fill(rel, 1e-6);
        for (int s = 0; s < n; s++) {
            abs[s] = 1e-3;   // kelvin
        }
        DormandPrince54Integrator dp = new DormandPrince54Integrator(1e-9, Math.min(0.25, end / 20), abs, rel);
        dp.setMaxEvaluations(2_000_000);
        return dp;
    }

    private PowerUpResult result(double[] y, double end) {
        int m = samples.size();
        double[] t = new double[m];
        for (int i = 0; i < m; i++) {
            t[i] = samples.get(i)[0];
        }
        List<RailTransient> rails = new ArrayList<>();
        for (int r = 0; r < nr; r++) {
            Rail rail = net.machine.rails().get(r);
            double[] a = new double[m];
            double[] v = new double[m];
            for (int i = 0; i < m; i++) {
                a[i] = samples.get(i)[1 + r];
                v[i] = samples.get(i)[1 + nr + r];
            }
            double bt = Double.NaN;
            for (int k = 0; k < ns; k++) {
                if (net.softs.get(k).rail() == r && ohms[k] > 0 && !Double.isNaN(bypassTime[k])) {
                    bt = Double.isNaN(bt) ? bypassTime[k] : Math.min(bt, bypassTime[k]);
                }
            }
            boolean load = net.railGroups[r].length > 0 || net.plateState[r].length > 0 || net.alwaysSiemens[r] > 0;
            for (StartupNetwork.Soft s : net.softs) {
                load |= s.thyratron() && s.fromRail() == r;
            }
            rails.add(new RailTransient(r, rail.name(), rail.volts(), rail.limitAmps(), t, a, v, peakOn[r],
                    peakOnTime[r], peakBy[r], peakByTime[r], bt, peakDemand[r], inLimit[r], railAmps[r],
                    railHasSoft(r), load));
        }
        List<SoftStartResult> softs = new ArrayList<>();
        List<RelayDriverCheck> checks = new ArrayList<>();
        for (int k = 0; k < ns; k++) {
            StartupNetwork.Soft s = net.softs.get(k);
            double trig = s.thyratron() ? fireTime[k] : (s.delay() <= end ? s.delay() : Double.NaN);
            double inCircuit = Double.isNaN(bypassTime[k]) ? end : bypassTime[k];
            double joules = y[n + k];
            softs.add(new SoftStartResult(s.name(), s.rail(), ohms[k], s.ratedWatts(), ohms[k] == 0 ? Double.NaN : trig,
                    ohms[k] == 0 ? Double.NaN : bypassTime[k], joules, peakSoftWatts[k],
                    inCircuit > 0 ? joules / inCircuit : 0, s.thyratron()));
            if (s.check() != null) {
                RelayDriverCheck c = s.check();
                checks.add(new RelayDriverCheck(c.tube(), c.railName(), c.railVolts(), c.sourceOhms(), c.arcDropVolts(),
                        c.plateOhms(), c.relay(), c.coilVolts(), c.coilAmps(), c.avgRatingAmps(), c.peakRatingAmps(),
                        fireTime[k], c.heatingSeconds()));
            }
        }
        List<HeaterWarmup> heaters = new ArrayList<>();
        double[][] kelvin = new double[n][m];
        for (int s = 0; s < n; s++) {
            int g = net.stateGroup[s];
            HeaterModel h = model[s];
            heaters.add(new HeaterWarmup(h.tube(), h.rating().volts(), h.rating().amps(), net.groupRail[g],
                    net.groupLabel[g], net.statePosition[s], net.groupCount[g], net.groupMixed[g], warmTime[s],
                    peakRatio[s], peakRatioTime[s], heaterVolts[s], y[s], y[n + ns + s], y[2 * n + ns + s],
                    h.heatCapacity() * (y[s] - h.ambientKelvin())));
            for (int i = 0; i < m; i++) {
                kelvin[s][i] = samples.get(i)[1 + 2 * nr + s];
            }
        }
        return new PowerUpResult(net.machine.name(), o, net.models, List.copyOf(rails), List.copyOf(softs),
                List.copyOf(heaters), List.copyOf(checks), t, kelvin, evaluations, net.notes);
    }
}
