package org.thermion.power.startup;

import java.util.ArrayList;
import java.util.List;

/** The sample rows of one transient (rail currents and voltages, heater temperatures) and its result. */
final class TransientRecorder {
    private final TransientCircuit circuit;
    private final PowerUpOptions o;
    private final List<double[]> samples = new ArrayList<>();

    TransientRecorder(TransientCircuit circuit, PowerUpOptions o) {
        this.circuit = circuit;
        this.o = o;
    }

    /** Adds a row at t from the circuit as last solved and the temperatures in y. */
    void add(double t, double[] y) {
        RailState[] rails = circuit.rails;
        HeaterState[] heaters = circuit.heaters;
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

    /** The time of the last row, or minus infinity before the first. */
    double lastTime() {
        return samples.isEmpty() ? Double.NEGATIVE_INFINITY : samples.get(samples.size() - 1)[0];
    }

    PowerUpResult result(double[] y, double end) {
        StartupNetwork net = circuit.net;
        RailState[] rails = circuit.rails;
        SoftStartState[] softs = circuit.softs;
        HeaterState[] heaters = circuit.heaters;
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
        for (int k = 0; k < softs.length; k++) {
            SoftStartState ss = softs[k];
            StartupNetwork.Soft s = ss.soft;
            double trig = s.thyratron() ? ss.fireTime : (s.delay() <= end ? s.delay() : Double.NaN);
            double inCircuit = Double.isNaN(ss.bypassTime) ? end : ss.bypassTime;
            double joules = y[ss.joules];
            boolean none = ss.ohms == 0;
            softResults.add(new SoftStartResult(s.name(), s.rail(), ss.ohms, s.ratedWatts(), none ? Double.NaN : trig,
                    none ? Double.NaN : ss.bypassTime, joules, ss.peakWatts, inCircuit > 0 ? joules / inCircuit : 0,
                    s.thyratron(), ss.neededWatts, o.resistorRating(), ss.soft.contactAmps(),
                    s.partial() ? ss.peakClosed : rails[s.rail()].peakBy, s.partial() ? ss.amps : rails[s.rail()].amps,
                    s.partial() ? net.machine.softStarts().get(k).cover().names() : List.of()));
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
                List.copyOf(warmups), List.copyOf(checks), t, kelvin, cathodeKelvin, circuit.evaluations,
                net.notes);
    }
}
