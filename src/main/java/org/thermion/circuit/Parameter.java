package org.thermion.circuit;

/** A toleranced quantity a circuit was built with: its corner label and kind. */
public record Parameter(String label, Kind kind) {
    /** What varies. */
    public enum Kind { RAIL, RESISTOR, EMISSION }
}
