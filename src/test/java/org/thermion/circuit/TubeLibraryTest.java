package org.thermion.circuit;

import java.util.List;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * External checks of the tube models against published figures the parameters were not fitted
 * to. Tolerance ±25 % (the published equations' usual accuracy); each point's error is stated.
 */
class TubeLibraryTest {
    private final TubeLibrary lib = LibraryParts.tubes();

    private KorenTriode triode(String n) {
        return (KorenTriode) lib.require(n);
    }

    /*
     * The 12AU7's parameters are fitted (TubeFitter, Levenberg-Marquardt) to 19 readings of a measured ECC82 table,
     * the 12AU7's European equivalent: uTracer readings, file src/test-assets/ECC82.utd of the GitHub repository
     * audio-projects/tube-models (heater 12.59 V; six curves at grid -4 to -9 V, plate 49 to 249 V; currents to
     * 0.01 mA; one tube of unstated make). The library's 12AU7 block lists the 19 readings; every check below is
     * another reading of that table or a data sheet figure, none used by the fit.
     */

    @Test
    void twelveAU7AtTheDataSheetPoint() {
        // RCA 12AU7 at 250 V, -8.5 V: 10.5 mA (REFERENCES.md, from memory). Model 9.50 mA: -9.5 %.
        double ip = triode("12AU7").plateCurrent(250, -8.5);
        assertThat(ip / 10.5e-3 - 1).isBetween(-0.25, 0.25).isCloseTo(-0.095, within(0.02));
    }

    @Test
    void twelveAU7AtZeroBias() {
        // RCA 12AU7 at 100 V, 0 V: 11.8 mA (REFERENCES.md, from memory). Model 11.70 mA: -0.9 %. The table has no
        // reading with the grid at the cathode, where these machines run: this sheet point is the nearest check.
        double ip = triode("12AU7").plateCurrent(100, 0);
        assertThat(ip / 11.8e-3 - 1).isBetween(-0.25, 0.25).isCloseTo(-0.009, within(0.02));
    }

    @Test
    void twelveAU7AgainstThePublishedMeasuredTableAtItsLowestPlateVoltage() {
        KorenTriode t = triode("12AU7");
        // ECC82.utd, curve 1, point 1: 49.12 V, -4 V reads 0.02 mA (the table's last digit: 0.015 to 0.025 mA).
        // Read as printed (a measured table, no curve to read). Model 0.0242 mA: +21 % (Koren's set gave +47 %).
        double low = t.plateCurrent(49.12, -4);
        System.out.printf("12AU7 at 49.12 V, -4 V: model %.4f mA, table 0.02 mA (%+.0f %%)%n", low * 1e3,
                (low / 0.02e-3 - 1) * 100);
        assertThat(low / 0.02e-3 - 1).isBetween(-0.25, 0.25).isCloseTo(0.21, within(0.02));
        // Curve 2, point 1: 49.12 V, -5 V reads 0.00 mA (under 0.005 mA): the model must be cut off as well.
        assertThat(t.plateCurrent(49.12, -5)).isLessThan(0.005e-3);
    }

    @Test
    void twelveAU7AgainstThePublishedMeasuredTableHigherUp() {
        KorenTriode t = triode("12AU7");
        // Same table, readings the fit did not use: {plate V, grid V, table mA, model error}.
        double[][] points = {
            {62.42, -4, 0.19, -0.081},  // curve 1, point 3
            {75.71, -4, 0.61, 0.006},   // curve 1, point 5
            {62.42, -5, 0.03, 0.024},   // curve 2, point 3 (0.025 to 0.035 mA at the table's last digit)
            {248.2, -4, 22.86, -0.068}, // curve 1, point 31
            {241.96, -8, 9.81, -0.016}, // curve 5, point 30
            {248.8, -9, 8.43, -0.018},  // curve 6, point 31
        };
        for (double[] p : points) {
            double ip = t.plateCurrent(p[0], p[1]);
            double err = ip / (p[2] * 1e-3) - 1;
            System.out.printf("12AU7 at %.2f V, %.0f V: model %.3f mA, table %.2f mA (%+.1f %%)%n", p[0], p[1], ip * 1e3,
                    p[2], err * 100);
            assertThat(err).as("%s V, %s V", p[0], p[1]).isBetween(-0.25, 0.25).isCloseTo(p[3], within(0.02));
        }
    }

    @Test
    void twelveAX7AtTheDataSheetPoint() {
        // RCA 12AX7 at 250 V, -2 V: 1.2 mA (REFERENCES.md, from memory). Model 0.95 mA: -21 %.
        double ip = triode("12AX7").plateCurrent(250, -2);
        assertThat(ip / 1.2e-3 - 1).isBetween(-0.25, 0.25).isCloseTo(-0.21, within(0.02));
    }

    @Test
    void theVariantDividingByTwoKg1WouldMissTheSheetByHalf() {
        // The republished variant Ip = E1^Ex/Kg1 gives half of ours: 5.2 mA where the sheet says 10.5 mA.
        double ours = triode("12AU7").plateCurrent(250, -8.5);
        double variant = ours / 2;
        assertThat(Math.abs(variant / 10.5e-3 - 1)).isGreaterThan(0.25);
    }

    @Test
    void sixAU6AtTheDataSheetPointItWasNotFittedTo() {
        // RCA 6AU6 at 250 V plate, 150 V screen, 68 ohm cathode resistor (REFERENCES.md, from memory):
        // model Ip 12.4 mA (+17 %), Ig2 4.58 mA (+6 %), gm 5.0 mA/V (-4 %).
        // 10.6 mA plate, 4.3 mA screen, 5200 umho. The fit used the 100 V column and cut-off points only.
        // No 6AU6 point at 50 V or less is checked: none could be found as text. Searched: the tube-models repository's
        // measured tables (ECC81/82/83, EF80, EL500, PF86: no 6AU6, EF94 or 6BA6-class pentode), code and web pages for
        // "6AU6", "6AU6A", "EF94" plate characteristics, SPICE models and data sheet text (only images of sheets exist).
        TubeModel m = lib.require("6AU6");
        double ip = FitPoint.selfBiased(250, 150, 68, FitPoint.Quantity.PLATE_CURRENT, 10.6e-3, "").modelValue(m);
        double ig2 = FitPoint.selfBiased(250, 150, 68, FitPoint.Quantity.SCREEN_CURRENT, 4.3e-3, "").modelValue(m);
        double gm = FitPoint.selfBiased(250, 150, 68, FitPoint.Quantity.TRANSCONDUCTANCE, 5.2e-3, "").modelValue(m);
        System.out.printf("6AU6 at 250/150/68: Ip %.2f mA (%+.0f %%), Ig2 %.2f mA (%+.0f %%), gm %.2f mA/V (%+.0f %%)%n",
                ip * 1e3, (ip / 10.6e-3 - 1) * 100, ig2 * 1e3, (ig2 / 4.3e-3 - 1) * 100, gm * 1e3,
                (gm / 5.2e-3 - 1) * 100);
        assertThat(ip / 10.6e-3 - 1).isBetween(-0.25, 0.25);
        assertThat(ig2 / 4.3e-3 - 1).isBetween(-0.25, 0.25);
        assertThat(gm / 5.2e-3 - 1).isBetween(-0.25, 0.25);
    }

    @Test
    void everyFitKeepsItsPointsAndASmallResidual() {
        for (String n : List.of("12AU7", "6SN7", "6J6", "5965", "5670", "6AU6", "6AK5")) {
            FittedModel<?> f = lib.fit(n).orElseThrow();
            System.out.printf("%s fit: rms %.3f over %d points, %s%n", n, f.rmsRelativeError(), f.points().size(),
                    f.model());
            assertThat(f.points()).isNotEmpty().allSatisfy(p -> assertThat(p.source()).isNotBlank());
            assertThat(f.rmsRelativeError()).as(n).isLessThan(0.10);
        }
    }

    @Test
    void everyFittedTubeStatesItsResidualInTheLibraryAsTheFitFindsIt() {
        java.util.Map<String, Double> stated = new java.util.TreeMap<>();
        java.util.Map<String, Double> found = new java.util.TreeMap<>();
        for (org.thermion.model.TubeType t : LibraryParts.machine().tubes()) {
            if (t.curves() == null || t.curves().fitted().isEmpty()) {
                continue;
            }
            double computed = lib.fit(t.name()).orElseThrow().rmsRelativeError() * 100;
            System.out.printf("%s residual %.3f %%%n", t.name(), computed);
            stated.put(t.name(), t.curves().statedResidual() * 100);
            found.put(t.name(), computed);
        }
        assertThat(found).hasSize(7);
        found.forEach((n, v) -> assertThat(stated.get(n)).as(n + " residual in the library, percent")
                .isCloseTo(v, within(0.006)));
    }

    @Test
    void aFitRecoversAKnownSetFromItsOwnCurvePoints() {
        // Points generated from Koren's published 12AU7 set; starting elsewhere, the fit must find it again.
        KorenTriode truth = triode("12AU7").with(21.5, 1.3, 1180, 84, 300, "Koren, Glass Audio 1996");
        List<FitPoint> pts = new java.util.ArrayList<>();
        for (double vp : new double[] {30, 60, 100, 150, 250}) {
            for (double vg : new double[] {0, -2, -4, -8}) {
                double ip = truth.plateCurrent(vp, vg);
                if (ip > 1e-5) {
                    pts.add(FitPoint.fixed(vp, Double.NaN, vg, FitPoint.Quantity.PLATE_CURRENT, ip, "generated"));
                }
            }
        }
        KorenTriode start = truth.with(15, 1.3, 2000, 150, 300, "start");
        FittedModel<KorenTriode> f = TubeFitter.fitTriode(start, List.of("mu", "kg1", "kp"), pts);
        assertThat(f.model().mu()).isCloseTo(21.5, within(0.01));
        assertThat(f.model().kg1()).isCloseTo(1180, within(1.0));
        assertThat(f.model().kp()).isCloseTo(84, within(0.1));
        assertThat(f.rmsRelativeError()).isLessThan(1e-6);
    }

    @Test
    void sixAL5AgainstAPublishedFitOfItsPlateCharacteristic() {
        // Duncan Munro's 6AL5 / EB91 PSpice model (duncanamps.com/spice/valves/6al5.inc, dated 19/10/01; a saved copy
        // of the page is in a public GitHub repository): I = 1.8 mA x (V + 0.2 V)^1.5 per plate, his fit to the tube's
        // plate characteristic. A published model, not a point we read off a curve ourselves: no 6AL5 / EB91 / EAA91
        // curve or table could be found as text (searched: the tube-models repository's measured tables, which hold no
        // diode; "6AL5", "EB91", "EAA91" plate current at 5 V / 10 V in web pages, data sheet text and code). The
        // library's perveance comes from "60 mA at 10 V" (from memory), not from this model.
        // {tube drop V, Munro's mA, our error}: all at 10 V or less, where a diode gate works.
        ChildDiode d = (ChildDiode) lib.require("6AL5");
        double[][] points = {
            {2, 5.874, -0.086},
            {5, 21.34, -0.006},
            {10, 58.64, 0.023},
        };
        for (double[] p : points) {
            double err = d.current(p[0]) / (p[1] * 1e-3) - 1;
            System.out.printf("6AL5 at %.0f V: model %.2f mA, Munro %.2f mA (%+.1f %%)%n", p[0], d.current(p[0]) * 1e3,
                    p[1], err * 100);
            assertThat(err).as("%s V", p[0]).isBetween(-0.25, 0.25).isCloseTo(p[2], within(0.005));
        }
    }

    @Test
    void diodeFollowsTheThreeHalvesPowerLaw() {
        ChildDiode d = ChildDiode.throughPoint("x", 10, 60e-3, Double.NaN, "test");
        assertThat(d.current(10)).isCloseTo(60e-3, within(1e-12));
        // Child-Langmuir: four times the voltage, eight times the current.
        assertThat(d.current(40) / d.current(10)).isCloseTo(8, within(1e-9));
        assertThat(d.current(-5)).isZero();
    }

    @Test
    void gridCurrentOnlyWhenTheGridIsPositive() {
        GridCurrentLaw g = GridCurrentLaw.KOREN_NETLIST;
        assertThat(g.current(-3)).isZero();
        assertThat(g.current(1)).isCloseTo(0.5e-3, within(1e-12));
        assertThat(g.current(4)).isCloseTo(4e-3, within(1e-12));
    }

    @Test
    void thyratronFiresAboveTheCriticalGridItsControlRatioSetsAndThenHolds() {
        // r-type.org/exhib/aaa0479.htm (EN91, the 2D21's European equivalent) and r-type.org/exhib/acf0208.htm
        // (CV4018, marked 2D21W): "the ratio is 250", a stated figure. The critical grid is then -Ea/250: -0.192 V
        // at a 48 V anode, -0.096 V on a 24 V relay rail. The library's 2D21 takes its firing from this ratio, so
        // these figures restate the source rather than check it; the next test checks it against another page.
        GasThyratron t = (GasThyratron) lib.require("2D21");
        assertThat(t.criticalGrid(48)).isCloseTo(-0.192, within(1e-9));
        assertThat(t.conducts(false, -0.3, 48)).as("below critical at 48 V: stays off").isFalse();
        assertThat(t.conducts(false, -0.1, 48)).isTrue();
        assertThat(t.conducts(false, -0.1, 20)).as("at 20 V the critical grid is -0.08 V").isFalse();
        assertThat(t.conducts(true, -20, 48)).as("once fired the grid has lost control").isTrue();
        // The fixed -4 V the library held before would have fired it with the grid 3.8 V below this.
        assertThat(t.conducts(false, -3.9, 48)).isFalse();
    }

    @Test
    void thyratronCriticalGridAtItsPeakAnodeRatingAgreesWithAnotherPage() {
        // vacuumtubes.io/tube/2D21W: critical control-grid voltage "approximately -2V to -6V (varies with shield
        // grid voltage)", and a 650 V peak forward anode rating (both stated figures, no curve given). At 650 V the
        // control ratio gives -2.6 V: inside that range, 30 % of the way from its -2 V end.
        GasThyratron t = (GasThyratron) lib.require("2D21");
        assertThat(t.criticalGrid(650)).isCloseTo(-2.6, within(1e-9)).isBetween(-6.0, -2.0);
    }

    @Test
    void aTubeBlockMayStillFixItsCriticalGridWhateverTheAnode() {
        String text = """
                tube X21 {
                  kind thyratron
                  model gas critical -4 V source "demo"
                  sections 1
                  heater 6.3 V 600 mA
                }
                rail heat { voltage 6.3 V }
                heaters on heat { parallel X21 }
                module top { in a; out y; y = a }
                machine fixed { top top; inputs a; outputs y }
                """;
        org.thermion.lang.Diagnostics d = new org.thermion.lang.Diagnostics();
        org.thermion.model.Machine m = new org.thermion.elab.Elaborator(new org.thermion.lang.SourceSet(), d)
                .elaborateText(java.nio.file.Path.of("fixed.machine"), text);
        assertThat(d.hasErrors()).as(d.all().toString()).isFalse();
        GasThyratron t = (GasThyratron) TubeLibrary.of(m.tubes()).require("X21");
        assertThat(t.criticalGrid(48)).isEqualTo(-4.0);
        assertThat(t.criticalGrid(400)).isEqualTo(-4.0);
        assertThat(t.conducts(false, -3.9, 48)).isTrue();
    }

    @Test
    void thyratronArcDropAgreesWithASheetTheLibraryDidNotTakeItFrom() {
        // r-type.org/exhib/aaa0479.htm (EN91, the 2D21's European equivalent): "At saturation the valve
        // voltage drop is 8 Volts" -- a stated figure, not read from a curve; anode at 8 V, well under 50 V.
        // The library's 8 V came from the vacuumtubes.io 2D21W page (8-12 V) and memory. Model 8 V: 0 %.
        GasThyratron t = (GasThyratron) lib.require("2D21");
        assertThat(t.arcDrop() / 8.0 - 1).isBetween(-0.25, 0.25).isCloseTo(0.0, within(0.01));
    }

    @Test
    void aTubeWithoutParametersIsNamed() {
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> lib.require("6X4"))
                .hasMessageContaining("6X4").hasMessageContaining("add a model line");
    }

    @Test
    void aFitToPointsNoCurvePassesThroughSaysSoInsteadOfReturningInfiniteParameters() {
        // amperes at a millivolt and microamperes at 9 kV with the grid far positive: mistyped points
        List<FitPoint> pts = List.of(
                FitPoint.fixed(0.001, Double.NaN, -900, FitPoint.Quantity.PLATE_CURRENT, 99, "mistyped"),
                FitPoint.fixed(9000, Double.NaN, 900, FitPoint.Quantity.PLATE_CURRENT, 1e-6, "mistyped"),
                FitPoint.fixed(1, Double.NaN, 0, FitPoint.Quantity.TRANSCONDUCTANCE, 90, "mistyped"));
        org.assertj.core.api.Assertions.assertThatThrownBy(
                        () -> TubeFitter.fitTriode(triode("12AU7"), List.of("mu", "kg1", "kp"), pts))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("ran away");
    }
}
