package org.thermion.power.startup;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.Machine;

import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

@Timeout(value = 60, unit = TimeUnit.SECONDS)
class PowerUpSolverTest {
    /** 88 6AU6 inverters: 22 strings of four 6.3 V 0.3 A heaters on 24 V. */
    private static Machine inverters(String resistor, String limit) {
        return StartupMachines.elaborate(StartupMachines.inverters(88, resistor, "after 10 s", limit));
    }

    private static RailTransient heat(PowerUpResult r) {
        return r.rails().stream().filter(x -> x.name().equals("heat")).findFirst().orElseThrow();
    }

    @Test
    void atSwitchOnTheColdStringsAreAPlainResistance() {
        Machine m = inverters("5 ohm", "40 A");
        PowerUpResult r = PowerUpSolver.solve(m, PowerUpOptions.defaults());
        HeaterModel h = r.models().get(0);
        // 22 strings of four cold heaters in parallel, behind 0.05 ohm source and 5 ohm soft start: I = V / (Rs + R).
        double load = 4 * h.coldOhms() / 22;
        assertThat(heat(r).amps()[0]).isCloseTo(24 / (0.05 + 5 + load), within(1e-12));
        assertThat(heat(r).t()[0]).isZero();
    }

    @Test
    void heaterEnergyBalances() {
        PowerUpResult r = PowerUpSolver.solve(inverters("2 ohm", "40 A"), PowerUpOptions.defaults());
        for (HeaterWarmup w : r.heaters()) {
            double out = w.joulesStored() + w.joulesRadiated();
            assertThat(out).as(w.tube() + " " + w.position()).isCloseTo(w.joulesIn(), within(0.01 * w.joulesIn()));
        }
    }

    @Test
    void softStartEnergyIsTheIntegralOfItsPower() {
        PowerUpOptions o = PowerUpOptions.defaults().withSampleSeconds(0.001);
        PowerUpResult r = PowerUpSolver.solve(inverters("2 ohm", "40 A"), o);
        RailTransient h = heat(r);
        // Trapezoidal sum of I^2 R over the recorded samples before the bypass, against the integrated state.
        double e = 0;
        for (int i = 1; i < h.t().length && h.t()[i] <= h.bypassTime(); i++) {
            double p0 = h.amps()[i - 1] * h.amps()[i - 1] * 2, p1 = h.amps()[i] * h.amps()[i] * 2;
            e += 0.5 * (p0 + p1) * (h.t()[i] - h.t()[i - 1]);
        }
        assertThat(r.softStarts().get(0).joules()).isCloseTo(e, within(0.01 * e));
    }

    @Test
    void coldInrushOfManySmallTubesIsMoreThanTwiceTheHotCurrent() {
        // Common practice: a cold string draws several times its hot current.
        PowerUpResult r = PowerUpSolver.solve(inverters("5 ohm", "100 A"),
                PowerUpOptions.defaults().withResistor("heat_soft", 0));
        RailTransient h = heat(r);
        assertThat(h.switchOnPeak()).isGreaterThan(2 * h.finalAmps());
    }

    @Test
    void loweringTheResistorRaisesTheSwitchOnPeakAndLowersTheBypassPeak() {
        StartupNetwork net = StartupNetwork.of(inverters("5 ohm", "40 A"), ThermalAssumptions.standard(), DrawMode.HIGHEST);
        PowerUpOptions o = PowerUpOptions.defaults().withSampleSeconds(0);
        RailTransient hi = heat(net.solve(o.withResistor("heat_soft", 3)));
        RailTransient lo = heat(net.solve(o.withResistor("heat_soft", 1.5)));
        assertThat(lo.switchOnPeak()).isGreaterThan(hi.switchOnPeak());
        assertThat(lo.bypassPeak()).isLessThan(hi.bypassPeak());
    }

    @Test
    void fiveOhmsLeavesASpikeAtBypassAndTheBalanceLiesNearTwoOhms() {
        // Our own scenario: about 90 small 0.3 A tubes, four heaters to a string on 24 V, bypassed after ten seconds.
        StartupNetwork net = StartupNetwork.of(inverters("5 ohm", "40 A"), ThermalAssumptions.standard(), DrawMode.HIGHEST);
        PowerUpOptions o = PowerUpOptions.defaults();
        RailTransient five = heat(net.solve(o.withResistor("heat_soft", 5)));
        assertThat(five.bypassTime()).isCloseTo(10.01, within(1e-6));   // 10 s delay + 10 ms relay operate
        assertThat(five.bypassPeak()).isGreaterThan(2 * five.switchOnPeak());
        assertThat(five.bypassPeak()).isGreaterThan(2 * five.finalAmps());

        ResistorSweep.Result s = ResistorSweep.run(net, o, "heat_soft", ResistorSweep.range(0.5, 5, 0.25));
        assertThat(s.recommended()).isNotNull();
        // The physics puts the balance between 1.5 and 2 ohm (about 1.75 ohm): "near 2 ohm".
        assertThat(s.recommended().ohms()).isBetween(1.5, 2.25);
        ResistorSweep.Row best = s.recommended();
        assertThat(Math.abs(best.switchOnPeak() - best.bypassPeak())).isLessThan(0.25 * best.worstPeak());
    }

