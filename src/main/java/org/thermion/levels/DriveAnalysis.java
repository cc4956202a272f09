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
import org.thermion.circuit.NoDcSolution;
import org.thermion.circuit.Parameter;
import org.thermion.circuit.PlateLoad;
import org.thermion.circuit.RelayCoil;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageSolver;
import org.thermion.circuit.ThyratronStage;
import org.thermion.circuit.Tolerances;
import org.thermion.circuit.TubeStage;
import org.thermion.circuit.WorstCase;
import org.thermion.model.BypassTrigger;
import org.thermion.model.Gate;
import org.thermion.model.Machine;
import org.thermion.model.Relay;
import org.thermion.model.SoftStart;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;

/**
 * Lamp and relay-coil drivers: the current in the load with the stage's input at its driving
 * net's high level (the tube conducts: lamp lit, coil pulled in; a thyratron fires) and at its
 * low level (cut off), at nominal values and at the tolerance corner that lowers the "on" current
 * or raises the "off" current. Tube stages and thyratron stages alike; a relay stage whose load
 * is a plain resistor is listed with its pick-up unknown. Each soft start's bypass relay is judged
 * the same way: its coil in place of the thyratron stage's load, the tube fired. Uses of one kind
 * (stage, input levels) are solved once.
 */
final class DriveAnalysis {
    private final Machine machine;
    private final MachineCircuits circuits;
    /** Solves at the rails the levels are figured at. */
    private final StageSolver solver;
    private final Tolerances tolerances;
    private final Map<List<Object>, Figures> cache = new HashMap<>();

    /** One kind of drive's currents and corners. */
    private record Figures(double on, double onWorst, Corner onCorner, double off, double offWorst, Corner offCorner,
                           NoDcSolution unsolved) {
    }

    DriveAnalysis(Machine machine, MachineCircuits circuits, StageSolver solver, Tolerances tolerances) {
        this.machine = machine;
        this.circuits = circuits;
        this.solver = solver;
        this.tolerances = tolerances;
    }

