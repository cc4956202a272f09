package org.thermion.circuit;

/** What a stage's plate returns to its rail through: a resistor, a relay coil, a lamp, or nothing. */
public sealed interface PlateLoad permits LoadResistor, RelayCoil, Lamp, DirectToRail {

    /** Adds the load between {@code rail} and {@code plate}, labelled "load". */
    void attach(CircuitBuilder b, int rail, int plate);

    /** True when the plate is the rail itself (no part in between). */
    default boolean direct() {
        return false;
    }
}
