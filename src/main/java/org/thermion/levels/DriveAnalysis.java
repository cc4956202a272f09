package org.thermion.levels;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.ToDoubleFunction;

import org.thermion.circuit.Corner;
import org.thermion.circuit.DcResult;
import org.thermion.circuit.InputLevels;
import org.thermion.circuit.Lamp;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.Parameter;
import org.thermion.circuit.RelayCoil;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageSolver;
import org.thermion.circuit.Tolerances;
import org.thermion.circuit.TubeStage;
import org.thermion.circuit.WorstCase;
import org.thermion.model.Gate;
import org.thermion.model.Machine;
import org.thermion.model.StageType;

/**
 * Lamp and relay-coil drivers: the current in the plate load with the stage's input at its
 * driving net's high level (the tube conducts: lamp lit, coil pulled in) and at its low level
 * (cut off), at nominal values and at the tolerance corner that lowers the "on" current or raises
 * the "off" current. Uses of one kind (stage, input levels) are solved once.
 */
final class DriveAnalysis {
    private final Machine machine;
    private final MachineCircuits circuits;
    private final Tolerances tolerances;
    private final Map<List<Object>, double[]> cache = new HashMap<>();
    private final Map<List<Object>, Corner[]> corners = new HashMap<>();

    DriveAnalysis(Machine machine, MachineCircuits circuits, Tolerances tolerances) {
        this.machine = machine;
        this.circuits = circuits;
        this.tolerances = tolerances;
    }

    /** Every gate whose stage drives a lamp or a coil, its input at the levels of its input net. */
    List<LoadDrive> drives(NetFanout fanout, double[] low, double[] high) {
        List<LoadDrive> out = new ArrayList<>();
        for (Gate g : machine.netlist().gates()) {
            if (g.stage() < 0) {
                continue;
            }
            StageType st = machine.stages().get(g.stage());
            if (!st.function().isDriver()) {
                continue;
            }
            Optional<StageCircuit> c = circuits.circuit(st);
            if (c.isEmpty() || !(c.get() instanceof TubeStage ts)) {
                continue;
            }
            LoadDrive.Kind kind;
            double rated;
            double dropout;
            if (ts.load() instanceof Lamp lamp) {
                kind = LoadDrive.Kind.LAMP;
                rated = lamp.ratedAmps();
                dropout = Double.NaN;
            } else if (ts.load() instanceof RelayCoil coil) {
                kind = LoadDrive.Kind.COIL;
                rated = coil.pickupAmps();
                dropout = coil.dropoutAmps();
            } else {
                continue;
            }
            double lo = low[g.input(0)];
            double hi = high[g.input(0)];
            for (int p = 1; p < g.arity(); p++) {
                lo = Math.max(lo, low[g.input(p)]);
                hi = Math.min(hi, high[g.input(p)]);
            }
            InputLevels levels = LevelAnalysis.outward(lo, hi);
            List<Object> key = List.of(ts, levels);
            double[] a = cache.get(key);
            if (a == null) {
                a = solve(ts, levels.low(), levels.high(), key);
                cache.put(key, a);
            }
            Corner[] cs = corners.get(key);
            out.add(new LoadDrive(new StageUse(false, g.id()), fanout.nodeOf(g.output()).name(), st.name(), kind, a[0],
                    a[1], cs[0], a[2], a[3], cs[1], rated, dropout));
        }
        return List.copyOf(out);
    }

    private double[] solve(TubeStage ts, double lo, double hi, List<Object> key) {
        StageSolver s = circuits.solver();
        // the tube conducts with its input high when its output is at the plate (an inverting driver)
        double on = ts.inverting() ? hi : lo;
        double off = ts.inverting() ? lo : hi;
        ToDoubleFunction<Corner> onAmps = c -> amps(s, ts, on, c);
        ToDoubleFunction<Corner> offAmps = c -> -amps(s, ts, off, c);
        List<Parameter> params = new ArrayList<>(s.parameters(StageSolver.DRIVER, ts, List.of()));
        params.sort(java.util.Comparator.comparing(Parameter::label));
        Corner onCorner = WorstCase.worstCorner(params, tolerances, onAmps);
        Corner offCorner = WorstCase.worstCorner(params, tolerances, offAmps);
        corners.put(key, new Corner[] {onCorner, offCorner});
        return new double[] {onAmps.applyAsDouble(Corner.NOMINAL), onAmps.applyAsDouble(onCorner),
            -offAmps.applyAsDouble(Corner.NOMINAL), -offAmps.applyAsDouble(offCorner)};
    }

    private static double amps(StageSolver s, TubeStage ts, double volts, Corner c) {
        double[] in = new double[ts.inputs()];
        java.util.Arrays.fill(in, volts);
        DcResult r = s.solve(ts, in, false, List.of(), c);
        return r.solved() ? Math.abs(r.point().partAmps(StageSolver.DRIVER + ".load")) : Double.NaN;
    }
}
