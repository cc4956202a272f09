package org.thermion.levels;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.RailSet;
import org.thermion.circuit.StageSolver;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.power.Budget;

/**
 * The rails levels are figured at: each at its voltage under the machine's heaviest static load
 * (every stage at its highest draw: {@code budget}'s "at peak" without a run), with how far it
 * rises when the load is lightest, so that a worst case spans from the heaviest load's voltage
 * less the rail tolerance to the lightest load's plus it. A rail feeding stages that sags past
 * its tolerance is an error of its own ({@link ElectricalCheck}); the levels then stand at the
 * declared voltages, and {@code problem} says why, so that the one cause is not reported as a
 * failing margin on every net. {@code budget} is the static budget the voltages come from (check
 * judges the supplies and heater strings by the same one).
 */
public record RailsUnderLoad(StageSolver solver, Map<String, Double> lightRise, String problem, Budget budget) {
    public RailsUnderLoad {
        lightRise = Map.copyOf(lightRise);
    }

    /** The machine's rails under its static loads, judged against a rail tolerance (a fraction). */
    public static RailsUnderLoad of(Machine m, MachineCircuits circuits, double tolerance) {
        Budget budget = new Budget(m);
        Map<String, Rail> heavy = new LinkedHashMap<>(circuits.rails().rails());
        Map<String, Double> rise = new LinkedHashMap<>();
        for (int i = 0; i < m.rails().size(); i++) {
            Rail r = m.rails().get(i);
            Budget.Supply supply = budget.supply().get(i);
            double sag = sagPast(r, supply, tolerance);
            if (!Double.isNaN(sag)) {
                return new RailsUnderLoad(circuits.solver(), Map.of(), String.format(Locale.ROOT,
                        "rail %s sags %.1f %% under the heaviest load, past its ±%.0f %%", r.name(), 100 * sag,
                        100 * tolerance), budget);
            }
            double most = Math.signum(r.volts()) * supply.voltsAtPeak();
            double least = budget.voltsAtLightest(i);
            if (Double.isFinite(most) && most != 0) {
                heavy.put(r.name(), new Rail(r.name(), most, r.sourceOhms(), r.limitAmps()));
                double f = least / most;
                if (Double.isFinite(f) && f > 1) {
                    rise.put(r.name(), f);
                }
            }
        }
        return new RailsUnderLoad(new StageSolver(new RailSet(heavy)), rise, null, budget);
    }

    /**
     * How far (a fraction) a rail feeding stages sags below its declared voltage at the static peak
     * load, when that is past {@code tolerance}; NaN when it holds, or when only heaters hang on it
     * (heater strings are judged by their own ±10 %).
     */
    static double sagPast(Rail rail, Budget.Supply s, double tolerance) {
        double nominal = Math.abs(rail.volts());
        double loaded = Math.abs(s.voltsAtPeak());
        double sag = (nominal - loaded) / nominal;
        return s.stageAmps() > 0 && nominal > 0 && Double.isFinite(loaded) && sag > tolerance ? sag : Double.NaN;
    }

    /** A rail's voltage where the levels are solved (NaN for a rail the machine lacks). */
    public double volts(String rail) {
        Rail r = solver.rails().rail(rail);
        return r == null ? Double.NaN : r.volts();
    }
}
