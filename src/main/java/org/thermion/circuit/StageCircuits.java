package org.thermion.circuit;

import java.util.Optional;

import org.thermion.model.StageCircuitSpec;
import org.thermion.model.StageCircuitSpec.Arrangement;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;

/**
 * Builds the circuit a stage block declares ({@link StageCircuitSpec}) from its tube's model:
 * the one translation from the language's parts to the solver's.
 */
public final class StageCircuits {
    private StageCircuits() {
    }

    /** The stage's circuit; empty when it declares none or its tube has no model. */
    public static Optional<StageCircuit> build(StageType stage, String tubeName, TubeLibrary tubes) {
        StageCircuitSpec s = stage.circuit();
        Optional<TubeModel> model = tubes.model(tubeName);
        if (s == null || model.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(build(stage, s, model.get()));
    }

    private static StageCircuit build(StageType stage, StageCircuitSpec s, TubeModel tube) {
        String name = stage.name();
        CathodeReturn cathode = new CathodeReturn(s.cathodeOhms(), s.cathodeRail(), Double.isNaN(s.cathodeCoilPickupAmps())
                ? null : new RelayCoil(s.cathodeOhms(), s.cathodeCoilPickupAmps(), 0));
        GridNetwork grid = new GridNetwork(s.gridSeriesOhms(), s.gridToBiasOhms(), s.gridRail(), s.gridStopperOhms());
        int inputs = Math.max(1, stage.fanIn());
        switch (s.arrangement()) {
            case DIODES:
                DiodeGate.Kind kind = stage.function() == StageFunction.OR ? DiodeGate.Kind.OR : DiodeGate.Kind.AND;
                return new DiodeGate(name, (ChildDiode) tube, kind, inputs, s.load().ohms(), s.loadRail());
            case CROSSED:
                return new FlipFlop(name, (KorenTriode) tube, s.load().ohms(), s.loadRail(), grid, cathode);
            case THYRATRON:
                return new ThyratronStage(name, (GasThyratron) tube, plateLoad(s.load()), s.loadRail(), s.seriesOhms(),
                        grid, cathode);
            default:
                boolean series = s.arrangement() == Arrangement.SERIES;
                int perInput = series || stage.sectionsPerInput() ? 1 : Math.max(1, stage.sections() / inputs);
                ScreenSupply screen = Double.isNaN(s.screenOhms()) ? null : new ScreenSupply(s.screenOhms(), s.screenRail());
                return new TubeStage(name, tube, series ? TubeStage.Arrangement.SERIES : TubeStage.Arrangement.PARALLEL,
                        inputs, perInput, plateLoad(s.load()), s.loadRail(), cathode, grid, screen,
                        s.outputAtCathode() ? TubeStage.Output.CATHODE : TubeStage.Output.PLATE);
        }
    }

    /** The solver's part for a declared plate load (null: the plate on its rail). */
    static PlateLoad plateLoad(StageCircuitSpec.PlateLoadSpec p) {
        if (p == null) {
            return new DirectToRail();
        }
        if (p instanceof StageCircuitSpec.Coil c) {
            return new RelayCoil(c.ohms(), c.pickupAmps(), c.dropoutAmps());
        }
        if (p instanceof StageCircuitSpec.Lamp l) {
            return new Lamp(l.volts(), l.amps(), Lamp.TYPICAL_COLD_RATIO);
        }
        return new LoadResistor(p.ohms());
    }
}