    @Test
    void aSweepOnTwoThreadsGivesTheSameTableAsOnOne() {
        StartupNetwork net = StartupNetwork.of(inverters("2 ohm", "40 A"), ThermalAssumptions.standard(), DrawMode.HIGHEST);
        double[] ohms = ResistorSweep.range(1, 3, 0.5);
        java.util.Set<Integer> heard = java.util.concurrent.ConcurrentHashMap.newKeySet();
        ResistorSweep.Result one = ResistorSweep.run(net, PowerUpOptions.defaults(), "heat_soft", ohms, 1, d -> { });
        ResistorSweep.Result two = ResistorSweep.run(net, PowerUpOptions.defaults(), "heat_soft", ohms, 2, heard::add);
        assertThat(two.rows()).isEqualTo(one.rows());
        assertThat(two.best()).isEqualTo(one.best());
        assertThat(two.rows()).extracting(ResistorSweep.Row::ohms).containsExactly(1.0, 1.5, 2.0, 2.5, 3.0);
        assertThat(heard).containsExactlyInAnyOrder(1, 2, 3, 4, 5);
    }

    @Test
    void aStringSwitchedStraightOnIsHotInRoughlyTenSeconds() {
        // Common practice: series strings of controlled-warm-up heaters are hot in roughly ten seconds
        // (within a factor of two). Four 6.3 V heaters on 24 V with no soft-start resistor: about 5 s here.
        PowerUpResult r = PowerUpSolver.solve(inverters("5 ohm", "100 A"),
                PowerUpOptions.defaults().withResistor("heat_soft", 0));
        assertThat(r.allWarmSeconds()).isBetween(5.0, 20.0);
    }

    @Test
    void heatersReachNinetyFivePercentAndPlateLoadsComeAlive() {
        // the inverters with typed-in currents (2.4 mA conducting, 0.05 mA cut off: a stage of our own, no circuit)
        String counted = StartupMachines.inverters(88, "2 ohm", "after 10 s", "40 A").replace("realize { not pentode_inverter }", """
                stage counted_inverter : not {
                  tube 6AU6
                  circuit none
                  draw low bplus 2.4 mA
                  draw high bplus 0.05 mA
                }
                realize { not counted_inverter }""");
        PowerUpResult r = PowerUpSolver.solve(StartupMachines.elaborate(counted), PowerUpOptions.defaults());
        assertThat(r.allWarmSeconds()).isBetween(5.0, 30.0);
        RailTransient bplus = r.rails().stream().filter(x -> x.name().equals("bplus")).findFirst().orElseThrow();
        // Nothing flows before the cathodes emit; at the end every inverter draws its highest, 2.4 mA.
        assertThat(bplus.amps()[0]).isLessThan(1e-6);
        double expected = 88 * 2.4e-3 * 48 / (48 + 4 * 88 * 2.4e-3);   // conductance load behind the 4 ohm source
        assertThat(bplus.finalAmps()).isCloseTo(expected, within(0.01 * expected));
    }

    @Test
    void aThyratronWhoseCoilIsItsOnlyPlateLoadCountsTheCoilOnce() {
        // A thyratron stage with a circuit and no series resistor: its load line is the relay coil (100 ohm, the
        // soft start's relay block states the same coil). The coil sees (24 V - 8 V arc drop) / 100 ohm = 160 mA
        // from the stiff relay rail (Ohm's law), not half of it as if a second 100 ohm stood in series.
        String text = StartupMachines.invertersWithThyratron(88, "100 ohm").replace("""
                  draw high relay 100 mA
                  draw low relay 0 mA
                """, """
                  grid divider 100 k 47 k to bias
                """);
        PowerUpResult r = PowerUpSolver.solve(StartupMachines.elaborate(text), PowerUpOptions.defaults().withSampleSeconds(0.01));
        RelayDriverCheck c = r.relayChecks().get(0);
        assertThat(c.plateOhms()).isZero();
        assertThat(c.coilAmps()).isCloseTo((24 - 8.0) / 100, within(1e-9));
    }

