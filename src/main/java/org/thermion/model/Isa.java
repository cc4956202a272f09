package org.thermion.model;

import java.util.List;

/**
 * The instruction set: word width, fields, state bits bound to latch nets, the bit map
 * the operand addresses, and every instruction's meaning.
 */
public record Isa(int wordBits, List<IsaField> fields, int opcodeField, int targetField,
                  List<StateBit> state, List<AddressedBit> bitMap, int selectField, List<Instruction> instructions) {

    public Isa {
        fields = List.copyOf(fields);
        state = List.copyOf(state);
        bitMap = List.copyOf(bitMap);
        instructions = List.copyOf(instructions);
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
