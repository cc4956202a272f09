package org.thermion.spice;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.ChildDiode;
import org.thermion.circuit.GridCurrentLaw;
import org.thermion.circuit.KorenPentode;
import org.thermion.circuit.KorenTriode;
import org.thermion.circuit.TubeLibrary;

import java.util.Map;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Each B-source expression, evaluated by the deck reader's evaluator, equals the Java model's current. */
class TubeExpressionsTest {
    private final TubeLibrary tubes = demo().tubes();

    /** The library's tubes as the demo machine (which includes the library) has them. */
    private static org.thermion.circuit.MachineCircuits demo() {
        org.thermion.lang.Diagnostics d = new org.thermion.lang.Diagnostics();
        return org.thermion.circuit.MachineCircuits.of(new org.thermion.elab.Elaborator(new org.thermion.lang.SourceSet(), d)
                .elaborate(java.nio.file.Path.of("examples/pumpstation/pumpstation.machine")));
    }

    /** Equal within 1e-12 A plus 1e-9 of the value (the two differ only in rounding). */
    private static void same(double expression, double model) {
        assertThat(expression).isCloseTo(model, within(1e-12 + 1e-9 * Math.abs(model)));
    }

    private static double eval(String expr, Object... nodeVolts) {
        java.util.Map<String, Double> v = new java.util.HashMap<>();
        for (int i = 0; i < nodeVolts.length; i += 2) {
            v.put((String) nodeVolts[i], ((Number) nodeVolts[i + 1]).doubleValue());
        }
        return SpiceExpression.parse(expr).evaluate(v);
    }

    @Test
    void triodePlateCurrentMatchesKorenModelOverTheWholePlane() {
        KorenTriode t = (KorenTriode) tubes.require("12AU7");
        String e = TubeExpressions.triodePlate(t, 2 * 0.7, "p", "g", "k");
        Random r = new Random(19);
        for (int i = 0; i < 2000; i++) {
            double vp = -20 + 320 * r.nextDouble();
            double vg = -40 + 45 * r.nextDouble();
            double vk = -5 + 10 * r.nextDouble();
            same(eval(e, "p", vp, "g", vg, "k", vk), 2 * 0.7 * t.plateCurrent(vp - vk, vg - vk));
        }
        // The data sheet point the model is checked at (KorenTriodeTest): 250 V, -8.5 V, about 10.5 mA.
        assertThat(eval(TubeExpressions.triodePlate(t, 1, "p", "g", "0"), "p", 250, "g", -8.5))
                .isCloseTo(10.5e-3, within(10.5e-3 * 0.25));
    }

    @Test
    void pentodePlateAndScreenCurrentsMatchKorenModel() {
        KorenPentode m = (KorenPentode) tubes.require("6AU6");
        String ip = TubeExpressions.pentodePlate(m, 1, "p", "g1", "g2", "k");
        String is = TubeExpressions.pentodeScreen(m, 1, "g1", "g2", "k");
        Random r = new Random(16);
        for (int i = 0; i < 2000; i++) {
            double vp = -10 + 260 * r.nextDouble();
            double vg1 = -20 + 22 * r.nextDouble();
            double vg2 = i % 10 == 0 ? -5 + 5 * r.nextDouble() : 150 * r.nextDouble();
            same(eval(ip, "p", vp, "g1", vg1, "g2", vg2, "k", 0), m.plateCurrent(vp, vg1, vg2));
            same(eval(is, "g1", vg1, "g2", vg2, "k", 0), m.screenCurrent(vg1, vg2));
        }
        assertThat(eval(ip, "p", 50, "g1", 0, "g2", 0, "k", 0)).isZero();
    }

    @Test
    void diodeAndGridLawsAreThreeHalvesPower() {
        ChildDiode d = (ChildDiode) tubes.require("6AL5");
        GridCurrentLaw g = GridCurrentLaw.KOREN_NETLIST;
        for (double v = -3; v <= 30; v += 0.37) {
            same(eval(TubeExpressions.diode(d, 1, "a", "k"), "a", v, "k", 0), d.current(v));
            same(eval(TubeExpressions.grid(g, 2, "g", "0"), "g", v), 2 * g.current(v));
        }
        // 3/2 power: four times the voltage, eight times the current (Child-Langmuir, from memory).
        assertThat(eval(TubeExpressions.diode(d, 1, "a", "0"), "a", 8.0)
                / eval(TubeExpressions.diode(d, 1, "a", "0"), "a", 2.0)).isCloseTo(8.0, within(1e-9));
    }

    @Test
    void expressionsUseOnlyTheDocumentedFunctions() {
        KorenPentode m = (KorenPentode) tubes.require("6AU6");
        String all = TubeExpressions.pentodePlate(m, 1, "p", "g1", "g2", "k") + TubeExpressions.lamp(48, 0.025, 10, "a", "b")
                + TubeExpressions.arc(10, 1, "a", "k");
        java.util.regex.Matcher f = java.util.regex.Pattern.compile("([a-z_]+)\\(").matcher(all);
        while (f.find()) {
            assertThat(SpiceExpression.functions()).as(f.group(1)).contains(f.group(1).equals("v") ? "abs" : f.group(1));
        }
        assertThat(all).doesNotContain("**").doesNotContain("if(").doesNotContain("?");
    }

    @Test
    void lampExpressionGivesRatedCurrentAtRatedVolts() {
        // A 48 V 25 mA lamp passes 25 mA at 48 V by its rating.
        assertThat(eval(TubeExpressions.lamp(48, 0.025, 10, "a", "b"), "a", 48, "b", 0)).isCloseTo(0.025, within(1e-12));
        assertThat(eval(TubeExpressions.lamp(48, 0.025, 10, "a", "b"), "a", 0, "b", 48)).isCloseTo(-0.025, within(1e-12));
    }

    @Test
    void evaluatorRejectsWhatSpice3DoesNotDocument() {
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> SpiceExpression.parse("limit(v(a), 0, 1)"))
                .hasMessageContaining("not a SPICE3 function");
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> SpiceExpression.parse("v(a,b)"))
                .hasMessageContaining("v(a)-v(b)");
        assertThat(SpiceExpression.parse("-2^2 + 3*4k/2 - uramp(-1)").evaluate(Map.of())).isEqualTo(-4 + 6000);
    }
}
