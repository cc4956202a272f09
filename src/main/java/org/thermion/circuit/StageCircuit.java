package org.thermion.circuit;

/**
 * A stage as a circuit: its tube sections and parts. A stage is solved for given input
 * voltages (each input an ideal source at the driving net's level) and, for stages that
 * remember, a stored state (which half of a flip-flop conducts, whether a thyratron has fired).
 */
public sealed interface StageCircuit permits TubeStage, DiodeGate, FlipFlop, ThyratronStage, SteeredHalf {

    /** The stage's name (the library's stage name). */
    String name();

    /** Number of logic inputs. */
    int inputs();

    /** The logic value of the output for these inputs and stored state. */
    boolean logic(boolean[] in, boolean stored);

    /** True when the output moves against the input (its transfer curve falls). */
    boolean inverting();

    /** Adds the stage's parts to {@code b}; returns the output node. */
    int build(CircuitBuilder b, double[] inputVolts, boolean stored);

    /** What one of this stage's inputs puts on the net that drives it. */
    Load inputLoad();

    /** True when every input is true (AND of the inputs). */
    static boolean all(boolean[] in) {
        for (boolean b : in) {
            if (!b) {
                return false;
            }
        }
        return true;
    }

    /** True when some input is true (OR of the inputs). */
    static boolean any(boolean[] in) {
        for (boolean b : in) {
            if (b) {
                return true;
            }
        }
        return false;
    }
}
