package org.thermion.timing;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.CathodeReturn;
import org.thermion.circuit.Corner;
import org.thermion.circuit.GridNetwork;
import org.thermion.circuit.KorenTriode;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.LoadResistor;
import org.thermion.circuit.RailSet;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageSolver;
import org.thermion.circuit.Tolerances;
import org.thermion.circuit.TubeLibrary;
import org.thermion.circuit.TubeStage;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Switching figures from operating points against textbook results. */
class StageDriveTest {
    /** The library's stages and tubes, as the demo machine (which includes the library) has them. */
    private static final MachineCircuits LIBRARY = demo();
    private final TubeLibrary tubes = LIBRARY.tubes();

    private static MachineCircuits demo() {
        org.thermion.lang.Diagnostics d = new org.thermion.lang.Diagnostics();
        return MachineCircuits.of(new org.thermion.elab.Elaborator(new org.thermion.lang.SourceSet(), d)
                .elaborate(java.nio.file.Path.of("examples/pumpstation/pumpstation.machine")));
    }

    @Test
    void aCutOffPlateRisesThroughItsLoadAlone() {
        // Both grids far below cut-off: the node charges through the 100 k load only, so the
        // effective resistance is the load and the edge ln 9 RC (Millman & Taub, Pulse and Digital Circuits).
        StageDrive d = new StageDrive(new StageSolver(RailSet.volts("bplus", 48.0, "bias", -24.0)), 48);
        StageCircuit nor = LIBRARY.circuitsByName().get("triode_nor2");
        assertThat(d.edges(nor, List.of(), Corner.NOMINAL).riseOhms()).isCloseTo(100e3, within(100e3 * 0.01));
    }

    @Test
    void resistanceLoadedTriodeGainIsMuRlOverRpPlusRl() {
        // A 12AU7 with a 22 k plate load from 300 V, grid driven directly, swept across its transfer curve.
        KorenTriode u7 = (KorenTriode) tubes.require("12AU7");
        StageSolver solver = new StageSolver(RailSet.volts("bplus", 300.0));
        TubeStage stage = TubeStage.inverter("amp", u7, 1, new LoadResistor(22e3), "bplus", CathodeReturn.grounded(),
                GridNetwork.direct(), null);
        StageDrive d = new StageDrive(solver, 0);
        double gain = new StageDrive(solver, -20).millerGain(stage);
        // 12AU7 at 250 V, -8.5 V, 10.5 mA: mu 17, rp 7.7 k (RCA receiving tube data, from memory):
        // A = mu RL / (rp + RL) = 17 x 22 / 29.7 = 12.6; the model within the published equations' 25 %.
        assertThat(gain).isCloseTo(17 * 22e3 / (7.7e3 + 22e3), within(12.6 * 0.25));
        // The same formula with mu and rp of the model at its own operating point: small-signal theory, 3 %.
        double vin = midpoint(solver, stage, -20, 0);
        double vp = solver.solve(stage, new double[] {vin}, false, List.of(), Corner.NOMINAL).point().outputVolts();
        double h = 0.01;
        double gm = (u7.plateCurrent(vp, vin + h) - u7.plateCurrent(vp, vin - h)) / (2 * h);
        double rp = 2 * h / (u7.plateCurrent(vp + h, vin) - u7.plateCurrent(vp - h, vin));
        double mu = gm * rp;
        assertThat(gain).isCloseTo(mu * 22e3 / (rp + 22e3), within(0.03 * gain));
        assertThat(d.millerGain(LIBRARY.circuitsByName().get("diode_and"))).isNaN();
    }

    @Test
    void theSlowCornerTakesTheEndsThatSlowEachEdge() {
        // At -12 V bias the library's divider drives the grid well into conduction (at -24 V it barely switches).
        StageDrive d = new StageDrive(new StageSolver(RailSet.volts("bplus", 48.0, "bias", -12.0)), 48);
        StageCircuit inv = LIBRARY.circuitsByName().get("pentode_inverter");
        Corner fall = d.slowCorner(inv, List.of(), Tolerances.DEFAULT, false);
        Corner rise = d.slowCorner(inv, List.of(), Tolerances.DEFAULT, true);
        // A worn tube pulls the plate down more slowly; a larger load charges it more slowly.
        assertThat(fall.factor("driver.emission")).isEqualTo(0.70);
        assertThat(rise.factor("driver.load")).isEqualTo(1.05);
        assertThat(d.edges(inv, List.of(), fall).fallOhms()).isGreaterThan(d.edges(inv, List.of(), Corner.NOMINAL).fallOhms());
        assertThat(d.edges(inv, List.of(), rise).riseOhms()).isGreaterThan(d.edges(inv, List.of(), Corner.NOMINAL).riseOhms());
    }

    /** The input volts where the output is halfway between its ends for inputs {@code lo} and {@code hi}. */
    private static double midpoint(StageSolver s, TubeStage t, double lo, double hi) {
        double a = lo;
        double b = hi;
        double vLo = out(s, t, lo);
        double mid = (vLo + out(s, t, hi)) / 2;
        for (int i = 0; i < 60; i++) {
            double m = (a + b) / 2;
            if ((out(s, t, m) > mid) == (vLo > mid)) {
                a = m;
            } else {
                b = m;
            }
        }
        return (a + b) / 2;
    }

    private static double out(StageSolver s, TubeStage t, double vin) {
        return s.solve(t, new double[] {vin}, false, List.of(), Corner.NOMINAL).point().outputVolts();
    }
}
