package org.thermion.circuit;

import java.util.List;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class NodalJacobianTest {
    private final TubeLibrary lib = LibraryParts.tubes();
    private final RailSet rails = RailSet.volts("bplus", 48, "bias", -12);

    /**
     * A Newton step from the sparse Jacobian (each part differenced over its own nodes, factored
     * in minimum-degree order) must equal the step from the whole Jacobian differenced node by
     * node and solved by dense elimination with row exchanges, on a triode stage driving a chain
     * of diode gates and grids (every load drawn out: the largest pattern).
     */
    @Test
    void theSparseStepIsTheDenseStep() {
        ChildDiode d = (ChildDiode) lib.require("6AL5");
        KorenTriode t = (KorenTriode) lib.require("12AU7");
        TubeStage inverter = TubeStage.inverter("inv", t, 1, new LoadResistor(100e3), "bplus",
                CathodeReturn.grounded(), new GridNetwork(1e6, 1.2e6, "bias", 0), null);
        GridLoad grid = new GridLoad(new GridNetwork(1e6, 1.2e6, "bias", 0), t.grid(), RailSet.GROUND);
        Load or = new DiodeLoad(d, DiodeGate.Kind.OR, 10e6, "bias", List.of(grid, grid));
        Load and = new DiodeLoad(d, DiodeGate.Kind.AND, 510e3, "bplus", List.of(or, grid));
        StageNetlist n = new StageSolver(rails).netlist(StageSolver.DRIVER, inverter, new double[] {5}, false,
                List.of(and, or, grid, and), Corner.NOMINAL);
        double[] fixed = n.fixedVolts().stream().mapToDouble(Double::doubleValue).toArray();
        Circuit c = new Circuit(n.nodes(), fixed, new double[fixed.length], n.parts(), n.output());
        int[] free = java.util.stream.IntStream.range(0, c.size()).filter(i -> !c.isFixed(i)).toArray();
        assertThat(free.length).isGreaterThan(10);

        double[] v = new double[c.size()];
        java.util.Random r = new java.util.Random(7);
        for (int i = 0; i < v.length; i++) {
            v[i] = c.isFixed(i) ? fixed[i] : -12 + 60 * r.nextDouble();
        }
        double[] f = residual(c, free, v);
        double[][] dense = new double[free.length][free.length];
        for (int col = 0; col < free.length; col++) {
            double keep = v[free[col]];
            double h = 1e-6 * Math.max(1, Math.abs(keep));
            v[free[col]] = keep + h;
            double[] f1 = residual(c, free, v);
            v[free[col]] = keep;
            for (int row = 0; row < free.length; row++) {
                dense[row][col] = (f1[row] - f[row]) / h;
            }
        }
        double[] want = new double[free.length];
        for (int i = 0; i < want.length; i++) {
            want[i] = -f[i];
        }
        assertThat(NodalJacobian.gauss(dense, want)).isTrue();

        double[] got = f.clone();
        assertThat(new NodalJacobian(c, free).step(v, got, 0)).isTrue();
        for (int i = 0; i < got.length; i++) {
            assertThat(got[i]).isCloseTo(want[i], within(1e-6 * Math.max(1, Math.abs(want[i]))));
        }
    }

    private static double[] residual(Circuit c, int[] free, double[] v) {
        double[] all = c.nodeCurrents(v);
        double[] f = new double[free.length];
        for (int i = 0; i < free.length; i++) {
            f[i] = all[free[i]];
        }
        return f;
    }
}