    @Test
    void aThyratronTriggerClosesTheRelayOneOperateTimeAfterFiring() {
        Machine m = StartupMachines.elaborate(StartupMachines.invertersWithThyratron(88, "50 ohm"));
        PowerUpResult r = PowerUpSolver.solve(m, PowerUpOptions.defaults().withSampleSeconds(0.001));
        SoftStartResult s = r.softStarts().get(0);
        assertThat(s.thyratron()).isTrue();
        assertThat(s.bypassTime() - s.triggerTime()).isCloseTo(0.010, within(1e-9));
        // The 2D21 cathode reaches its emission threshold about 10 s after switch-on (CathodeWarmupTest), before
        // its 10 s cathode heating time or just after: the anode has its voltage from switch-on either way.
        RelayDriverCheck c = r.relayChecks().get(0);
        assertThat(c.fireTime()).isBetween(8.0, 12.0);
        // The coil current shows on the relay rail once fired: (24 - 8) / (50 + 100) A.
        RailTransient relay = r.rails().stream().filter(x -> x.name().equals("relay")).findFirst().orElseThrow();
        assertThat(relay.finalAmps()).isCloseTo(16.0 / 150, within(1e-9));
    }

    @Test
    void theFastHeaterOfAMixedStringRunsOverItsRatingWhileTheSlowOneWarms() {
        // Mullard Outlook, Feb 1963 (r-type.org/addtext/add126.htm): in a mixed series string a fast heater
        // can briefly run well over its rating during warm-up.
        PowerUpResult r = PowerUpSolver.solve(StartupMachines.elaborate(StartupMachines.mixedString()),
                PowerUpOptions.defaults());
        HeaterWarmup worst = r.worstMixedOverVoltage();
        assertThat(worst).isNotNull();
        assertThat(worst.tube()).isEqualTo("6AU6");
        assertThat(worst.mixed()).isTrue();
        assertThat(worst.peakVoltRatio()).isGreaterThan(1.10);
        assertThat(worst.peakVoltTime()).isGreaterThan(0).isLessThan(15);
        // The series current is shared, so the two voltages add up to what the string gets.
        double sum = 0;
        for (HeaterWarmup w : r.heaters()) {
            sum += w.finalVolts();
        }
        RailTransient heat = heat(r);
        assertThat(sum).isCloseTo(12.6 - 0.05 * heat.finalAmps(), within(1e-9));
    }

    @Test
    void aCurrentLimitHoldsTheSupplyAtItsLimit() {
        PowerUpResult r = PowerUpSolver.solve(inverters("5 ohm", "20 A"), PowerUpOptions.defaults());
        RailTransient h = heat(r);
        assertThat(h.bypassPeak()).isCloseTo(20.0, within(1e-9));
        assertThat(h.peakDemand()).isGreaterThan(20.0);
        assertThat(h.withinLimit()).isFalse();
        assertThat(h.secondsInLimit()).isGreaterThan(0).isLessThan(5);
    }

    @Test
    void twoThyratronsThatFireInTheSameStepBothCloseTheirBypass() {
        // Two 2D21 heaters on one parallel rail share one trajectory: their firing events fall in one step.
        Machine m = StartupMachines.elaborate(StartupMachines.twoThyratronRails(88));
        PowerUpResult r = PowerUpSolver.solve(m, PowerUpOptions.defaults());
        assertThat(r.softStarts()).hasSize(2);
        SoftStartResult a = r.softStarts().get(0), b = r.softStarts().get(1);
        assertThat(a.bypassed()).isTrue();
        assertThat(b.bypassed()).isTrue();
        assertThat(a.triggerTime()).isCloseTo(b.triggerTime(), within(1e-6));   // the event solver's accuracy
        assertThat(r.relayChecks()).allSatisfy(c -> assertThat(c.fireTime()).isFinite());
    }

    @Test
    void identicalStringsSharingOneTrajectoryGiveTheSameAnswerAsOneTrajectoryEach() {
        Machine m = inverters("2 ohm", "40 A");
        PowerUpOptions o = PowerUpOptions.defaults().withSampleSeconds(0);
        StartupNetwork shared = StartupNetwork.of(m, ThermalAssumptions.standard(), DrawMode.HIGHEST);
        StartupNetwork each = StartupNetwork.unshared(m, ThermalAssumptions.standard(), DrawMode.HIGHEST);
        assertThat(each.heaterStates()).isEqualTo(88).isGreaterThan(shared.heaterStates());
        RailTransient a = heat(shared.solve(o)), b = heat(each.solve(o));
        assertThat(b.switchOnPeak()).isCloseTo(a.switchOnPeak(), within(1e-9 * a.switchOnPeak()));
        assertThat(b.bypassPeak()).isCloseTo(a.bypassPeak(), within(1e-4 * a.bypassPeak()));
        assertThat(b.finalAmps()).isCloseTo(a.finalAmps(), within(1e-4 * a.finalAmps()));
    }
}
