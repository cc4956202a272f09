package org.thermion.circuit;

/** A circuit with no DC solution, and why (a floating grid, a rail that cannot supply the load, ...). */
public record NoDcSolution(String stage, String reason) implements DcResult {
}
