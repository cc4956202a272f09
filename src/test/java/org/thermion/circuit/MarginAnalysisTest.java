package org.thermion.circuit;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Levels, thresholds, noise margins, fan-out and worst-case corners of library nets. */
class MarginAnalysisTest {
    private final TubeLibrary tubes = LibraryParts.tubes();
    private final Map<String, StageCircuit> lib = LibraryParts.stages();
    private final RailSet rails48 = RailSet.volts("bplus", 48, "bias", -24, "relay", 24);

    @Test
    void inverterThresholdsAreItsUnityGainPoints() {
        StageSolver s = new StageSolver(rails48);
        Thresholds t = TransferCurve.thresholds(s, lib.get("triode_nor2"), Corner.NOMINAL);
        assertThat(t.method()).isEqualTo(Thresholds.Method.UNITY_GAIN);
        assertThat(t.vil()).isLessThan(t.vih());
        // Check the definition: the curve's slope at V_IL is -1 (finite difference, 20 mV).
        double h = 0.01;
        double slope = (out(s, t.vil() + h) - out(s, t.vil() - h)) / (2 * h);
        assertThat(slope).isCloseTo(-1.0, within(0.1));
    }

    private double out(StageSolver s, double v) {
        return s.solveAs(StageSolver.RECEIVER, lib.get("triode_nor2"), new double[] {v, -24}, false, List.of(),
                Corner.NOMINAL).point().outputVolts();
    }

    @Test
    void diodeGateThresholdIsItsMidpoint() {
        Thresholds t = TransferCurve.thresholds(new StageSolver(rails48), lib.get("diode_and"), Corner.NOMINAL);
        assertThat(t.method()).isEqualTo(Thresholds.Method.MIDPOINT);
        assertThat(t.vil()).isEqualTo(t.vih());
    }

    @Test
    void readingASampledCurve() {
        // A piecewise-linear inverter: flat at 10 V, slope -4 between 0 and 2 V, flat at 2 V. The
        // interpolated unity-gain points sit in the middle of the sample step of each corner.
        double[] x = new double[41];
        double[] y = new double[41];
        for (int k = 0; k < x.length; k++) {
            x[k] = -5 + 0.25 * k;
            y[k] = Math.max(2, Math.min(10, 10 - 4 * x[k]));
        }
        Thresholds t = TransferCurve.read(x, y, true);
        assertThat(t.vil()).isCloseTo(0, within(0.15));
        assertThat(t.vih()).isCloseTo(2, within(0.15));
    }

    @Test
    void libraryInverterChainHasPositiveMarginsAtFortyEightVolts() {
        MarginAnalysis a = new MarginAnalysis(new StageSolver(rails48));
        StageCircuit inv = lib.get("triode_nor2");
        NoiseMargins m = a.margins(inv, new InputLevels(5, 45), inv, 2, Corner.NOMINAL);
        System.out.printf("triode_nor2 -> 2 x triode_nor2 at 48 V: VOH %.2f VOL %.2f VIL %.2f VIH %.2f NMH %.2f NML %.2f%n",
                m.voh(), m.vol(), m.thresholds().vil(), m.thresholds().vih(), m.highMargin(), m.lowMargin());
        assertThat(m.highMargin()).isPositive();
        assertThat(m.lowMargin()).isPositive();
        assertThat(m.voh()).isGreaterThan(m.vol());
    }

    @Test
    void moreLoadsLowerTheHighLevelAndFanOutShrinksWithTheRail() {
        StageCircuit inv = lib.get("triode_nor2");
        MarginAnalysis a48 = new MarginAnalysis(new StageSolver(rails48));
        double voh1 = a48.margins(inv, new InputLevels(5, 45), inv, 1, Corner.NOMINAL).voh();
        double voh8 = a48.margins(inv, new InputLevels(5, 45), inv, 8, Corner.NOMINAL).voh();
        assertThat(voh8).isLessThan(voh1);
        int fan48 = a48.fanOut(inv, new InputLevels(5, 45), inv, 0.5, Corner.NOMINAL);
        MarginAnalysis a24 = new MarginAnalysis(new StageSolver(RailSet.volts("bplus", 24, "bias", -12)));
        int fan24 = a24.fanOut(inv, new InputLevels(3, 22), inv, 0.5, Corner.NOMINAL);
        System.out.println("triode_nor2 fan-out at 0.5 V margin: 48 V " + fan48 + ", 24 V " + fan24);
        assertThat(fan48).isGreaterThan(0);
        assertThat(fan24).isLessThanOrEqualTo(fan48);
        // The limit is a real limit: one more load breaks the margin.
        if (fan48 < MarginAnalysis.MAX_FAN_OUT) {
            assertThat(a48.margins(inv, new InputLevels(5, 45), inv, fan48 + 1, Corner.NOMINAL).worst()).isLessThan(0.5);
            assertThat(a48.margins(inv, new InputLevels(5, 45), inv, fan48, Corner.NOMINAL).worst()).isGreaterThanOrEqualTo(0.5);
        }
    }

