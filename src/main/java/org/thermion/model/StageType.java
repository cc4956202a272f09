package org.thermion.model;

import java.util.List;

/**
 * One logic function built from tube sections and resistors. Draws are per rail for the
 * output low, output high, and always. Delays are in seconds and NaN when to be computed
 * from the plate load and the driven capacitance. {@code sectionsPerInput} is true for
 * stages that take one section per input (diode gates). {@code circuit} is the stage's declared
 * circuit (null for a stage known only by its typed-in currents, {@code circuit none}); where both
 * are given, the typed-in draws override the computed ones. {@code declared} says whether
 * {@code outputOhmsLow} and {@code gain} were written in the block or are defaults.
 */
public record StageType(
        String name,
        StageFunction function,
        int tube,
        int sections,
        boolean sectionsPerInput,
        int fanIn,
        double loadOhms,
        int loadRail,
        List<RailDraw> drawLow,
        List<RailDraw> drawHigh,
        List<RailDraw> drawAlways,
        double rise,
        double fall,
        double setup,
        double outputOhmsLow,
        double wiringFarads,
        double gain,
        String note,
        StageCircuitSpec circuit,
        Declared declared) {

    /** Which of the figures a circuit can compute the stage's block states itself (the others are defaults). */
    public record Declared(boolean ron, boolean gain) {
        /** Both stated, as a stage without a circuit has them. */
        public static final Declared BOTH = new Declared(true, true);
    }

    /** True when the stage declares its circuit. */
    public boolean hasCircuit() {
        return circuit != null;
    }

    /** Sections this stage uses for an instance with {@code inputs} inputs. */
    public int sectionsFor(int inputs) {
        return sectionsPerInput ? sections * Math.max(1, inputs) : sections;
    }
}
