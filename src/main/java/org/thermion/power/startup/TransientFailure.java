package org.thermion.power.startup;

/**
 * The power-up model cannot be solved for this machine: a value that leaves no finite solution
 * (an infinite resistance, an absurd voltage), named with the rail, heater, stage or soft start
 * concerned. It is the input's fault, reported in words, never an internal error.
 */
public final class TransientFailure extends RuntimeException {
    public TransientFailure(String message) {
        super(message);
    }
}
