package org.thermion.verify;

import java.util.List;

/**
 * Outcome of checking a machine's logic against its ISA.
 *
 * @param exhaustive   true when every case of the plan was run, false for a seeded sample
 * @param plans        per instruction, how its operand was covered
 * @param decodeName   the name of the decode lines looked for; {@code decode} empty when none were found
 * @param notes        remarks such as opcodes no instruction claims (not checked)
 */
public record VerifyReport(String machine, long cases, boolean exhaustive, long seed, List<String> plans,
                           String decodeName, List<DecodeVerdict> decode, List<Counterexample> counterexamples,
                           List<String> notes) {

    public boolean decodeOk() {
        return decode.stream().allMatch(DecodeVerdict::ok);
    }

    public boolean passes() {
        return counterexamples.isEmpty() && decodeOk();
    }
}
