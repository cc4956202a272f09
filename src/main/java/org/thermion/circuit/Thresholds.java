package org.thermion.circuit;

/**
 * A receiving stage's input thresholds from its own transfer curve: V_IL and V_IH are where the
 * curve's slope is −1 (+1 for a non-inverting stage), the textbook definition; a stage whose
 * gain never reaches 1 (a diode gate, a cathode follower) gets its midpoint instead: the input
 * where the output is halfway between its extremes, for both thresholds.
 */
public record Thresholds(double vil, double vih, Method method) {
    /** How the thresholds were found. */
    public enum Method { UNITY_GAIN, MIDPOINT }
}
