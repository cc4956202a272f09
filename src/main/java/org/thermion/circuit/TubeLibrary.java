package org.thermion.circuit;

import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.thermion.model.CurvePoint;
import org.thermion.model.TubeCurves;
import org.thermion.model.TubeLaw;
import org.thermion.model.TubeType;

/**
 * The tube models of a machine, built from its tube types' declared curves (the parts library's
 * tube blocks, or a user's own). Parameters are taken as written; where a block names parameters
 * to fit, they are fitted here to its points (a few milliseconds each) and the fit with its
 * points and residual is kept. Every figure names its source; "from memory" means recalled.
 */
public final class TubeLibrary {
    private final Map<String, TubeModel> models = new LinkedHashMap<>();
    private final Map<String, FittedModel<?>> fits = new LinkedHashMap<>();

    /** A fit missing its points by more than this (rms relative) is refused: twice Koren's usual ±25 %. */
    static final double MOST_FIT_RESIDUAL = 0.5;

    private TubeLibrary() {
    }

    /**
     * The models of every tube type that declares one; the others have none, nor has a tube whose
     * model cannot be built ({@link #problem}, reported at its fit line when the machine was read).
     */
    public static TubeLibrary of(Collection<TubeType> tubes) {
        TubeLibrary lib = new TubeLibrary();
        for (TubeType t : tubes) {
            if (t.curves() != null && problem(t) == null) {
                lib.add(t);
            }
        }
        return lib;
    }

    /** Why the declared model of {@code t} cannot be built (its fit fails or runs away); null when it can. */
    public static String problem(TubeType t) {
        if (t.curves() == null) {
            return null;
        }
        try {
            new TubeLibrary().add(t);
            return null;
        } catch (IllegalArgumentException | org.hipparchus.exception.MathRuntimeException e) {
            return e.getMessage();
        }
    }

    /** The model of a tube type, if it has one. */
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
                    + ": add a model line (and points to fit) to its tube block");
        }
        return m;
    }

    /** A declared point as the fitter takes it. */
    public static FitPoint fitPoint(CurvePoint p) {
        FitPoint.Quantity q = switch (p.quantity()) {
            case PLATE -> FitPoint.Quantity.PLATE_CURRENT;
            case SCREEN -> FitPoint.Quantity.SCREEN_CURRENT;
            case GM -> FitPoint.Quantity.TRANSCONDUCTANCE;
            case MU -> FitPoint.Quantity.AMPLIFICATION;
        };
        return new FitPoint(p.plateVolts(), p.screenVolts(), p.gridVolts(), p.cathodeOhms(), q, p.value(), p.source());
    }

    private void add(TubeType t) {
        TubeCurves c = t.curves();
        String source = c.source().isEmpty() ? t.source() : c.source();
        GridCurrentLaw grid = Double.isNaN(c.gridK()) ? GridCurrentLaw.KOREN_NETLIST
                : new GridCurrentLaw(c.gridK(), "declared gridcurrent of " + t.name());
        List<FitPoint> points = c.points().stream().map(TubeLibrary::fitPoint).toList();
        TubeModel m;
        if (c.law() instanceof TubeLaw.Koren k && Double.isNaN(k.kg2())) {
            KorenTriode start = new KorenTriode(t.name(), k.mu(), k.ex(), k.kg1(), k.kp(), k.kvb(), grid, c.plateWatts(),
                    source);
            m = c.fitted().isEmpty() ? start : keep(TubeFitter.fitTriode(start, c.fitted(), points));
        } else if (c.law() instanceof TubeLaw.Koren k) {
            KorenPentode start = new KorenPentode(t.name(), k.mu(), k.ex(), k.kg1(), k.kg2(), k.kp(), k.kvb(), grid,
                    c.plateWatts(), c.screenWatts(), source);
            m = c.fitted().isEmpty() ? start : keep(TubeFitter.fitPentode(start, c.fitted(), points));
        } else if (c.law() instanceof TubeLaw.Diode d) {
            m = ChildDiode.throughPoint(t.name(), d.volts(), d.amps(), t.avgCathodeAmps(), source);
        } else {
            TubeLaw.Gas g = (TubeLaw.Gas) c.law();
            m = new GasThyratron(t.name(), Double.isNaN(t.arcDropVolts()) ? GasThyratron.TYPICAL_ARC_DROP
                    : t.arcDropVolts(), g.criticalGrid(), g.controlRatio(), t.avgCathodeAmps(), source);
        }
        Checks.plausibleTube(m);
        models.put(t.name(), m);
    }

    private <M extends TubeModel> M keep(FittedModel<M> f) {
        Checks.plausibleFit(f.model());
        if (!(f.rmsRelativeError() <= MOST_FIT_RESIDUAL)) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT, "the fit misses its points by "
                    + "%.0f %% rms, more than twice the published equations' usual accuracy of 25 %%: the points "
                    + "contradict each other or the law", 100 * f.rmsRelativeError()));
        }
        fits.put(f.model().name(), f);
        return f.model();
    }
}
