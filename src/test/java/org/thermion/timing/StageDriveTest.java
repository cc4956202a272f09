package org.thermion.timing;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.CathodeReturn;
import org.thermion.circuit.Corner;
import org.thermion.circuit.DirectToRail;
import org.thermion.circuit.FlipFlop;
import org.thermion.circuit.OperatingPoint;
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
    private static final org.thermion.model.Machine LIBRARY_MACHINE = demoMachine();
    private static final MachineCircuits LIBRARY = MachineCircuits.of(LIBRARY_MACHINE);
    private final TubeLibrary tubes = LIBRARY.tubes();

    private static org.thermion.model.Machine demoMachine() {
        org.thermion.lang.Diagnostics d = new org.thermion.lang.Diagnostics();
        return new org.thermion.elab.Elaborator(new org.thermion.lang.SourceSet(), d)
                .elaborate(java.nio.file.Path.of("examples/pumpstation/pumpstation.machine"));
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
    void cathodeFollowerGainIsMuRkOverRpPlusMuPlusOneRk() {
        // A 12AU7 section, plate on 355 V, 10 k cathode resistor to ground, grid driven directly;
        // swept 0..200 V the middle of its swing sits near 105 V on the cathode: 10.5 mA, 250 V plate
        // to cathode, the data sheet's operating point.
        KorenTriode u7 = (KorenTriode) tubes.require("12AU7");
        StageSolver solver = new StageSolver(RailSet.volts("bplus", 355.0));
        double rk = 10e3;
        TubeStage follower = new TubeStage("follower", u7, TubeStage.Arrangement.PARALLEL, 1, 1, new DirectToRail(),
                "bplus", new CathodeReturn(rk, RailSet.GROUND), GridNetwork.direct(), null, TubeStage.Output.CATHODE);
        StageDrive d = new StageDrive(solver, 200);
        StageDrive.GridGains g = d.gridGains(follower);
        assertThat(g.plate()).isZero();
        assertThat(d.millerGain(follower)).isEqualTo(g.cathode());
        // Cathode follower: A = mu Rk / (rp + (mu + 1) Rk) (F. Langford-Smith, Radiotron Designer's
        // Handbook, 4th ed., cathode-follower chapter; from memory). With the 12AU7's published mu 17
        // and gm 2.2 mA/V (rp = mu / gm = 7.7 k) at 250 V, -8.5 V, 10.5 mA (RCA data, from memory):
        // A = 170 / (7.7 + 180) = 0.906. Near 1 the gain hardly moves with mu and rp: within 3 %.
        assertThat(g.cathode()).isCloseTo(17 * rk / (17 / 2.2e-3 + 18 * rk), within(0.03));
        // The same formula with mu and rp of the model at the middle of the swing: small-signal theory, 1 %.
        double vin = midpoint(solver, follower, 0, 200);
        double vk = out(solver, follower, vin);
        double[] murp = muRp(u7, 355 - vk, vin - vk);
        assertThat(g.cathode()).isCloseTo(murp[0] * rk / (murp[1] + (murp[0] + 1) * rk), within(0.01 * g.cathode()));
    }

    @Test
    void norGainIsOneSectionsGainOnTheSharedLoadWhileTheOtherIsCutOff() {
        // Two 12AU7 sections on one 100 k load from 48 V, each grid through the library's 470 k / 560 k
        // divider to -24 V: with its input at 0 V the other section's grid sits near -13 V, cut off.
        KorenTriode u7 = (KorenTriode) tubes.require("12AU7");
        StageSolver solver = new StageSolver(RailSet.volts("bplus", 48.0, "bias", -24.0));
        GridNetwork divider = new GridNetwork(470e3, 560e3, "bias", 0);
        TubeStage nor = new TubeStage("nor", u7, TubeStage.Arrangement.PARALLEL, 2, 1, new LoadResistor(100e3), "bplus",
                CathodeReturn.grounded(), divider, null, TubeStage.Output.PLATE);
        StageDrive d = new StageDrive(solver, 48);
        StageDrive.GridGains g = d.gridGains(nor);
        assertThat(g.cathode()).isZero();
        assertThat(g.plate()).isNegative();
        // Resistance-loaded triode: A = mu RL / (rp + RL) (F. E. Terman, Radio Engineers' Handbook, 1943,
        // resistance-coupled amplifier; from memory), mu and rp of the model where the plate sits
        // halfway; the cut-off section adds nothing: 1 %.
        double vin = midpoint(solver, nor, new double[] {0, 0}, 0, 48);
        OperatingPoint p = solver.solve(nor, new double[] {vin, 0}, false, List.of(), Corner.NOMINAL).point();
        double[] murp = muRp(u7, p.outputVolts(), p.nodeVolts().get("driver.tap0"));
        assertThat(-g.plate()).isCloseTo(murp[0] * 100e3 / (murp[1] + 100e3), within(0.01 * -g.plate()));
        // One section alone on the same parts gives the same gain.
        TubeStage one = TubeStage.inverter("one", u7, 1, new LoadResistor(100e3), "bplus", CathodeReturn.grounded(),
                divider, null);
        assertThat(d.gridGains(one).plate()).isCloseTo(g.plate(), within(1e-3 * -g.plate()));
    }

    @Test
    void flipFlopHalfGainIsMuTimesLoadParallelDividerOverRpPlusThat() {
        // A 12AU7 pair, 100 k loads from 48 V, each grid fed from the other plate by 470 k with 680 k to
        // -48 V: a high plate lifts the other grid to its cathode, a low one cuts it off, and halfway
        // through a change the other grid sits below its cathode, so the plate's load is RL in
        // parallel with the divider R1 + R2 (the bias rail is an a.c. ground).
        KorenTriode u7 = (KorenTriode) tubes.require("12AU7");
        StageSolver solver = new StageSolver(RailSet.volts("bplus", 48.0, "bias", -48.0));
        double rl = 100e3;
        double divider = 470e3 + 680e3;
        FlipFlop ff = new FlipFlop("ff", u7, rl, "bplus", new GridNetwork(470e3, 680e3, "bias", 0),
                CathodeReturn.grounded());
        StageDrive.GridGains g = new StageDrive(solver, 48).gridGains(ff);
        assertThat(g.cathode()).isZero();
        // Where plate A sits halfway between its two levels, its tube passes the load's current less
        // the divider's (Kirchhoff, by hand); the model's mu and rp there, and the resistance-coupled
        // stage's A = mu R / (rp + R), R = RL || (R1 + R2) (Terman, as above; from memory): 1 %.
        double vHigh = solver.solve(ff, new double[0], true, List.of(), Corner.NOMINAL).point().outputVolts();
        double vLow = solver.solve(ff, new double[0], false, List.of(), Corner.NOMINAL).point().outputVolts();
        assertThat(vHigh - vLow).isGreaterThan(10);
        double vp = (vHigh + vLow) / 2;
        assertThat(-48 + (vp + 48) * 680e3 / divider).isLessThan(-1); // the other grid: no grid current
        double amps = (48 - vp) / rl - (vp + 48) / divider;
        double[] murp = muRp(u7, vp, gridFor(u7, vp, amps));
        double r = 1 / (1 / rl + 1 / divider);
        assertThat(-g.plate()).isCloseTo(murp[0] * r / (murp[1] + r), within(0.01 * -g.plate()));
        // A pair that cannot hold a state (both grids cut off whatever the plates do) has no gain to give.
        FlipFlop dead = new FlipFlop("dead", u7, rl, "bplus", new GridNetwork(470e3, 470e3, "bias", 0),
                CathodeReturn.grounded());
        assertThat(new StageDrive(solver, 48).gridGains(dead)).isNull();
    }

    @Test
    void aFollowersInputCapacitanceIsBootstrappedAPlateStagesMultiplied() {
        // Cin = Cgp (1 - Ap) + Cgk (1 - Ak) (J. M. Miller, NBS Scientific Papers 15, 1920); the
        // library's 12AU7 has Cgk 1.6 pF and Cgp 1.5 pF (Koren's netlist notes).
        org.thermion.model.Machine m = LIBRARY_MACHINE;
        DelayCalculator calc = new DelayCalculator(m, LIBRARY, null);
        org.thermion.model.StageType follower = stage(m, "cathode_follower");
        org.thermion.model.StageType ff = stage(m, "triode_flipflop");
        double a = calc.gain(follower);
        assertThat(a).isBetween(0.5, 1.0);
        assertThat(calc.inputFarads(follower)).isCloseTo(1.5e-12 + 1.6e-12 * (1 - a), within(1e-18));
        double b = calc.gain(ff);
        assertThat(calc.gainComputed(ff)).isTrue();
        assertThat(calc.inputFarads(ff)).isCloseTo(1.6e-12 + 1.5e-12 * (1 + b), within(1e-18));
        // The lamp driver's input drives both sections' grids at once: twice one grid's.
        org.thermion.model.StageType lamp = stage(m, "lamp_driver");
        double c = calc.gain(lamp);
        assertThat(calc.inputFarads(lamp)).isCloseTo(2 * (1.6e-12 + 1.5e-12 * (1 + c)), within(1e-18));
    }

    private static org.thermion.model.StageType stage(org.thermion.model.Machine m, String name) {
        return m.stages().stream().filter(s -> s.name().equals(name)).findFirst().orElseThrow();
    }

    /** mu and rp of {@code t} at plate-to-cathode {@code vpk} and grid-to-cathode {@code vgk}, by central differences. */
    private static double[] muRp(KorenTriode t, double vpk, double vgk) {
        double h = 0.01;
        double gm = (t.plateCurrent(vpk, vgk + h) - t.plateCurrent(vpk, vgk - h)) / (2 * h);
        double rp = 2 * h / (t.plateCurrent(vpk + h, vgk) - t.plateCurrent(vpk - h, vgk));
        return new double[] {gm * rp, rp};
    }

    /** The grid voltage at which {@code t} passes {@code amps} at plate {@code vpk} (bisection). */
    private static double gridFor(KorenTriode t, double vpk, double amps) {
        double a = -40;
        double b = 0;
        for (int i = 0; i < 80; i++) {
            double m = (a + b) / 2;
            if (t.plateCurrent(vpk, m) < amps) {
                a = m;
            } else {
                b = m;
            }
        }
        return (a + b) / 2;
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
        return midpoint(s, t, new double[] {0}, lo, hi);
    }

    /** As above, the first of {@code in} swept, the others held. */
    private static double midpoint(StageSolver s, TubeStage t, double[] in, double lo, double hi) {
        double a = lo;
        double b = hi;
        double vLo = out(s, t, in, lo);
        double mid = (vLo + out(s, t, in, hi)) / 2;
        for (int i = 0; i < 60; i++) {
            double m = (a + b) / 2;
            if ((out(s, t, in, m) > mid) == (vLo > mid)) {
                a = m;
            } else {
                b = m;
            }
        }
        return (a + b) / 2;
    }

    private static double out(StageSolver s, TubeStage t, double vin) {
        return out(s, t, new double[] {0}, vin);
    }

    private static double out(StageSolver s, TubeStage t, double[] in, double vin) {
        double[] v = in.clone();
        v[0] = vin;
        return s.solve(t, v, false, List.of(), Corner.NOMINAL).point().outputVolts();
    }
}