    /**
     * Every gate whose stage drives a lamp or a coil, its input at the levels of its input net
     * (nominal; at the worst corner also the levels that net has at its own worst corners); then
     * the soft starts.
     */
    List<LoadDrive> drives(NetFanout fanout, double[] low, double[] high, double[] worstLow, double[] worstHigh) {
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
            PlateLoad load = c.map(DriveAnalysis::loadOf).orElse(null);
            if (load == null) {
                continue;
            }
            String part = part(c.get());
            LoadDrive.Kind kind = load instanceof Lamp ? LoadDrive.Kind.LAMP : LoadDrive.Kind.COIL;
            if (kind == LoadDrive.Kind.COIL && !(load instanceof RelayCoil) && st.function() != StageFunction.RELAY) {
                continue; // a lamp stage with a plain resistor: nothing to judge
            }
            double rated = load instanceof Lamp lamp ? lamp.ratedAmps()
                    : load instanceof RelayCoil coil ? coil.pickupAmps() : Double.NaN;
            double dropout = load instanceof RelayCoil coil ? coil.dropoutAmps() : Double.NaN;
            InputLevels levels = levels(g, low, high);
            InputLevels worst = levels(g, worstLow, worstHigh);
            Figures f = cache.computeIfAbsent(List.of(c.get(), levels, worst), k -> solve(c.get(), part, levels, worst));
            boolean follower = c.get() instanceof TubeStage ts && ts.output() == TubeStage.Output.CATHODE;
            out.add(new LoadDrive(new StageUse(false, g.id()), -1, fanout.nodeOf(g.output()).name(), st.name(), kind,
                    f.on(), f.onWorst(), f.onCorner(), f.off(), f.offWorst(), f.offCorner(), rated, dropout,
                    ohmsOf(load), Double.NaN, follower, f.unsolved()));
        }
        for (int i = 0; i < machine.softStarts().size(); i++) {
            LoadDrive d = softStart(i, machine.softStarts().get(i));
            if (d != null) {
                out.add(d);
            }
        }
        return List.copyOf(out);
    }

    /**
     * A soft start's bypass relay on its thyratron stage: the relay block's coil in place of the
     * stage's load, the tube unfired and its grid network's input on the highest rail, as the wire
     * list has it: a grid held below its critical voltage never fires, and the coil gets nothing.
     */
    private LoadDrive softStart(int index, SoftStart s) {
        if (!(s.trigger() instanceof BypassTrigger.ThyratronWarm w)) {
            return null;
        }
        StageType st = machine.stages().get(w.stage());
        Optional<ThyratronStage> found = circuits.softStartDriver(s);
        if (found.isEmpty()) {
            return null;
        }
        ThyratronStage driver = found.get();
        RelayCoil coil = (RelayCoil) driver.load();
        Relay r = s.relay();
        // unfired at first: with its grid network on the highest rail it must fire by its grid once warm
        double gridIn = solver.rails().highest().volts();
        ToDoubleFunction<Corner> onAmps = k -> amps(solver, driver, LOAD, gridIn, false, k);
        List<Parameter> params = parameters(solver, driver);
        Corner onCorner = WorstCase.worstCorner(params, tolerances, onAmps);
        NoDcSolution unsolved = unsolved(solver, driver, gridIn, false);
        return new LoadDrive(null, index, s.name(), st.name(), LoadDrive.Kind.COIL, onAmps.applyAsDouble(Corner.NOMINAL),
                onAmps.applyAsDouble(onCorner), onCorner, Double.NaN, Double.NaN, Corner.NOMINAL, coil.pickupAmps(),
                Double.NaN, coil.ohms(), r.ratedVolts(), false, unsolved);
    }

    /** The solver's label of a stage's plate load, and of a coil in its cathode. */
    private static final String LOAD = "load";
    private static final String CATHODE = "cathode";

    /**
     * The load a lamp or relay stage drives: its plate load, or a follower's coil in its cathode;
     * null for other circuits.
     */
    private static PlateLoad loadOf(StageCircuit c) {
        if (c instanceof TubeStage ts) {
            if (ts.cathode().coil() != null) {
                return ts.cathode().coil();
            }
            return ts.load().direct() ? null : ts.load();
        }
        if (c instanceof ThyratronStage ts) {
            return ts.load();
        }
        return null;
    }

    /** Which part of the stage carries the load's current. */
    private static String part(StageCircuit c) {
        return c instanceof TubeStage ts && ts.cathode().coil() != null ? CATHODE : LOAD;
    }

    private static double ohmsOf(PlateLoad load) {
        if (load instanceof RelayCoil c) {
            return c.ohms();
        }
        if (load instanceof Lamp l) {
            return l.hotOhms();
        }
        return load instanceof org.thermion.circuit.LoadResistor r ? r.ohms() : Double.NaN;
    }

    /** The worst of the input nets' levels, rounded outward. */
    private static InputLevels levels(Gate g, double[] low, double[] high) {
        double lo = low[g.input(0)];
        double hi = high[g.input(0)];
        for (int p = 1; p < g.arity(); p++) {
            lo = Math.max(lo, low[g.input(p)]);
            hi = Math.min(hi, high[g.input(p)]);
        }
        return LevelAnalysis.outward(lo, hi);
    }

    private Figures solve(StageCircuit stage, String part, InputLevels levels, InputLevels worst) {
        StageSolver s = solver;
        // a higher grid means more current in every arrangement (a follower's too; a thyratron fires and holds);
        // at the worst corner the input is also at its driving net's worst level
        ToDoubleFunction<Corner> onAmps = c -> amps(s, stage, part, levels.high(), false, c);
        ToDoubleFunction<Corner> offAmps = c -> -amps(s, stage, part, levels.low(), false, c);
        ToDoubleFunction<Corner> onWorst = c -> Math.min(onAmps.applyAsDouble(c), amps(s, stage, part, worst.high(), false, c));
        ToDoubleFunction<Corner> offWorst = c -> Math.min(offAmps.applyAsDouble(c),
                -amps(s, stage, part, worst.low(), false, c));
        List<Parameter> params = parameters(s, stage);
        Corner onCorner = WorstCase.worstCorner(params, tolerances, onWorst);
        Corner offCorner = WorstCase.worstCorner(params, tolerances, offWorst);
        NoDcSolution unsolved = unsolved(s, stage, levels.high(), false);
        if (unsolved == null) {
            unsolved = unsolved(s, stage, levels.low(), false);
        }
        return new Figures(onAmps.applyAsDouble(Corner.NOMINAL), onWorst.applyAsDouble(onCorner), onCorner,
                -offAmps.applyAsDouble(Corner.NOMINAL), -offWorst.applyAsDouble(offCorner), offCorner, unsolved);
    }

    private static List<Parameter> parameters(StageSolver s, StageCircuit stage) {
        List<Parameter> params = new ArrayList<>(s.parameters(StageSolver.DRIVER, stage, List.of()));
        params.sort(java.util.Comparator.comparing(Parameter::label));
        return params;
    }

    private static NoDcSolution unsolved(StageSolver s, StageCircuit stage, double volts, boolean stored) {
        DcResult r = solveAt(s, stage, volts, stored, Corner.NOMINAL);
        return r instanceof NoDcSolution no ? no : null;
    }

    private static DcResult solveAt(StageSolver s, StageCircuit stage, double volts, boolean stored, Corner c) {
        double[] in = new double[stage.inputs()];
        java.util.Arrays.fill(in, volts);
        return s.solve(stage, in, stored, List.of(), c);
    }

    private static double amps(StageSolver s, StageCircuit stage, String part, double volts, boolean stored, Corner c) {
        DcResult r = solveAt(s, stage, volts, stored, c);
        return r.solved() ? Math.abs(r.point().partAmps(StageSolver.DRIVER + "." + part)) : Double.NaN;
    }
}
