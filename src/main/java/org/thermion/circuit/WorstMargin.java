package org.thermion.circuit;

/** A margin at nominal values and at the tolerance corner that worsens it most, named. */
public record WorstMargin(Side side, double nominal, double worst, Corner corner) {
    /** Which margin. */
    public enum Side { HIGH, LOW }
}
