package org.thermion.circuit;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The plausibility checks a tube model passes before any circuit is solved on it. */
class ChecksTest {
    private final TubeLibrary lib = LibraryParts.tubes();

    @Test
    void everyLibraryTubeIsPlausible() {
        // Real tubes from published sets and fits: each passes between 1 uA and 10 A at 100 V, grid at the cathode.
        for (TubeModel m : lib.models()) {
            Checks.plausibleTube(m);
        }
        // Koren's 12AX7 set at 100 V, grid 0 V, by his equation: E1 = 100/600 ln(1 + e^(600/100)) = 1.0004 V,
        // Ip = 2 E1^1.4 / 1060 = 1.89 mA (Koren, Glass Audio 1996, REFERENCES.md).
        assertThat(((KorenTriode) lib.require("12AX7")).plateCurrent(100, 0)).isCloseTo(1.89e-3,
                org.assertj.core.api.Assertions.within(0.01e-3));
    }

    @Test
    void aKg1TypedPowersOfTenTooSmallIsRefused() {
        KorenTriode t = (KorenTriode) lib.require("12AU7");
        KorenTriode typo = new KorenTriode(t.name(), t.mu(), t.ex(), 1e-9, t.kp(), t.kvb(), t.grid(), t.plateWatts(),
                t.source());
        assertThatThrownBy(() -> Checks.plausibleTube(typo)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("at 100 V on its plate with the grid at the cathode")
                .hasMessageContaining("off by powers of ten");
    }

    @Test
    void aDiodeThatPassesNothingIsRefused() {
        ChildDiode d = ChildDiode.throughPoint("d", 1000, 1e-30, Double.NaN, "demo");
        assertThatThrownBy(() -> Checks.plausibleTube(d)).hasMessageContaining("across the diode");
    }

    @Test
    void aFitThatFlattensTheLawByRunningExToNothingIsRefused() {
        // Five readings of 1 mA along a line where a triode's current would rise tenfold: the fit makes the current
        // independent of every voltage by taking ex to about 1e-9, which no model line may state (1 to 2).
        KorenTriode start = new KorenTriode("flat", 21.5, 1.3, 1180, 84, 300, GridCurrentLaw.KOREN_NETLIST,
                Double.NaN, "start values");
        List<FitPoint> points = new ArrayList<>();
        double[][] at = {{50, 0}, {100, -4}, {150, -8}, {200, -12}, {250, -16}};
        for (double[] p : at) {
            points.add(new FitPoint(p[0], Double.NaN, p[1], 0, FitPoint.Quantity.PLATE_CURRENT, 1e-3, "demo"));
        }
        FittedModel<KorenTriode> f = TubeFitter.fitTriode(start, List.of("mu", "ex", "kg1", "kp", "kvb"), points);
        assertThat(f.model().ex()).isLessThan(1);
        assertThatThrownBy(() -> Checks.plausibleFit(f.model())).hasMessageContaining("the fit ran ex to")
                .hasMessageContaining("outside the 1 to 2");
        // The library's own fits stay within the bounds.
        for (TubeModel m : lib.models()) {
            Checks.plausibleFit(m);
        }
    }
}
