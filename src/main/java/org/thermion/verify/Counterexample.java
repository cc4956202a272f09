package org.thermion.verify;

import java.util.List;

/**
 * One case where the logic does not do what the ISA says, standing for {@code cases} cases of
 * the same instruction that go wrong on the same item.
 *
 * @param item        the state bit that came out wrong, or "pc"
 * @param kind        "wrong value", "unexpected write", "missed write", "jump" or "target"
 * @param explanation what the latch (or the PC) was given, in net names
 * @param before      state bits before, as "name=0/1" in ISA order; {@code inputs} likewise
 * @param expected    the ISA's state after, {@code actual} the logic's
 * @param comparedWith what {@code nets} compares against: a passing case or the unmutated logic
 * @param nets        the first nets, in levelized order, that differ from that run
 * @param trace       the gates feeding the pin at fault, nearest first, with their values in this case
 */
public record Counterexample(String mnemonic, long opcode, long word, String operand, String item, String kind,
                             String explanation, String before, String inputs, String expected, String actual,
                             int expectedPc, int actualPc, long cases, String comparedWith, List<NetDiff> nets,
                             List<TraceLine> trace) {
}
