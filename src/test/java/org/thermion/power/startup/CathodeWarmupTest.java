package org.thermion.power.startup;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.HeaterRating;
import org.thermion.model.Machine;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The cathode as a second thermal body: the wire still meets the warm-up definition, the
 * thyratron fires when its cathode reaches the emission threshold, and how much each assumed
 * constant moves that moment.
 */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class CathodeWarmupTest {
    private static final HeaterRating THYRATRON = new HeaterRating(6.3, 0.6);   // 2D21, REFERENCES.md

    /** Seconds until a 2D21 heater at {@code volts} on a stiff supply brings its cathode to the emission threshold. */
    private static double fire(ThermalAssumptions a, double volts) {
        // Warm-up 10 s: what the parts library declares for the 2D21 (from memory there).
        HeaterModel h = HeaterCalibration.calibrate("2D21", THYRATRON, 10, Double.NaN, a);
        double at = new Emission(a).thresholdFraction() * h.cathodeKelvin();
        return HeaterBench.cathodeTime(h, new HeaterDrive.ConstantVoltage(volts), at);
    }

    @Test
    void theWireStillMeetsTheWarmUpDefinition() {
        // EIA definition (REFERENCES.md): 4 x rated voltage through 3 x hot resistance, 80 % of rated voltage at
        // the warm-up time; 6AU6A: 11 s (REFERENCES.md, from memory). Checked by an independent run to that voltage.
        HeaterModel h = HeaterCalibration.calibrate("6AU6", new HeaterRating(6.3, 0.3), 11, Double.NaN,
                ThermalAssumptions.standard());
        HeaterDrive test = HeaterDrive.warmupTest(h.rating());
        HeaterBench.Run before = HeaterBench.run(h, test, 10.9);
        HeaterBench.Run after = HeaterBench.run(h, test, 11.1);
        assertThat(test.amps(h.resistance(before.kelvin())) * h.resistance(before.kelvin())).isLessThan(0.8 * 6.3);
        assertThat(test.amps(h.resistance(after.kelvin())) * h.resistance(after.kelvin())).isGreaterThan(0.8 * 6.3);
        // The sleeve lags the wire while warming and settles at its own operating temperature.
        assertThat(after.cathodeKelvin()).isLessThan(after.kelvin());
        HeaterBench.Run hot = HeaterBench.run(h, new HeaterDrive.ConstantVoltage(6.3), 200);
        assertThat(hot.cathodeKelvin()).isCloseTo(1050, within(1.0));
        assertThat(hot.kelvin()).isCloseTo(1400, within(1.0));
    }

    @Test
    void aThyratronOnItsRatedHeaterVoltageFiresAboutTenSecondsAfterSwitchOn() {
        // Observed practice of builders (REFERENCES.md, 2D21): about 10 s; +-20 %.
        ThermalAssumptions a = ThermalAssumptions.standard();
        double rated = fire(a, 6.3);
        assertThat(rated).isBetween(8.0, 12.0);
        // A lower heater voltage warms the cathode later, a higher one sooner; by more than the solver's noise.
        assertThat(fire(a, 0.9 * 6.3)).isGreaterThan(1.1 * rated);
        assertThat(fire(a, 1.1 * 6.3)).isLessThan(0.9 * rated);
    }

    @Test
    void theFiringTimeDependsMostlyOnTheFittedHeatCapacityRatio() {
        // Each assumption across the range its source gives (ThermalAssumptions): cathode 1000-1100 K, wire
        // 1300-1500 K, work function 0.8-1.2 eV, emission reserve 5-20. None moves the firing by more than 15 %.
        ThermalAssumptions a = ThermalAssumptions.standard();
        double base = fire(a, 6.3);
        Map<String, double[]> spread = new LinkedHashMap<>();
        spread.put("cathode K", new double[] {fire(a.withCathodeKelvin(1000), 6.3), fire(a.withCathodeKelvin(1100), 6.3)});
        spread.put("wire K", new double[] {fire(a.withHotKelvin(1300), 6.3), fire(a.withHotKelvin(1500), 6.3)});
        spread.put("work function", new double[] {fire(a.withWorkFunction(0.8), 6.3), fire(a.withWorkFunction(1.2), 6.3)});
        spread.put("reserve", new double[] {fire(a.withEmissionReserve(5), 6.3), fire(a.withEmissionReserve(20), 6.3)});
        for (Map.Entry<String, double[]> e : spread.entrySet()) {
            for (double t : e.getValue()) {
                assertThat(Math.abs(t / base - 1)).as(e.getKey()).isLessThan(0.15);
            }
        }
        // A higher work function or a smaller reserve asks a hotter cathode: later.
        assertThat(spread.get("work function")[1]).isGreaterThan(spread.get("work function")[0]);
        assertThat(spread.get("reserve")[0]).isGreaterThan(spread.get("reserve")[1]);
        // The sleeve's heat capacity (ratio 1 to 3, from memory) moves it most, in proportion: hence it is the one fitted.
        double light = fire(a.withCathodeHeatRatio(1), 6.3), heavy = fire(a.withCathodeHeatRatio(3), 6.3);
        assertThat(light).isLessThan(0.75 * base);
        assertThat(heavy).isGreaterThan(1.15 * base);
    }

    @Test
    void inTheMachineTheThyratronFiresAtItsCathodesThresholdAndTheBPlusLoadFollowsTheCathodes() {
        Machine m = StartupMachines.elaborate(StartupMachines.invertersWithThyratron(88, "50 ohm"));
        PowerUpResult r = PowerUpSolver.solve(m, PowerUpOptions.defaults().withSampleSeconds(0.01));
        SoftStartResult s = r.softStarts().get(0);
        // The 2D21 heater sits alone on a stiff 6.3 V rail: the bench figure above, about 10 s.
        assertThat(s.triggerTime()).isBetween(8.0, 12.0);
        int thy = 0;
        for (int i = 0; i < r.heaters().size(); i++) {
            if (r.heaters().get(i).tube().equals("2D21")) {
                thy = i;
            }
        }
        assertThat(r.heaters().get(thy).emitSeconds()).isCloseTo(s.triggerTime(), within(1e-6));
        // B+ current stays low until the 6AU6 cathodes near their threshold, after their heater wires are hot.
        RailTransient bplus = r.rails().stream().filter(x -> x.name().equals("bplus")).findFirst().orElseThrow();
        double emit = r.heaters().stream().filter(h -> h.tube().equals("6AU6")).mapToDouble(HeaterWarmup::emitSeconds)
                .max().orElseThrow();
        double wireWarm = r.heaters().stream().filter(h -> h.tube().equals("6AU6")).mapToDouble(HeaterWarmup::warmSeconds)
                .max().orElseThrow();
        assertThat(emit).isGreaterThan(0);
        double atHalf = amps(bplus, 0.5 * emit), atEnd = bplus.finalAmps();
        assertThat(atHalf).isLessThan(0.05 * atEnd);
        assertThat(amps(bplus, emit + 5)).isGreaterThan(0.5 * atEnd);
        assertThat(r.allEmitSeconds()).isGreaterThanOrEqualTo(emit);
        assertThat(wireWarm).isGreaterThan(0);
        // Energy still balances with two bodies: in = stored (wire and sleeve) + radiated.
        for (HeaterWarmup w : r.heaters()) {
            assertThat(w.joulesStored() + w.joulesRadiated()).isCloseTo(w.joulesIn(), within(0.01 * w.joulesIn()));
        }
        assertThat(r.notes()).anySatisfy(n -> assertThat(n).contains("2D21").contains("before its rated 10 s"));
    }

    private static double amps(RailTransient rt, double t) {
        int i = 0;
        while (i + 1 < rt.t().length && rt.t()[i + 1] <= t) {
            i++;
        }
        return rt.amps()[i];
    }
}
