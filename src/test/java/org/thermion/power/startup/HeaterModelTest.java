package org.thermion.power.startup;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.HeaterRating;

import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

@Timeout(value = 20, unit = TimeUnit.SECONDS)
class HeaterModelTest {
    private static final ThermalAssumptions STD = ThermalAssumptions.standard();
    // 6AU6: 6.3 V 0.300 A (hb9aik.ch/notes/serparfil.htm), warm-up 11 s (from memory).
    private static final HeaterRating AU6 = new HeaterRating(6.3, 0.300);

    @Test
    void ratedVoltageGivesRatedCurrentAtEquilibrium() {
        HeaterModel h = HeaterCalibration.calibrate("6AU6", AU6, 11, Double.NaN, STD);
        double t = HeaterBench.equilibrium(h, new HeaterDrive.ConstantVoltage(6.3));
        assertThat(t).isCloseTo(STD.hotKelvin(), within(1e-3));
        assertThat(6.3 / h.resistance(t)).isCloseTo(0.300, within(1e-6));
    }

    @Test
    void equilibriumHoldsForEveryRatingOfADualHeaterTube() {
        // 12AU7: 12.6 V 0.150 A series, 6.3 V 0.300 A parallel (hb9aik.ch/notes/serparfil.htm).
        for (HeaterRating r : new HeaterRating[] {new HeaterRating(12.6, 0.150), new HeaterRating(6.3, 0.300)}) {
            HeaterModel h = HeaterCalibration.calibrate("12AU7", r, 11, Double.NaN, STD);
            double t = HeaterBench.equilibrium(h, new HeaterDrive.ConstantVoltage(r.volts()));
            assertThat(r.volts() / h.resistance(t)).isCloseTo(r.amps(), within(1e-7));
        }
    }

    @Test
    void coldToHotRatioLiesInTheMeasuredInrushRange() {
        // audioXpress 9/2004 filament article: measured inrush 2.7 to 7.2 times nominal current.
        HeaterModel h = HeaterCalibration.calibrate("6AU6", AU6, 11, Double.NaN, STD);
        double inrush = (6.3 / h.resistance(STD.ambientKelvin())) / 0.300;
        assertThat(inrush).isBetween(2.7, 7.2);
        assertThat(h.coldHotRatio()).isCloseTo(inrush, within(1e-9));
    }

    @Test
    void aDeclaredRatioIsHonouredWithoutMovingTheOperatingPoint() {
        HeaterModel h = HeaterCalibration.calibrate("X", AU6, 11, 4.0, STD);
        assertThat(h.resistance(STD.ambientKelvin())).isCloseTo(21.0 / 4.0, within(1e-9));   // 6.3 V / 0.3 A = 21 ohm hot
        assertThat(h.resistance(STD.hotKelvin())).isCloseTo(21.0, within(1e-9));
        double t = HeaterBench.equilibrium(h, new HeaterDrive.ConstantVoltage(6.3));
        assertThat(t).isCloseTo(STD.hotKelvin(), within(1e-3));
    }

    @Test
    void resistanceFollowsTungsten() {
        HeaterModel h = HeaterCalibration.calibrate("6AU6", AU6, 11, Double.NaN, STD);
        TungstenResistivity rho = TungstenResistivity.table();
        for (double t : new double[] {293, 600, 1000, 1300, 1500}) {
            assertThat(h.resistance(t)).isCloseTo(21.0 * rho.at(t) / rho.at(1400), within(1e-9));
        }
    }
}
