package org.thermion.circuit;

import java.util.List;

/**
 * A parameter set fitted to published points, kept beside the points, their sources and the
 * fit's residual so a reader can judge it.
 *
 * @param rmsRelativeError root mean square of the points' relative errors after the fit
 */
public record FittedModel<M extends TubeModel>(M model, List<FitPoint> points, double rmsRelativeError,
                                                int iterations) {
    public FittedModel {
        points = List.copyOf(points);
    }
}
