package org.thermion.circuit;

/**
 * An incandescent lamp: rated volts and amps (hot resistance V/I) and the ratio of hot to cold
 * resistance. Solved as a resistor at its operating point (see {@code Element.Lamp}).
 */
public record Lamp(double ratedVolts, double ratedAmps, double coldRatio) implements PlateLoad {
    /** Hot-to-cold resistance ratio of a small tungsten lamp: about 10 (from memory). */
    public static final double TYPICAL_COLD_RATIO = 10;

    public Lamp {
        Checks.positive("lamp volts", ratedVolts);
        Checks.positive("lamp amps", ratedAmps);
        if (!(coldRatio > 1) || Double.isInfinite(coldRatio)) {
            throw new IllegalArgumentException("lamp hot/cold ratio must be > 1: " + coldRatio);
        }
    }

    public void attach(CircuitBuilder b, int rail, int plate) {
        b.lamp("load", rail, plate, this);
    }

    /** The lamp's hot resistance at its rating. */
    public double hotOhms() {
        return ratedVolts / ratedAmps;
    }
}
