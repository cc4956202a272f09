package org.thermion.build;

import org.thermion.circuit.Corner;
import org.thermion.circuit.DcResult;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.OperatingPoint;
import org.thermion.circuit.PartCurrent;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageSolver;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.StageType;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The most a stage's resistor dissipates: the stage's circuit solved (nominal parts, no fan-out)
 * with every input combination at 0 V and at its plate rail, each stored state; the largest
 * volts x amps of the parts with that label. Where no circuit or no solution exists, a bound:
 * the machine's whole rail span across the resistor, V^2/R.
 */
final class Dissipation {
    private final MachineCircuits circuits;
    private final Map<String, Map<String, Double>> byStage = new HashMap<>();
    private final double span;

    Dissipation(Machine m, MachineCircuits circuits) {
        this.circuits = circuits;
        double lo = 0, hi = 0;
        for (Rail r : m.rails()) {
            lo = Math.min(lo, r.volts());
            hi = Math.max(hi, r.volts());
        }
        span = hi - lo;
    }

    /** Watts in the stage's part labelled {@code label} of {@code ohms}. */
    double watts(StageType st, String label, double ohms) {
        return watts(st.name(), () -> circuits.circuit(st), label, ohms);
    }

    /** As {@link #watts(StageType, String, double)} for a circuit of its own (a soft start's driver), named {@code key}. */
    double watts(String key, StageCircuit c, String label, double ohms) {
        return watts("instance " + key, () -> Optional.of(c), label, ohms);
    }

    private double watts(String key, java.util.function.Supplier<Optional<StageCircuit>> c, String label, double ohms) {
        Double v = byStage.computeIfAbsent(key, k -> solve(c.get())).get(label);
        return v != null ? v : span * span / ohms;
    }

    /** The rail-span bound used where nothing was solved. */
    double bound(double ohms) {
        return span * span / ohms;
    }

    private Map<String, Double> solve(Optional<StageCircuit> oc) {
        Map<String, Double> out = new HashMap<>();
        if (oc.isEmpty()) {
            return out;
        }
        StageCircuit c = oc.get();
        StageSolver solver = circuits.solver();
        double high = Math.max(0, circuits.rails().rails().values().stream().mapToDouble(Rail::volts).max().orElse(0));
        int n = Math.min(c.inputs(), 4);
        for (int mask = 0; mask < (1 << n); mask++) {
            double[] in = new double[c.inputs()];
            for (int i = 0; i < in.length; i++) {
                in[i] = i < n && (mask >> i & 1) == 1 ? high : 0;
            }
            for (boolean stored : new boolean[] {false, true}) {
                DcResult r = solver.solve(c, in, stored, List.of(), Corner.NOMINAL);
                if (r instanceof OperatingPoint op) {
                    for (PartCurrent p : op.parts()) {
                        String label = p.label().startsWith(StageSolver.DRIVER + ".")
                                ? p.label().substring(StageSolver.DRIVER.length() + 1) : p.label();
                        out.merge(label, Math.abs(p.amps() * p.volts()), Math::max);
                    }
                }
            }
        }
        return out;
    }
}
