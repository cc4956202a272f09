package org.thermion.levels;

import org.thermion.circuit.Corner;
import org.thermion.circuit.NoDcSolution;

/**
 * A stage that drives a lamp or a relay coil: the current in its load when it conducts and when
 * it is cut off, each at nominal values and at the corner that worsens it (the lowest current on,
 * the highest off), beside what the part needs: a lamp's rated current, a coil's pick-up and
 * drop-out currents (NaN: not stated, as for a plain resistor in a relay stage's plate). A logic
 * stage's drive has its {@code use} and {@code softStart} -1; a soft start's bypass relay has no
 * use and its soft start's index, its coil rated at {@code ratedVolts} (NaN for logic coils).
 * {@code unsolved} is set (and the currents NaN) when the stage has no DC solution at nominal values.
 */
public record LoadDrive(StageUse use, int softStart, String name, String stage, Kind kind, double onAmps,
                        double onWorstAmps, Corner onCorner, double offAmps, double offWorstAmps, Corner offCorner,
                        double ratedAmps, double dropoutAmps, double coilOhms, double ratedVolts, boolean follower,
                        NoDcSolution unsolved) {
    /** What the stage drives. */
    public enum Kind { LAMP, COIL }
}
