package org.thermion.circuit;

/** A plate (or pull) resistor. */
public record LoadResistor(double ohms) implements PlateLoad {
    public LoadResistor {
        Checks.positive("load ohms", ohms);
    }

    public void attach(CircuitBuilder b, int rail, int plate) {
        b.resistor("load", rail, plate, ohms);
    }
}
