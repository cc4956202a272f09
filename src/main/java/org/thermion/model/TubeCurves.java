package org.thermion.model;

import java.util.List;

/**
 * A tube type's electrical model as its block declares it: the law and parameters, the published
 * points and which parameters are fitted to them at load ({@code fitted} empty: the parameters are
 * taken as written), the residual the library states for that fit (NaN: none stated), the grid
 * current constant ({@code gridK} A/V^1.5; NaN: the default law), and ratings (NaN: unknown).
 */
public record TubeCurves(TubeLaw law, List<CurvePoint> points, List<String> fitted, double statedResidual,
                         double gridK, double plateWatts, double screenWatts, String source) {
    public TubeCurves {
        points = List.copyOf(points);
        fitted = List.copyOf(fitted);
    }
}
