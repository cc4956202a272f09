package org.thermion.circuit;

/**
 * How an input reaches a grid: a divider from the driving output (series resistor, 0 for a
 * direct connection) to the bias rail (resistor, infinite for none), and a grid stopper
 * (0 for none) between the divider's tap and the grid pin.
 */
public record GridNetwork(double seriesOhms, double toBiasOhms, String biasRail, double stopperOhms) {
    public GridNetwork {
        Checks.nonNegative("grid series ohms", seriesOhms);
        if (!(toBiasOhms > 0)) {
            throw new IllegalArgumentException("grid-to-bias ohms must be > 0 (infinite for none): " + toBiasOhms);
        }
        Checks.nonNegative("grid stopper ohms", stopperOhms);
    }

    /** The grid driven directly from the input, nothing else. */
    public static GridNetwork direct() {
        return new GridNetwork(0, Double.POSITIVE_INFINITY, RailSet.GROUND, 0);
    }

    /**
     * Adds the network from input node {@code in}; returns the grid pin's node. Nodes are named
     * with {@code nodeTag}, parts labelled "grid.series", "grid.tobias", "grid.stopper" (all
     * inputs of a stage share the labels: their resistors sit at the same tolerance end).
     */
    int attach(CircuitBuilder b, int in, String nodeTag) {
        int tap = in;
        if (seriesOhms > 0) {
            tap = b.node("tap" + nodeTag);
            b.resistor("grid.series", in, tap, seriesOhms);
        }
        if (Double.isFinite(toBiasOhms)) {
            b.resistor("grid.tobias", tap, b.rail(biasRail), toBiasOhms);
        }
        if (stopperOhms > 0) {
            int pin = b.node("grid" + nodeTag);
            b.resistor("grid.stopper", tap, pin, stopperOhms);
            return pin;
        }
        return tap;
    }

    /** The tap's voltage with no grid current, for an input at {@code vin} (corner values). */
    double openTapVolts(CircuitBuilder b, double vin) {
        if (seriesOhms == 0 || !Double.isFinite(toBiasOhms)) {
            return vin;
        }
        double rs = b.ohms("grid.series", seriesOhms);
        double rb = b.ohms("grid.tobias", toBiasOhms);
        return (vin * rb + b.railVolts(biasRail) * rs) / (rs + rb);
    }
}
