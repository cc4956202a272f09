package org.thermion.circuit;

/**
 * A circuit with no DC solution: why (a floating grid, a rail that cannot supply the load, a
 * solve that does not converge, ...) and the change that would give it one.
 */
public record NoDcSolution(String stage, String reason, String fix) implements DcResult {
    /** The cure when nothing more particular is known. */
    static final String CHECK_VALUES = "check the stage's part values and rails, or state its currents with draw lines";
}
