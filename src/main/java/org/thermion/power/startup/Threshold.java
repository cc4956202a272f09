package org.thermion.power.startup;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;

import java.util.function.ToDoubleFunction;

/**
 * One event: a continuous function of the state crossing zero. Each threshold gets its own
 * detector whose {@code g} never changes formula (a {@code g} that jumps when its own event fires
 * makes the integrator loop), and it records when it first fired.
 */
final class Threshold implements ODEEventDetector {
    /** Largest step between sign checks: finer than any thermal change we look for. */
    static final double MAX_CHECK = 0.05;

    private final ToDoubleFunction<ODEStateAndDerivative> g;
    private final Action action;
    private final boolean risingOnly;
    private final BracketedUnivariateSolver<UnivariateFunction> solver =
            new BracketingNthOrderBrentSolver(1e-9, 1e-7, 1e-12, 5);
    private final ODEEventHandler handler;
    private double firstTime = Double.NaN;
    private int count;

    /** Told of every crossing the detector reports. */
    interface Crossing {
        void crossed(double time, boolean increasing);
    }

    /**
     * @param g          the event function
     * @param action     what the integrator does when it fires (STOP ends a segment)
     * @param risingOnly record only crossings from negative to positive
     */
    Threshold(ToDoubleFunction<ODEStateAndDerivative> g, Action action, boolean risingOnly) {
        this(g, action, risingOnly, null);
    }

    /** As above, also telling {@code listener} of every crossing (rising or falling). */
    Threshold(ToDoubleFunction<ODEStateAndDerivative> g, Action action, boolean risingOnly, Crossing listener) {
        this.g = g;
        this.action = action;
        this.risingOnly = risingOnly;
        this.handler = (state, detector, increasing) -> {
            if (listener != null) {
                listener.crossed(state.getTime(), increasing);
            }
            if (increasing || !risingOnly) {
                count++;
                if (Double.isNaN(firstTime)) {
                    firstTime = state.getTime();
                }
                return action;
            }
            return Action.CONTINUE;
        };
    }

    @Override
    public AdaptableInterval getMaxCheckInterval() {
        return AdaptableInterval.of(MAX_CHECK);
    }

    @Override
    public int getMaxIterationCount() {
        return 100;
    }

    @Override
    public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
        return solver;
    }

    @Override
    public ODEEventHandler getHandler() {
        return handler;
    }

    @Override
    public double g(ODEStateAndDerivative state) {
        return g.applyAsDouble(state);
    }

    /** Time of the first recorded crossing, NaN if none. */
    double firstTime() {
        return firstTime;
    }

    int count() {
        return count;
    }

    boolean stops() {
        return action == Action.STOP;
    }

    boolean risingOnly() {
        return risingOnly;
    }
}
