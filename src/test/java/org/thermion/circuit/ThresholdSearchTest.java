package org.thermion.circuit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class ThresholdSearchTest {
    /**
     * A receiver's V_IH sits where its grid starts to draw current: the 1 M / 1.2 M divider to the
     * bias rail puts the grid at the cathode when V_in x 1.2 / 2.2 = |V_bias| x 1 / 2.2, V_in =
     * |V_bias| / 1.2 (the divider by Ohm's law; 20 V at -24 V). There the slope jumps from the
     * stage's gain to almost nothing, and the secant method on the slope fails: the search must
     * still find it at a corner, by bisection, within the slope's central difference of the kink.
     */
    @Test
    void theHighThresholdIsFoundAtTheKinkWhereTheGridStartsToDrawCurrent() {
        StageSolver s = LibraryParts.circuits().solver();
        StageCircuit inv = LibraryParts.stages().get("pentode_inverter");
        Thresholds nominal = TransferCurve.thresholds(s, inv, Corner.NOMINAL);
        double bias = s.rails().rail("bias").volts();
        for (double f : new double[] {0.95, 1.05}) {
            Corner c = Corner.NOMINAL.with("rail.bias", f);
            Thresholds near = ThresholdSearch.near(s, inv, c, nominal);
            assertThat(near).as("bias x %s", f).isNotNull();
            assertThat(near.vih()).isCloseTo(Math.abs(bias * f) / 1.2, within(0.1));
            // the low threshold is a smooth crossing: the search and a whole sweep agree
            assertThat(near.vil()).isCloseTo(TransferCurve.thresholds(s, inv, c).vil(), within(0.1));
        }
    }
}
