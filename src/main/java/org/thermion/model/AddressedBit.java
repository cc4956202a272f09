package org.thermion.model;

/**
 * One address of the operand bit map: reading it gives a machine input or a state bit,
 * writing it (state bits only) changes that state bit. Exactly one of the indices is >= 0.
 */
public record AddressedBit(long address, String name, int input, int state) {
    public boolean writable() {
        return state >= 0;
    }
}
