package org.thermion.circuit;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

import org.thermion.model.BypassTrigger;
import org.thermion.model.Machine;
import org.thermion.model.Relay;
import org.thermion.model.SoftStart;
import org.thermion.model.StageType;

/**
 * The electrical view of one elaborated machine: its own rails, the circuit of each stage type,
 * and one caching solver at those rails. Every consumer of operating points (check, the net
 * levels report, budget, timing, power-up, build documents) starts here, so there is one place
 * that decides where a stage's circuit comes from.
 */
public final class MachineCircuits {
    private final RailSet rails;
    private final Map<String, StageCircuit> byStage;
    private final TubeLibrary tubes;
    private final StageSolver solver;
    private final Machine machine;

    private MachineCircuits(Machine machine, RailSet rails, Map<String, StageCircuit> byStage, TubeLibrary tubes) {
        this.machine = machine;
        this.rails = rails;
        this.byStage = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(byStage));
        this.tubes = tubes;
        this.solver = new StageSolver(rails);
    }

    /** The machine's circuits as its stage blocks declare them, at its declared rail voltages. */
    public static MachineCircuits of(Machine machine) {
        TubeLibrary tubes = TubeLibrary.of(machine.tubes());
        Map<String, StageCircuit> byStage = new LinkedHashMap<>();
        for (StageType st : machine.stages()) {
            StageCircuits.build(st, machine.tubes().get(st.tube()).name(), tubes).ifPresent(c -> byStage.put(st.name(), c));
        }
        return new MachineCircuits(machine, RailSet.of(machine.rails()), byStage, tubes);
    }

    /** The rails the circuits are solved at. */
    public RailSet rails() {
        return rails;
    }

    /** The circuit of a stage type, empty when the stage has none (a declared-current stage). */
    public Optional<StageCircuit> circuit(StageType stage) {
        return Optional.ofNullable(byStage.get(stage.name()));
    }

    /**
     * The circuit that drives soft start {@code s}'s bypass: its thyratron relay stage with the
     * soft start's relay coil as the plate load; empty for a delay bypass or a stage without a
     * thyratron circuit. Its grid network's input is on {@link RailSet#highest()}.
     */
    public Optional<ThyratronStage> softStartDriver(SoftStart s) {
        if (!(s.trigger() instanceof BypassTrigger.ThyratronWarm tw)
                || !(byStage.get(machine.stages().get(tw.stage()).name()) instanceof ThyratronStage ts)) {
            return Optional.empty();
        }
        Relay r = s.relay();
        RelayCoil coil = new RelayCoil(r.coilOhms(), r.pickupVolts() / r.coilOhms(),
                Math.min(r.dropoutVolts(), r.pickupVolts()) / r.coilOhms());
        return Optional.of(new ThyratronStage(ts.name(), ts.tube(), coil, ts.plateRail(), ts.plateOhms(), ts.grid(),
                ts.cathode()));
    }

    /** Every stage type's circuit by stage name, in declaration order. */
    public Map<String, StageCircuit> circuitsByName() {
        return byStage;
    }

    /** The tube models the circuits use. */
    public TubeLibrary tubes() {
        return tubes;
    }

    /** The shared caching solver at {@link #rails()}; not thread-safe. */
    public StageSolver solver() {
        return solver;
    }
}
