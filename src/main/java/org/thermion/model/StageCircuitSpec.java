package org.thermion.model;

/**
 * A stage's circuit as its block declares it; rails by name. How the sections are joined
 * ({@link Arrangement}), the plate load ({@code load} null for a plate tied to its rail), the
 * cathode return, the grid network every input sees, the screen supply of a pentode, a series
 * plate resistor (thyratrons), and where the output is taken.
 *
 * @param gridSeriesOhms  from the driving output to the grid tap; 0 for a direct connection
 * @param gridToBiasOhms  from the tap to {@code gridRail}; infinite for none
 * @param screenOhms      screen dropping resistor; NaN when the stage has no screen supply
 * @param cathodeCoilPickupAmps the pick-up current of a relay coil that is the cathode resistor (a
 *                        follower driving its coil); NaN when the cathode resistor is a plain one
 */
public record StageCircuitSpec(Arrangement arrangement, PlateLoadSpec load, String loadRail, double cathodeOhms,
                               String cathodeRail, double gridSeriesOhms, double gridToBiasOhms, String gridRail,
                               double gridStopperOhms, double screenOhms, String screenRail, double seriesOhms,
                               boolean outputAtCathode, double cathodeCoilPickupAmps) {

    /** How a stage's tube sections are joined. */
    public enum Arrangement {
        /** Each input's sections with plates tied (inverter, NOR, lamp and relay drivers, follower). */
        PARALLEL,
        /** One section per input stacked plate to cathode (NAND). */
        SERIES,
        /** Two halves cross-coupled plate to grid (flip-flop). */
        CROSSED,
        /** One diode per input to a pull resistor (AND pulls up, OR pulls down). */
        DIODES,
        /** A gas thyratron in series with its load. */
        THYRATRON
    }

    /** A plate load: a resistor, a relay coil, or a lamp. */
    public sealed interface PlateLoadSpec {
        /** The load's resistance at its working point (a lamp's hot resistance). */
        double ohms();
    }

    /** A plate resistor. */
    public record Resistor(double ohms) implements PlateLoadSpec {
    }

    /** A relay coil: resistance, pick-up and drop-out currents (drop-out 0 when not stated). */
    public record Coil(double ohms, double pickupAmps, double dropoutAmps) implements PlateLoadSpec {
    }

    /** An incandescent lamp at its rating. */
    public record Lamp(double volts, double amps) implements PlateLoadSpec {
        public double ohms() {
            return volts / amps;
        }
    }
}
