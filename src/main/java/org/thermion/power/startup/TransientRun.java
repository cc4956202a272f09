package org.thermion.power.startup;

import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.nonstiff.DormandPrince54Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

import java.util.Arrays;

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
    private final PowerUpOptions o;
    private final TransientCircuit circuit;
    private final TransientRecorder recorder;
    private final HeaterState[] heaters;
    private final RailState[] rails;
    private final SoftStartState[] softs;
    /** The emission threshold as a fraction of cathode operating temperature. */
    private final double threshold;
    /** With the relay held open, what each bypass time would have given (see probe()); or null. */
    private BypassProbe probe;

    TransientRun(StartupNetwork net, PowerUpOptions o) {
        this.o = o;
        this.threshold = net.emission.thresholdFraction();
        this.circuit = new TransientCircuit(net, o);
        this.recorder = new TransientRecorder(circuit, o);
        this.heaters = circuit.heaters;
        this.rails = circuit.rails;
        this.softs = circuit.softs;
    }

    /** Records peaks and over-voltages at a point; adds a sample row when {@code keep}. */
    private void observe(double t, double[] y, boolean keep) {
        circuit.evaluate(y);
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
            recorder.add(t, y);
        }
    }

    PowerUpResult run() {
        double end = o.seconds();
        double dt = o.sampleSeconds();
        double[] y = new double[circuit.dimension];
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
        circuit.updateLimits(0);
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
                        circuit.evaluate(x.getPrimaryState());
                        return s.overPickup();
                    }, Action.STOP, true);
                    dp.addEventDetector(pick[k]);
                } else if (mayDrop(s)) {
                    drop[k] = new Threshold(x -> {
                        circuit.evaluate(x.getPrimaryState());
                        return -s.overDropout();
                    }, Action.STOP, true);
                    dp.addEventDetector(drop[k]);
                }
            }
            for (RailState r : rails) {
                double lim = r.rail.limitAmps();
                if (Double.isFinite(lim)) {
                    dp.addEventDetector(new Threshold(x -> {
                        circuit.evaluate(x.getPrimaryState());
                        return r.demand - lim;
                    }, Action.RESET_DERIVATIVES, false, (time, up) -> r.limit(time, up)));
                }
            }
            dp.addStepHandler(new ODEStepHandler() {
                @Override
                public void handleStep(ODEStateInterpolator in) {
                    double tc = in.getCurrentState().getTime();
                    crossings(in);
                    if (probe != null) {
                        probe.takeDue(in, tc);
                    }
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
                fin = dp.integrate(circuit.ode, new ODEState(t, y), segEnd);
            } catch (MathRuntimeException e) {
                throw new TransientFailure("the heater temperatures could not be integrated beyond t = "
                        + StartupNetwork.fmt(t) + " s (" + e.getMessage() + "): check the rails' voltages and resistances");
            }
            circuit.evaluations += dp.getEvaluations();
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
                    if (!changed && recorder.lastTime() < t && dt > 0) {
                        observe(t, y, true);
                    }
                    s.close(t);
                    changed = true;
                }
            }
            if (changed || anyFired) {
                circuit.evaluate(y);
                circuit.updateLimits(t);
                observe(t, y, true);
            }
        }
        if (recorder.lastTime() < end) {
            observe(end, y, true);
        }
        circuit.evaluate(y);
        circuit.updateLimits(end);
        for (RailState r : rails) {
            if (!Double.isNaN(r.limitSince)) {
                r.inLimit += end - r.limitSince;
            }
        }
        return recorder.result(y, end);
    }

    /**
     * Asks this run (which holds every relay open) what closing soft start {@code soft}'s bypass at
     * each of {@code times} (ascending) would give: the rail's switch-on peak up to then, its current
     * the instant after closing (the bypass peak, since warming heaters only lower it afterwards), and
     * the continuous rating the resistor's temperature rise asks by then. One trajectory serves every
     * bypass time up to the moment of bypass. Call before {@link #run()}.
     */
    BypassProbe probe(int soft, double[] times) {
        probe = new BypassProbe(circuit, soft, times);
        return probe;
    }
    /**
     * Each heater's 95 % point and its cathode's emission threshold, found inside the step that crosses
     * them by bisection on the step's interpolator: warming is monotone, and a detector per heater
     * would make the integrator check hundreds of functions at every step.
     */
    private void crossings(ODEStateInterpolator in) {
        double[] y = in.getCurrentState().getPrimaryState();
        for (HeaterState h : heaters) {
            if (Double.isNaN(h.warmTime) && y[h.wire] >= 0.95 * h.model.hotKelvin()) {
                h.warmTime = crossing(in, h.wire, 0.95 * h.model.hotKelvin());
            }
            if (Double.isNaN(h.emitTime) && y[h.cathode] >= threshold * h.model.cathodeKelvin()) {
                h.emitTime = crossing(in, h.cathode, threshold * h.model.cathodeKelvin());
            }
        }
    }

    private static double crossing(ODEStateInterpolator in, int index, double level) {
        double lo = in.getPreviousState().getTime(), hi = in.getCurrentState().getTime();
        if (in.getPreviousState().getPrimaryState()[index] >= level) {
            return lo;
        }
        for (int i = 0; i < 50 && hi - lo > 1e-9; i++) {
            double mid = 0.5 * (lo + hi);
            if (in.getInterpolatedState(mid).getPrimaryState()[index] >= level) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return hi;
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
        circuit.evaluate(y);
        boolean changed = false;
        for (SoftStartState s : softs) {
            if (mayDrop(s) && s.overDropout() < 0) {
                s.drop(t);
                changed = true;
            }
        }
        if (changed) {
            circuit.evaluate(y);
            circuit.updateLimits(t);
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
        double[] abs = new double[circuit.dimension];
        double[] rel = new double[circuit.dimension];
        Arrays.fill(abs, 1e-3);   // kelvin and joules
        Arrays.fill(rel, 1e-6);
        DormandPrince54Integrator dp = new DormandPrince54Integrator(1e-9, Math.min(0.25, end / 20), abs, rel);
        dp.setMaxEvaluations(2_000_000);
        return dp;
    }

}
