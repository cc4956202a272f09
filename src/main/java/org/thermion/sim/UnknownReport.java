package org.thermion.sim;

/** An unknown (X) value reaching a machine output or the jump net: where, when and how. */
public record UnknownReport(long cycle, int phase, String net, String what) {
}
