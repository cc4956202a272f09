package org.thermion.model;

import java.util.List;

/** One instruction: mnemonic, opcode and its meaning as register-transfer statements. */
public record Instruction(String mnemonic, long opcode, List<Transfer> body) {
    public Instruction {
        body = List.copyOf(body);
    }
}
