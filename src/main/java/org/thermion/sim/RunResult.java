package org.thermion.sim;

import java.util.List;

/**
 * What a program run produced.
 *
 * @param cycles     cycles run
 * @param stop       why the run ended, in words
 * @param changes    every output change, in order
 * @param unknowns   unknown values that reached an output or the jump net (unknown mode)
 * @param stateNames the ISA state bits, in ISA order
 * @param state      their final values, one '0', '1' or 'x' each
 * @param pc         the final program counter; {@code pcKnown} false when it is unknown
 * @param watchNames the watched names, in the order of {@link WatchRow#values()}
 * @param watch      one row per cycle when names are watched
 * @param initialOutputs the machine outputs at power-up, one '0', '1' or 'x' each (machine order)
 */
public record RunResult(long cycles, String stop, List<OutputChange> changes, List<UnknownReport> unknowns,
                        List<String> stateNames, String state, int pc, boolean pcKnown,
                        List<String> watchNames, List<WatchRow> watch, String initialOutputs) {
}
