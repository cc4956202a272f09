package org.thermion.circuit;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.thermion.model.Rail;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Circuits far from the library's design rails, as a builder's typing slip makes them: each
 * either solves to what Ohm's law says or is a {@link NoDcSolution} whose words read right.
 */
class OddCircuitsTest {
    private final TubeLibrary lib = LibraryParts.tubes();

    private static FlipFlop flipFlop(KorenTriode tube) {
        return new FlipFlop("ff", tube, 100e3, "bplus", new GridNetwork(470e3, 560e3, "bias", 0),
                CathodeReturn.grounded());
    }

    @Test
    void aFlipFlopOnATenKilovoltBiasRailIsCutOffAndItsPlatesSitWhereTheResistorsPutThem() {
        // A bias rail typed as -10 kV: both grids far below cut-off, no tube current, so each plate is the node
        // of its 100 k load to 48 V and the other grid's 470 k + 560 k divider to -10 kV (Ohm's law):
        // (48 / 100k - 10000 / 1030k) / (1 / 100k + 1 / 1030k) = -841.20 V. Before, Newton's steps of at most
        // 20 V ran out of iterations on the way there and the stage had "no DC solution".
        StageSolver solver = new StageSolver(RailSet.volts("bplus", 48, "bias", -10_000));
        double expected = (48 / 100e3 - 10_000 / 1030e3) / (1 / 100e3 + 1 / 1030e3);
        for (boolean stored : new boolean[] {false, true}) {
            DcResult r = solver.solve(flipFlop((KorenTriode) lib.require("12AU7")), new double[0], stored, List.of(),
                    Corner.NOMINAL);
            assertThat(r.solved()).as("stored " + stored).isTrue();
            assertThat(r.point().outputVolts()).isCloseTo(expected, within(0.01));
        }
    }

    @Test
    void anInverterCutOffOnATenKilovoltRailHasItsPlateAtTheRail() {
        // A 10 kV B+ with the grid held 5 kV below the cathode (beyond cut-off even at 10 kV: mu is 21.5): no plate
        // current, so the plate sits at the rail through its 100 k load (Ohm's law), ten kilovolts from the
        // solver's starting guess of 0 V.
        StageSolver solver = new StageSolver(RailSet.volts("bplus", 10_000));
        TubeStage inv = TubeStage.inverter("inv", lib.require("12AU7"), 1, new LoadResistor(100e3), "bplus",
                CathodeReturn.grounded(), GridNetwork.direct(), null);
        DcResult r = solver.solve(inv, new double[] {-5000}, false, List.of(), Corner.NOMINAL);
        assertThat(r.solved()).isTrue();
        assertThat(r.point().outputVolts()).isCloseTo(10_000, within(1e-3));
    }

    @Test
    void aRailLimitBelowAMilliampIsWrittenInMicroamps() {
        // Before: "0.42 mA drawn, limit 0.00 mA" for a 1 uA limit.
        RailSet weak = RailSet.of(List.of(new Rail("bplus", 48, 0, 1e-6)));
        TubeStage inv = TubeStage.inverter("inv", lib.require("12AU7"), 1, new LoadResistor(100e3), "bplus",
                CathodeReturn.grounded(), GridNetwork.direct(), null);
        DcResult r = new StageSolver(weak).solve(inv, new double[] {0}, false, List.of(), Corner.NOMINAL);
        assertThat(r).isInstanceOf(NoDcSolution.class);
        assertThat(((NoDcSolution) r).reason()).contains("limit 1.00 uA").doesNotContain("0.00");
    }

    @Test
    void aCurrentOfAmperesIsWrittenInAmperes() {
        // A thyratron fired into a 1 ohm coil with no series resistor on an ideal 24 V rail limited to 1 A:
        // (24 V - 8 V arc drop) / (1 ohm + the arc's own 1 ohm) = 8 A (Ohm's law). Before: "8000.00 mA drawn,
        // limit 1000.00 mA".
        RailSet rails = RailSet.of(List.of(new Rail("relay", 24, 0, 1), new Rail("bias", -24, 0, Double.POSITIVE_INFINITY)));
        ThyratronStage thy = new ThyratronStage("thy", (GasThyratron) lib.require("2D21"), new RelayCoil(1, 50e-3, 10e-3),
                "relay", 0, new GridNetwork(100e3, 100e3, "bias", 0), CathodeReturn.grounded());
        DcResult r = new StageSolver(rails).solve(thy, new double[] {24}, false, List.of(), Corner.NOMINAL);
        assertThat(r).isInstanceOf(NoDcSolution.class);
        assertThat(((NoDcSolution) r).reason()).contains("8.00 A drawn, limit 1.00 A");
    }
}
