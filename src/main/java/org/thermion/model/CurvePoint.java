package org.thermion.model;

/**
 * One published figure of a tube, declared on a {@code point} line: a plate or screen current,
 * a transconductance or an amplification factor at stated electrode voltages, with its source.
 * The grid is held at {@code gridVolts}, or (when {@code cathodeOhms} > 0) biased by that
 * cathode resistor. {@code screenVolts} is NaN for a triode.
 */
public record CurvePoint(Quantity quantity, double value, double plateVolts, double screenVolts, double gridVolts,
                         double cathodeOhms, String source) {

    /** What the figure is. */
    public enum Quantity { PLATE, SCREEN, GM, MU }
}
