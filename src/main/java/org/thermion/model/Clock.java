package org.thermion.model;

/** The clock: number of phases and the cycle period in seconds (phases share it equally). */
public record Clock(int phases, double periodSeconds) {
    public double phaseSeconds() {
        return periodSeconds / phases;
    }
}
