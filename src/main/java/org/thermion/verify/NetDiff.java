package org.thermion.verify;

/**
 * A net that carries different values in two runs: {@code value} in the failing case,
 * {@code other} in the run it is compared with, at the settle of clock {@code phase}.
 */
public record NetDiff(int net, String name, String module, int phase, boolean value, boolean other) {
}
