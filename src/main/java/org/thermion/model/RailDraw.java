package org.thermion.model;

/** Current a stage takes from one rail in one output state, in amperes (negative rails: magnitude). */
public record RailDraw(int rail, double amps) {
}
