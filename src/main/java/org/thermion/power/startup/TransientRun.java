package org.thermion.power.startup;

import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.nonstiff.DormandPrince54Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

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
    private final HeaterState[] heaters;
    private final StringState[] strings;
    private final RailState[] rails;
    private final SoftStartState[] softs;
    private final int dimension;
    /** The emission threshold as a fraction of cathode operating temperature. */
    private final double threshold;
    private final List<double[]> samples = new ArrayList<>();
    private long evaluations;

    TransientRun(StartupNetwork net, PowerUpOptions o) {
        this.net = net;
        this.o = o;
        this.threshold = net.emission.thresholdFraction();
        int n = net.states;
        int ns = net.softs.size();
        // State vector: wire temperatures, cathode temperatures, resistor energies, resistor lagged powers,
        // heater energies in, energies radiated.
        heaters = new HeaterState[n];
        for (int s = 0; s < n; s++) {
            heaters[s] = new HeaterState(net.models.get(net.stateModel[s]), net.stateGroup[s], net.statePosition[s],
                    net.stateShunt[s], s, n + s, 2 * n + 2 * ns + s, 3 * n + 2 * ns + s);
        }
        dimension = 4 * n + 2 * ns;
        strings = new StringState[net.groupRail.length];
        for (int g = 0; g < strings.length; g++) {
            HeaterState[] hs = new HeaterState[net.groupStates[g].length];
            for (int i = 0; i < hs.length; i++) {
                hs[i] = heaters[net.groupStates[g][i]];
            }
            strings[g] = new StringState(net.groupRail[g], net.groupCount[g], net.groupDrop[g], hs);
        }
        softs = new SoftStartState[ns];
        for (int k = 0; k < ns; k++) {
            StartupNetwork.Soft s = net.softs.get(k);
            double ohms = o.resistorOhms().getOrDefault(s.name(), s.declaredOhms());
            softs[k] = new SoftStartState(s, ohms, 2 * n + k, 2 * n + ns + k, o.resistorRating().tau(), s.thyratron() ? heaters[s.thyState()] : null);
        }
        int nr = net.machine.rails().size();
        rails = new RailState[nr];
        for (int r = 0; r < nr; r++) {
            int ri = r;
            StringState[] on = Arrays.stream(net.railGroups[r]).mapToObj(g -> strings[g]).toArray(StringState[]::new);
            HeaterState[] plates = Arrays.stream(net.plateState[r]).mapToObj(s -> heaters[s]).toArray(HeaterState[]::new);
            SoftStartState[] series = Arrays.stream(softs).filter(s -> s.soft.rail() == ri).toArray(SoftStartState[]::new);
            SoftStartState[] branches = Arrays.stream(softs).filter(s -> s.soft.thyratron() && s.soft.fromRail() == ri)
                    .toArray(SoftStartState[]::new);
            rails[r] = new RailState(r, net.machine.rails().get(r), on, plates, net.plateSiemens[r].clone(),
                    net.alwaysSiemens[r], series, branches);
        }
    }

    /** Solves the circuit for the temperatures in {@code y} under the present relay states. */
    private void evaluate(double[] y) {
        evaluations++;
        for (HeaterState h : heaters) {
            h.resist(y);
        }
        for (StringState s : strings) {
            s.resist();
        }
        for (RailState r : rails) {
            r.solve(y, net.emission);
        }
    }

    private final OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
        @Override
        public int getDimension() {
            return dimension;
        }

        @Override
        public double[] computeDerivatives(double t, double[] y) {
            try {
                evaluate(y);
            } catch (TransientFailure e) {
                throw new TransientFailure("at t = " + StartupNetwork.fmt(t) + " s, " + e.getMessage());
            }
            double[] d = new double[dimension];
            for (HeaterState h : heaters) {
                h.derivatives(y, d);
            }
            for (SoftStartState s : softs) {
                s.derivatives(y, d);
            }
            return d;
        }
    };

    /** Records peaks and over-voltages at a point; adds a sample row when {@code keep}. */
    private void observe(double t, double[] y, boolean keep) {
        evaluate(y);
        for (RailState r : rails) {
            r.observe(t);
        }
        for (HeaterState h : heaters) {
            h.observe(t);
        }
        for (SoftStartState s : softs) {
            s.observe(y);
            s.observeCoil(t);
        }
        if (keep) {
            int nr = rails.length;
            double[] row = new double[1 + 2 * nr + 2 * heaters.length];
            row[0] = t;
            for (int r = 0; r < nr; r++) {
                row[1 + r] = rails[r].amps;
                row[1 + nr + r] = rails[r].volts;
            }
            for (int s = 0; s < heaters.length; s++) {
                row[1 + 2 * nr + s] = y[heaters[s].wire];
                row[1 + 2 * nr + heaters.length + s] = y[heaters[s].cathode];
            }
            samples.add(row);
        }
    }

    private void updateLimits(double t) {
        for (RailState r : rails) {
            r.limit(t, r.overLimit());
        }
    }

    PowerUpResult run() {
        double end = o.seconds();
        double dt = o.sampleSeconds();
        double[] y = new double[dimension];
        for (HeaterState h : heaters) {
            y[h.wire] = h.model.ambientKelvin();
            y[h.cathode] = h.model.ambientKelvin();
        }
        for (SoftStartState s : softs) {
            if (s.ohms == 0) {
                s.bypassed = true;   // no resistor: nothing to bypass
            } else if (!o.holdBypass() && !s.soft.thyratron()) {
                s.bypassAt = s.soft.delay() + s.soft.operate();
            }
        }
        double t = 0;
        try {
            observe(0, y, true);
        } catch (TransientFailure e) {
            throw new TransientFailure("at switch-on, " + e.getMessage());
        }
        updateLimits(0);
        long[] nextSample = {1};
        if (heaters.length == 0) {
            // Nothing warms: the rails carry only what is always on, and nothing changes with time.
            t = end;
        }
        while (t < end) {
            switchRelays(t, y);
            double segEnd = end;
            for (SoftStartState s : softs) {
                if (!s.bypassed && s.bypassAt > t && s.bypassAt < segEnd) {
                    segEnd = s.bypassAt;
                }
            }
            DormandPrince54Integrator dp = integrator(end);
            Threshold[] thy = new Threshold[softs.length];
            for (int k = 0; k < softs.length; k++) {
                SoftStartState s = softs[k];
                if (s.thyratron != null && !s.fired && !s.bypassed) {
                    thy[k] = new Threshold(x -> warmth(s, x.getPrimaryState()), Action.STOP, true);
                    dp.addEventDetector(thy[k]);
                }
            }
            // A fired thyratron's relay picks up when its coil reaches pick-up, and a closed one drops out when
            // its coil falls below drop-out: both read the coil's own supply, solved at each point.
            Threshold[] pick = new Threshold[softs.length];
            Threshold[] drop = new Threshold[softs.length];
            for (int k = 0; k < softs.length; k++) {
                SoftStartState s = softs[k];
                if (mayPickUp(s)) {
                    pick[k] = new Threshold(x -> {
                        evaluate(x.getPrimaryState());
                        return s.overPickup();
                    }, Action.STOP, true);
                    dp.addEventDetector(pick[k]);
                } else if (mayDrop(s)) {
                    drop[k] = new Threshold(x -> {
                        evaluate(x.getPrimaryState());
                        return -s.overDropout();
                    }, Action.STOP, true);
                    dp.addEventDetector(drop[k]);
                }
            }
            for (HeaterState h : heaters) {
                if (Double.isNaN(h.warmTime)) {
                    double hot = h.model.hotKelvin();
                    dp.addEventDetector(new Threshold(x -> x.getPrimaryState()[h.wire] / hot - 0.95, Action.CONTINUE, true,
                            (time, up) -> {
                                if (up && Double.isNaN(h.warmTime)) {
                                    h.warmTime = time;
                                }
                            }));
                }
                if (Double.isNaN(h.emitTime)) {
                    double at = threshold * h.model.cathodeKelvin();
                    dp.addEventDetector(new Threshold(x -> x.getPrimaryState()[h.cathode] / at - 1, Action.CONTINUE, true,
                            (time, up) -> {
                                if (up && Double.isNaN(h.emitTime)) {
                                    h.emitTime = time;
                                }
                            }));
                }
            }
            for (RailState r : rails) {
                double lim = r.rail.limitAmps();
                if (Double.isFinite(lim)) {
                    dp.addEventDetector(new Threshold(x -> {
                        evaluate(x.getPrimaryState());
                        return r.demand - lim;
                    }, Action.RESET_DERIVATIVES, false, (time, up) -> r.limit(time, up)));
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
            ODEStateAndDerivative fin;
            try {
                fin = dp.integrate(ode, new ODEState(t, y), segEnd);
            } catch (MathRuntimeException e) {
                throw new TransientFailure("the heater temperatures could not be integrated beyond t = "
                        + StartupNetwork.fmt(t) + " s (" + e.getMessage() + "): check the rails' voltages and resistances");
            }
            evaluations += dp.getEvaluations();
            t = fin.getTime();
            y = fin.getPrimaryState().clone();
            // A step stopped by one event may end on another's threshold before that one is reported.
            for (HeaterState h : heaters) {
                if (Double.isNaN(h.warmTime) && h.model.fraction(y[h.wire]) >= 0.95) {
                    h.warmTime = t;
                }
                if (Double.isNaN(h.emitTime) && h.model.cathodeFraction(y[h.cathode]) >= threshold) {
                    h.emitTime = t;
                }
            }
            boolean anyFired = false;
            for (int k = 0; k < softs.length; k++) {
                SoftStartState s = softs[k];
                if (thy[k] == null) {
                    continue;
                }
                // A detector that fired, or any other that stands at its threshold in the same step
                // (identical thyratrons share one trajectory, and only one event stops a step).
                double when = thy[k].firstTime();
                if (Double.isNaN(when) && warmth(s, y) >= 0) {
                    when = t;
                }
                if (!Double.isNaN(when)) {
                    s.fire(when);
                    anyFired = true;
                }
            }
            for (int k = 0; k < softs.length; k++) {
                if (pick[k] != null && !Double.isNaN(pick[k].firstTime())) {
                    softs[k].pickUp(pick[k].firstTime());
                }
                if (drop[k] != null && !Double.isNaN(drop[k].firstTime())) {
                    softs[k].drop(drop[k].firstTime());
                    anyFired = true;   // the topology changed: record the point
                }
            }
            boolean changed = false;
            for (SoftStartState s : softs) {
                if (!s.bypassed && s.bypassAt <= t + 1e-12) {
                    if (!changed && (samples.isEmpty() || samples.get(samples.size() - 1)[0] < t) && dt > 0) {
                        observe(t, y, true);
                    }
                    s.close(t);
                    changed = true;
                }
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
        for (RailState r : rails) {
            if (!Double.isNaN(r.limitSince)) {
                r.inLimit += end - r.limitSince;
            }
        }
        return result(y, end);
    }

    /** Openings of one relay after which its chatter is no longer followed (it is reported either way). */
    private static final int MAX_OPENINGS = 200;

    private boolean mayPickUp(SoftStartState s) {
        return s.fired && s.soft.check() != null && !s.bypassed && Double.isNaN(s.bypassAt) && !o.holdBypass()
                && s.openings < MAX_OPENINGS;
    }

    private boolean mayDrop(SoftStartState s) {
        return s.fired && s.soft.check() != null && s.bypassed && s.ohms > 0;
    }

    /** At a segment boundary: relays whose coil already stands past a threshold act now. */
    private void switchRelays(double t, double[] y) {
        evaluate(y);
        boolean changed = false;
        for (SoftStartState s : softs) {
            if (mayDrop(s) && s.overDropout() < 0) {
                s.drop(t);
                changed = true;
            }
        }
        if (changed) {
            evaluate(y);
            updateLimits(t);
            observe(t, y, true);
        }
        for (SoftStartState s : softs) {
            if (mayPickUp(s) && s.overPickup() >= 0) {
                s.pickUp(t);
            }
        }
    }

    /** The thyratron's firing function: negative until its cathode reaches the emission threshold, continuous. */
    private double warmth(SoftStartState s, double[] y) {
        HeaterState h = s.thyratron;
        return h.model.cathodeFraction(y[h.cathode]) - threshold;
    }

    private DormandPrince54Integrator integrator(double end) {
        double[] abs = new double[dimension];
        double[] rel = new double[dimension];
        Arrays.fill(abs, 1e-3);   // kelvin and joules
        Arrays.fill(rel, 1e-6);
        DormandPrince54Integrator dp = new DormandPrince54Integrator(1e-9, Math.min(0.25, end / 20), abs, rel);
        dp.setMaxEvaluations(2_000_000);
        return dp;
    }

    private PowerUpResult result(double[] y, double end) {
        int m = samples.size();
        int nr = rails.length;
        double[] t = new double[m];
        for (int i = 0; i < m; i++) {
            t[i] = samples.get(i)[0];
        }
        List<RailTransient> railResults = new ArrayList<>();
        for (RailState r : rails) {
            double[] a = new double[m];
            double[] v = new double[m];
            for (int i = 0; i < m; i++) {
                a[i] = samples.get(i)[1 + r.index];
                v[i] = samples.get(i)[1 + nr + r.index];
            }
            railResults.add(new RailTransient(r.index, r.rail.name(), r.rail.volts(), r.rail.limitAmps(), t, a, v,
                    r.peakOn, r.peakOnTime, r.peakBy, r.peakByTime, r.bypassTime(), r.peakDemand, r.inLimit, r.amps,
                    r.hasSoftStart(), r.hasLoad()));
        }
        List<SoftStartResult> softResults = new ArrayList<>();
        List<RelayDriverCheck> checks = new ArrayList<>();
        for (SoftStartState ss : softs) {
            StartupNetwork.Soft s = ss.soft;
            double trig = s.thyratron() ? ss.fireTime : (s.delay() <= end ? s.delay() : Double.NaN);
            double inCircuit = Double.isNaN(ss.bypassTime) ? end : ss.bypassTime;
            double joules = y[ss.joules];
            boolean none = ss.ohms == 0;
            softResults.add(new SoftStartResult(s.name(), s.rail(), ss.ohms, s.ratedWatts(), none ? Double.NaN : trig,
                    none ? Double.NaN : ss.bypassTime, joules, ss.peakWatts, inCircuit > 0 ? joules / inCircuit : 0,
                    s.thyratron(), ss.neededWatts, o.resistorRating(), ss.soft.contactAmps(),
                    rails[s.rail()].peakBy, rails[s.rail()].amps));
            if (s.check() != null) {
                RelayDriverCheck c = s.check();
                checks.add(c.simulated(ss.fireTime, ss.coil()));
            }
        }
        List<HeaterWarmup> warmups = new ArrayList<>();
        double[][] kelvin = new double[heaters.length][m];
        double[][] cathodeKelvin = new double[heaters.length][m];
        for (int s = 0; s < heaters.length; s++) {
            HeaterState h = heaters[s];
            HeaterModel model = h.model;
            int g = h.group;
            warmups.add(new HeaterWarmup(model.tube(), model.rating().volts(), model.rating().amps(), net.groupRail[g],
                    net.groupLabel[g], h.position, net.groupCount[g], net.groupMixed[g], h.warmTime, h.peakRatio,
                    h.peakRatioTime, h.volts, y[h.wire], y[h.joulesIn], y[h.joulesRadiated], h.joulesStored(y),
                    y[h.cathode], h.emitTime));
            for (int i = 0; i < m; i++) {
                kelvin[s][i] = samples.get(i)[1 + 2 * nr + s];
                cathodeKelvin[s][i] = samples.get(i)[1 + 2 * nr + heaters.length + s];
            }
        }
        return new PowerUpResult(net.machine.name(), o, net.models, List.copyOf(railResults), List.copyOf(softResults),
                List.copyOf(warmups), List.copyOf(checks), t, kelvin, cathodeKelvin, evaluations, net.notes);
    }
}
