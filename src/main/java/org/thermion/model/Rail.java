package org.thermion.model;

/** A named supply: volts (signed), source resistance in ohms, current limit in amperes. */
public record Rail(String name, double volts, double sourceOhms, double limitAmps) {
}
