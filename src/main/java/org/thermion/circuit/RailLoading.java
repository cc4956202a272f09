package org.thermion.circuit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.thermion.model.Gate;
import org.thermion.model.HeaterString;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.RailDraw;
import org.thermion.model.StageType;

/**
 * Solves a machine's rails under its own static load. Each stage instance takes its lightest or
 * heaviest current (circuit stages solved in every input state at the rails' present voltages,
 * inputs at ground for 0 and at the stage's plate rail for 1 — the widest swing a driver can
 * give; declared stages by their draw lines); each heater string its rated current. A rail
 * with source resistance R then sits at V = V_declared − R·I, and the stages are solved again
 * at those voltages until the two agree within {@link #TOLERANCE_VOLTS}.
 */
final class RailLoading {
    /** Agreement of rail voltage and load, volts. */
    static final double TOLERANCE_VOLTS = 1e-4;
    private static final int MAX_ITERATIONS = 200;
    /** Inputs of wider stages are not enumerated (2^4 states at most): all low, all high, each alone high. */
    private static final int ENUMERATE_UP_TO = 4;

    private final Machine machine;
    private final Map<String, StageCircuit> circuits;
    private final int[] instances;

    RailLoading(Machine machine, Map<String, StageCircuit> circuits) {
        this.machine = machine;
        this.circuits = circuits;
        this.instances = new int[machine.stages().size()];
        for (Gate g : machine.netlist().gates()) {
            count(g.stage());
        }
        for (Latch l : machine.netlist().latches()) {
            count(l.stage());
        }
    }

    private void count(int stage) {
        if (stage >= 0 && stage < instances.length) {
            instances[stage]++;
        }
    }

    /** Instances of each stage type in the netlist, by the machine's stage index. */
    int instances(int stage) {
        return instances[stage];
    }

    LoadedRails solve(Loading loading) {
        Map<String, Double> volts = new LinkedHashMap<>();
        for (Rail r : machine.rails()) {
            volts.put(r.name(), r.volts());
        }
        Map<String, Double> amps = Map.of();
        for (int it = 1; it <= MAX_ITERATIONS; it++) {
            RailSet at = railSet(volts);
            amps = totals(at, loading);
            double worst = 0;
            Map<String, Double> next = new LinkedHashMap<>();
            for (Rail r : machine.rails()) {
                double target = r.volts() - r.sourceOhms() * amps.getOrDefault(r.name(), 0.0);
                double v = volts.get(r.name());
                worst = Math.max(worst, Math.abs(target - v));
                next.put(r.name(), v + 0.7 * (target - v)); // damped: a stiff load must not make it ring
            }
            if (worst < TOLERANCE_VOLTS) {
                return result(loading, volts, amps, it, null);
            }
            for (Rail r : machine.rails()) {
                if (Math.signum(next.get(r.name())) != Math.signum(r.volts()) && r.volts() != 0) {
                    return result(loading, next, amps, it, "rail " + r.name() + " cannot supply its load: "
                            + String.format("%.3g A through %.3g ohm would take it past 0 V", amps.get(r.name()),
                            r.sourceOhms()));
                }
            }
            volts = next;
        }
        return result(loading, volts, amps, MAX_ITERATIONS, "rail voltages and load did not agree within "
                + MAX_ITERATIONS + " steps");
    }

    private LoadedRails result(Loading loading, Map<String, Double> volts, Map<String, Double> amps, int it,
                               String problem) {
        Map<String, RailState> m = new LinkedHashMap<>();
        for (Rail r : machine.rails()) {
            m.put(r.name(), new RailState(r.name(), r.volts(), r.sourceOhms(), amps.getOrDefault(r.name(), 0.0),
                    volts.get(r.name()), r.limitAmps()));
        }
        return new LoadedRails(loading, m, it, problem);
    }

    private RailSet railSet(Map<String, Double> volts) {
        Map<String, Rail> m = new LinkedHashMap<>();
        for (Rail r : machine.rails()) {
            m.put(r.name(), new Rail(r.name(), volts.get(r.name()), r.sourceOhms(), r.limitAmps()));
        }
        return new RailSet(m);
    }

