package org.thermion.circuit;

/**
 * A relay coil in a plate circuit: DC resistance, the current at which it picks up and the
 * current below which it drops out.
 */
public record RelayCoil(double ohms, double pickupAmps, double dropoutAmps) implements PlateLoad {
    public RelayCoil {
        Checks.positive("coil ohms", ohms);
        Checks.positive("pick-up current", pickupAmps);
        Checks.nonNegative("drop-out current", dropoutAmps);
        if (dropoutAmps > pickupAmps) {
            throw new IllegalArgumentException("drop-out current above pick-up current");
        }
    }

    public void attach(CircuitBuilder b, int rail, int plate) {
        b.resistor("load", rail, plate, ohms);
    }

    /** Whether the coil holds the armature at {@code amps} (pulled in). */
    public boolean pullsIn(double amps) {
        return amps >= pickupAmps;
    }
}
