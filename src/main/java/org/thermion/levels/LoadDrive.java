package org.thermion.levels;

import org.thermion.circuit.Corner;

/**
 * A stage that drives a lamp or a relay coil in its plate: the current in its load when it
 * conducts and when it is cut off, each at nominal values and at the corner that worsens it
 * (the lowest current on, the highest off), beside what the part needs: a lamp's rated current,
 * a coil's pick-up and drop-out currents.
 */
public record LoadDrive(StageUse use, String name, String stage, Kind kind, double onAmps, double onWorstAmps,
                        Corner onCorner, double offAmps, double offWorstAmps, Corner offCorner, double ratedAmps,
                        double dropoutAmps) {
    /** What the stage drives. */
    public enum Kind { LAMP, COIL }
}
