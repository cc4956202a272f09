package org.thermion.levels;

import org.thermion.circuit.InputLevels;
import org.thermion.circuit.WorstMargin;

/**
 * One electrical node's figures: its driving stage, how many input pins it feeds and of which
 * stages, its high and low level under that load, the receivers' most demanding thresholds, the
 * high and low noise margins at nominal values and at their worst tolerance corners, and the most
 * receivers of its heaviest kind the driver could feed at that worst corner with the declared
 * minimum margin. Volts; NaN where a figure does not apply ({@code note} says why). {@code use} is
 * the driving stage use and {@code inputs} the levels its inputs were solved at, {@code worstInputs}
 * those its driving nodes give at their worst corners (all null for a net driven from outside);
 * {@code worstVoh}/{@code worstVol} this net's own levels at the corners of its worst high and low
 * margins, which the stages it drives are solved at in their worst case; {@code restoring} says
 * whether the driver has gain (not a diode gate or a follower).
 */
public record NetLevel(String name, String stage, StageUse use, InputLevels inputs, InputLevels worstInputs,
                       boolean restoring, int loads, String receivers,
                       double voh, double vol, double vih, double vil, WorstMargin high, WorstMargin low,
                       int fanOutLimit, String limitKind, double worstVoh, double worstVol, String note) {

    /** The lower of the two worst-case margins; NaN when the net has no margins. */
    public double worstMargin() {
        if (high == null || low == null) {
            return Double.NaN;
        }
        return Math.min(high.worst(), low.worst());
    }

    /** The worse side's margin record, or null. */
    public WorstMargin worse() {
        if (high == null || low == null) {
            return null;
        }
        return high.worst() <= low.worst() ? high : low;
    }
}
