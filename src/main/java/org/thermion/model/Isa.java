package org.thermion.model;

import java.util.List;

/**
 * The instruction set: word width, fields, state bits bound to latch nets, the bit map
 * the operand addresses, and every instruction's meaning.
 *
 * @param wordInputs  machine input indices that carry the instruction word from switches, LSB
 *                    first (a bring-up panel); empty when the word comes from the ROM
 * @param inhibitNet  the latch output that, at 1, deliberately inhibits the decoder (the fetched
 *                    instruction is skipped), or -1
 */
public record Isa(int wordBits, List<IsaField> fields, int opcodeField, int targetField,
                  List<StateBit> state, List<AddressedBit> bitMap, int selectField, List<Instruction> instructions,
                  int[] wordInputs, int inhibitNet) {

    public Isa {
        fields = List.copyOf(fields);
        state = List.copyOf(state);
        bitMap = List.copyOf(bitMap);
        instructions = List.copyOf(instructions);
        wordInputs = wordInputs.clone();
    }

    /** A copy of the switch inputs of the instruction word (empty: the word comes from the ROM). */
    @Override
    public int[] wordInputs() {
        return wordInputs.clone();
    }

    /** True when the instruction word comes from switches rather than a ROM. */
    public boolean wordFromSwitches() {
        return wordInputs.length > 0;
    }

    public IsaField opcode() {
        return fields.get(opcodeField);
    }

    public Instruction byOpcode(long code) {
        for (Instruction i : instructions) {
            if (i.opcode() == code) {
                return i;
            }
        }
        return null;
    }

    public Instruction byMnemonic(String m) {
        for (Instruction i : instructions) {
            if (i.mnemonic().equalsIgnoreCase(m)) {
                return i;
            }
        }
        return null;
    }

    public int stateIndex(String name) {
        for (int i = 0; i < state.size(); i++) {
            if (state.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }
}
