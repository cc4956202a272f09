package org.thermion.circuit;

/** Current through a two-terminal part (resistor, coil, lamp, diode) and the voltage across it. */
public record PartCurrent(String label, double amps, double volts) {
}
