package org.thermion.faults;

/**
 * How hard plan generation may try: at most {@code maxSteps} steps; at most
 * {@code maxCycles} cycles in one step; {@code candidates} switch settings weighed per step
 * when there are too many to try them all; {@code searchStates} pairs of good and faulty
 * machine states visited per fault when searching for a test or a proof.
 */
public record Effort(int maxSteps, int maxCycles, int candidates, int searchStates) {
    /** What the bundled examples need, with room to spare. */
    public static final Effort DEFAULT = new Effort(200, 16, 64, 4_000);
}