    /** Total current out of each rail at rails {@code at}. */
    private Map<String, Double> totals(RailSet at, Loading loading) {
        Map<String, Double> sum = new HashMap<>();
        StageSolver solver = new StageSolver(at);
        for (int s = 0; s < instances.length; s++) {
            if (instances[s] == 0) {
                continue;
            }
            StageCurrents c = currents(machine.stages().get(s), solver);
            for (Rail r : machine.rails()) {
                sum.merge(r.name(), instances[s] * c.amps(r.name(), loading), Double::sum);
            }
        }
        for (HeaterString h : machine.heaterStrings()) {
            if (!h.ratings().isEmpty() && h.rail() >= 0 && h.rail() < machine.rails().size()) {
                Rail r = machine.rails().get(h.rail());
                sum.merge(r.name(), Math.signum(r.volts()) * h.ratings().get(0).amps(), Double::sum);
            }
        }
        return sum;
    }

    /** One instance's least and most current from each rail, at the solver's rails. */
    StageCurrents currents(StageType st, StageSolver solver) {
        StageCircuit c = circuits.get(st.name());
        return c == null ? declared(st) : computed(st, c, solver);
    }

    private StageCurrents declared(StageType st) {
        Map<String, Double> low = new HashMap<>();
        Map<String, Double> high = new HashMap<>();
        addDraws(st.drawLow(), low);
        addDraws(st.drawHigh(), high);
        Map<String, Double> least = new HashMap<>();
        Map<String, Double> most = new HashMap<>();
        for (Rail r : machine.rails()) {
            double a = low.getOrDefault(r.name(), 0.0);
            double b = high.getOrDefault(r.name(), 0.0);
            least.put(r.name(), Math.abs(a) < Math.abs(b) ? a : b);
            most.put(r.name(), Math.abs(a) < Math.abs(b) ? b : a);
        }
        Map<String, Double> always = new HashMap<>();
        addDraws(st.drawAlways(), always);
        always.forEach((k, v) -> {
            least.merge(k, v, Double::sum);
            most.merge(k, v, Double::sum);
        });
        return new StageCurrents(st.name(), least, most, false);
    }

    private void addDraws(List<RailDraw> draws, Map<String, Double> into) {
        for (RailDraw d : draws) {
            if (d.rail() >= 0 && d.rail() < machine.rails().size()) {
                Rail r = machine.rails().get(d.rail());
                // Draw lines give magnitudes; a negative rail's current flows into it.
                into.merge(r.name(), (r.volts() < 0 ? -1 : 1) * d.amps(), Double::sum);
            }
        }
    }

    private StageCurrents computed(StageType st, StageCircuit c, StageSolver solver) {
        Map<String, Double> least = new HashMap<>();
        Map<String, Double> most = new HashMap<>();
        double high = highInput(st, solver.rails());
        for (boolean[] in : states(c.inputs())) {
            double[] v = new double[in.length];
            for (int i = 0; i < in.length; i++) {
                v[i] = in[i] ? high : 0;
            }
            for (boolean stored : new boolean[] {false, true}) {
                DcResult r = solver.solve(c, v, stored, List.of(), Corner.NOMINAL);
                if (!(r instanceof OperatingPoint p)) {
                    continue; // reported by the stage checks; its share is left out here
                }
                for (Rail rail : machine.rails()) {
                    double a = p.railAmps(rail.name());
                    least.merge(rail.name(), a, (x, y) -> Math.abs(y) < Math.abs(x) ? y : x);
                    most.merge(rail.name(), a, (x, y) -> Math.abs(y) > Math.abs(x) ? y : x);
                }
            }
        }
        return new StageCurrents(st.name(), least, most, true);
    }

    /** A logic 1 at a stage's inputs: its plate rail's volts (a cut-off driver's plate), else the highest rail. */
    private static double highInput(StageType st, RailSet rails) {
        if (st.circuit() != null) {
            Rail r = rails.rail(st.circuit().loadRail());
            if (r != null && r.volts() > 0) {
                return r.volts();
            }
        }
        return rails.rails().values().stream().mapToDouble(Rail::volts).max().orElse(0);
    }

    /** Every input state for few inputs; all low, all high and each input alone high for more. */
    static List<boolean[]> states(int n) {
        List<boolean[]> out = new ArrayList<>();
        if (n <= ENUMERATE_UP_TO) {
            for (int m = 0; m < 1 << n; m++) {
                boolean[] in = new boolean[n];
                for (int i = 0; i < n; i++) {
                    in[i] = (m >> i & 1) != 0;
                }
                out.add(in);
            }
            return out;
        }
        out.add(new boolean[n]);
        boolean[] all = new boolean[n];
        java.util.Arrays.fill(all, true);
        out.add(all);
        for (int i = 0; i < n; i++) {
            boolean[] one = new boolean[n];
            one[i] = true;
            out.add(one);
        }
        return out;
    }
}
