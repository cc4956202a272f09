package org.thermion.circuit;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import static org.thermion.circuit.FitPoint.Quantity.AMPLIFICATION;
import static org.thermion.circuit.FitPoint.Quantity.PLATE_CURRENT;
import static org.thermion.circuit.FitPoint.Quantity.SCREEN_CURRENT;
import static org.thermion.circuit.FitPoint.Quantity.TRANSCONDUCTANCE;

/**
 * Model parameters for the parts library's tubes. Published sets are taken as printed; where
 * none is published the set is fitted here (at construction, a few milliseconds) to the
 * operating points listed with it, and the fit with its points and residual is kept.
 * Every figure names its source; "from memory" means recalled, not read from the sheet.
 */
public final class TubeLibrary {
    private static final String KOREN = "Koren, Glass Audio 1996 (REFERENCES.md)";
    /** Knee of small pentodes' plate curves, not fitted (no low-voltage point): from memory. */
    private static final double PENTODE_KVB = 20;

    private final Map<String, TubeModel> models = new LinkedHashMap<>();
    private final Map<String, FittedModel<?>> fits = new LinkedHashMap<>();

    /** The library with every fit computed. */
    public TubeLibrary() {
        GridCurrentLaw g = GridCurrentLaw.KOREN_NETLIST;
        add(new KorenTriode("12AU7", 21.5, 1.3, 1180, 84, 300, g, 2.75,
                KOREN + "; plate rating 2.75 W from memory"));
        add(new KorenTriode("12AX7", 100, 1.4, 1060, 600, 300, g, 1.2,
                KOREN + "; plate rating 1.2 W from memory"));
        add(new KorenTriode("12AT7", 60, 1.35, 460, 300, 300, g, 2.5,
                KOREN + "; plate rating 2.5 W from memory"));
        triodeFit(new KorenTriode("6SN7", 20, 1.3, 1500, 200, 300, g, 3.5,
                "fitted to perceptioro.com/6SN7 (class A1 typical operation); plate rating 3.5 W from memory"),
                List.of(FitPoint.fixed(250, Double.NaN, -8, PLATE_CURRENT, 9e-3, "perceptioro.com/6SN7"),
                        FitPoint.fixed(250, Double.NaN, -8, TRANSCONDUCTANCE, 2.6e-3, "perceptioro.com/6SN7"),
                        FitPoint.fixed(250, Double.NaN, -8, AMPLIFICATION, 20, "perceptioro.com/6SN7")));
        triodeFit(new KorenTriode("6J6", 38, 1.3, 600, 300, 300, g, 1.5,
                "fitted to operating points from memory; plate rating 1.5 W from memory"),
                selfBiasedTriode(100, 50, 8.5e-3, 5.3e-3, 38, "from memory"));
        triodeFit(new KorenTriode("5965", 47, 1.3, 500, 400, 300, g, 2.2,
                "fitted to operating points from memory (weak); plate rating 2.2 W from memory"),
                selfBiasedTriode(150, 220, 8.2e-3, 6.5e-3, 47, "from memory (weak)"));
        triodeFit(new KorenTriode("5670", 35, 1.3, 600, 300, 300, g, 1.5,
                "fitted to operating points from memory; plate rating 1.5 W from memory"),
                selfBiasedTriode(150, 240, 8.2e-3, 5.5e-3, 35, "from memory"));
        pentodeFit(new KorenPentode("6AU6", 33, 1.35, 1200, 1100, 250, PENTODE_KVB, g, 3.5, 0.75,
                "fitted to RCA 6AU6 typical operation at 100 V and cut-off points (from memory); "
                        + "knee Kvb 20 V and ratings 3.5 W / 0.75 W from memory"),
                List.of("mu", "kg1", "kg2", "kp"),
                List.of(FitPoint.selfBiased(100, 100, 150, PLATE_CURRENT, 5.0e-3, "RCA 6AU6, from memory"),
                        FitPoint.selfBiased(100, 100, 150, SCREEN_CURRENT, 2.1e-3, "RCA 6AU6, from memory"),
                        FitPoint.selfBiased(100, 100, 150, TRANSCONDUCTANCE, 3.9e-3, "RCA 6AU6, from memory"),
                        FitPoint.fixed(100, 100, -4.2, PLATE_CURRENT, 10e-6, "RCA 6AU6 cut-off, from memory"),
                        FitPoint.fixed(250, 150, -6.5, PLATE_CURRENT, 10e-6, "RCA 6AU6 cut-off, from memory")));
        pentodeFit(new KorenPentode("6AK5", 33, 1.35, 800, 800, 140, PENTODE_KVB, g, 1.7, 0.5,
                "fitted to typical operation from memory; knee and ratings from memory"),
                List.of("mu", "kg1", "kg2", "kp"),
                List.of(FitPoint.selfBiased(120, 120, 200, PLATE_CURRENT, 7.5e-3, "from memory"),
                        FitPoint.selfBiased(120, 120, 200, SCREEN_CURRENT, 2.5e-3, "from memory"),
                        FitPoint.selfBiased(120, 120, 200, TRANSCONDUCTANCE, 5.0e-3, "from memory")));
        add(ChildDiode.throughPoint("6AL5", 10, 60e-3, 9e-3,
                "from memory (unconfirmed): 60 mA per plate at 10 V; 9 mA rated d.c. per plate from memory"));
        add(new GasThyratron("2D21", 8, -4, 0.1,
                "arc drop 8 V (vacuumtubes.io 2D21W page: 8-12 V); critical grid -4 V, the middle of the page's "
                        + "-2 to -6 V; 100 mA average from the same page"));
    }

    /** The model of a tube type, if the library has one. */
    public Optional<TubeModel> model(String name) {
        return Optional.ofNullable(models.get(name));
    }

    /** The fit behind a model, if it was fitted here. */
    public Optional<FittedModel<?>> fit(String name) {
        return Optional.ofNullable(fits.get(name));
    }

    /** Every model in declaration order. */
    public List<TubeModel> models() {
        return List.copyOf(models.values());
    }

    /** A model by name; an error naming the missing type otherwise. */
    public TubeModel require(String name) {
        TubeModel m = models.get(name);
        if (m == null) {
            throw new IllegalArgumentException("no model parameters for tube " + name
                    + ": add a published set or operating points to fit");
        }
        return m;
    }

    private void add(TubeModel m) {
        models.put(m.name(), m);
    }

    private void triodeFit(KorenTriode start, List<FitPoint> points) {
        FittedModel<KorenTriode> f = TubeFitter.fitTriode(start, List.of("mu", "kg1", "kp"), points);
        fits.put(start.name(), f);
        add(f.model());
    }

    private void pentodeFit(KorenPentode start, List<String> free, List<FitPoint> points) {
        FittedModel<KorenPentode> f = TubeFitter.fitPentode(start, free, points);
        fits.put(start.name(), f);
        add(f.model());
    }

    private static List<FitPoint> selfBiasedTriode(double vp, double rk, double ip, double gm, double mu, String src) {
        return List.of(FitPoint.selfBiased(vp, Double.NaN, rk, PLATE_CURRENT, ip, src),
                FitPoint.selfBiased(vp, Double.NaN, rk, TRANSCONDUCTANCE, gm, src),
                FitPoint.selfBiased(vp, Double.NaN, rk, AMPLIFICATION, mu, src));
    }
}