    @Test
    void worstCaseBySensitivityMatchesExhaustiveEnumeration() {
        // Small net: a direct-grid 12AU7 inverter driving one divider-fed 12AU7 inverter. Parameters:
        // both rails, the driver's load and emission, the receiver's load, divider and emission.
        StageCircuit driver = TubeStage.inverter("drv", tubes.require("12AU7"), 1, new LoadResistor(15e3), "bplus",
                CathodeReturn.grounded(), GridNetwork.direct(), null);
        StageCircuit receiver = lib.get("triode_nor2");
        StageSolver s = new StageSolver(rails48);
        WorstCase wc = new WorstCase(new MarginAnalysis(s), Tolerances.DEFAULT);
        InputLevels lv = new InputLevels(-6, 2);
        assertThat(wc.parameters(driver, receiver, 1)).hasSizeLessThanOrEqualTo(10);
        for (WorstMargin w : wc.margins(driver, lv, receiver, 1)) {
            WorstMargin all = wc.exhaustive(w.side(), driver, lv, receiver, 1);
            System.out.printf("%s: nominal %.3f V, by sensitivity %.3f V at [%s]; exhaustive %.3f V at [%s]%n",
                    w.side(), w.nominal(), w.worst(), w.corner().describe(), all.worst(), all.corner().describe());
            assertThat(w.worst()).isLessThan(w.nominal());
            assertThat(w.worst()).isCloseTo(all.worst(), within(0.02 + 0.02 * Math.abs(w.nominal() - all.worst())));
        }
    }

    @Test
    void aNetIsAnalysedOnceWithEveryInputState() {
        StageSolver s = new StageSolver(rails48);
        MarginAnalysis a = new MarginAnalysis(s);
        NetAnalysis net = a.net(lib.get("diode_and"), new InputLevels(5, 45), lib.get("triode_nor2"), 3);
        assertThat(net.points()).hasSize(16).allMatch(DcResult::solved);
        // AND of four, all inputs high (45 V) above the output: every diode is off, and the 510 k
        // pull-up from 48 V meets three receivers' dividers (1 M + 1.2 M to -24 V, 733.3 k together);
        // by hand (48*733.33 - 24*510) / 1243.33 = 18.467 V. Each grid tap then sits at
        // (18.467*1.2 - 24*1) / 2.2 = -0.84 V, below its cathode, so no grid current.
        assertThat(net.margins().voh()).isCloseTo(18.467, within(0.001));
        long solves = s.solves();
        assertThat(a.net(lib.get("diode_and"), new InputLevels(5, 45), lib.get("triode_nor2"), 3)).isSameAs(net);
        assertThat(s.solves()).isEqualTo(solves);
    }

    /**
     * A flip-flop's steering threshold counts the other half. With a common cathode resistor the
     * conducting half holds the cathode up, so the half being steered starts to conduct only at
     * a higher input than it would on a resistor of its own; with grounded cathodes the two
     * curves differ only by the other half's divider and grid on the plate.
     */
    @Test
    void aFlipFlopsInputThresholdCountsTheOtherHalfOnASharedCathodeResistor() {
        KorenTriode tube = (KorenTriode) LibraryParts.tubes().require("12AU7");
        GridNetwork cross = new GridNetwork(1e6, 1.2e6, "bias", 0);
        StageSolver s = new StageSolver(rails48);
        FlipFlop shared = new FlipFlop("ff", tube, 100e3, "bplus", cross, new CathodeReturn(2.2e3, RailSet.GROUND));
        Thresholds opened = TransferCurve.thresholds(s, MarginAnalysis.swept(shared), Corner.NOMINAL);
        Thresholds alone = TransferCurve.thresholds(s, TubeStage.inverter("half", tube, 1, new LoadResistor(100e3),
                "bplus", shared.cathode(), cross, null), Corner.NOMINAL);
        assertThat(opened.vil()).isGreaterThan(alone.vil() + 1);
        // the other half's current in 2.2 k: about 0.4 mA, 1 V on the cathode, 2.2 V at the input
        // through the 1 M / 1.2 M divider (x 2.2 / 1.2); the sweep lands within the same volts
        assertThat(opened.vil() - alone.vil()).isLessThan(6);
    }

    @Test
    void theWorstCornerIsNamed() {
        Corner c = Corner.NOMINAL.with("rail.bplus", 0.95).with("driver.load", 1.05).with("driver.emission", 0.7);
        assertThat(c.describe()).isEqualTo("driver.emission 70 %, driver.load +5 %, bplus -5 %");
        // with the rails it is solved from, a rail reads as the volts it stands at: 47.1 V x 0.95 = 44.7 V
        assertThat(c.describe(RailSet.volts("bplus", 47.1))).isEqualTo("driver.emission 70 %, driver.load +5 %, bplus 44.7 V");
    }
}
