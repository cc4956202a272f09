package org.thermion.faults;

/**
 * One value slot of the flat circuit and the wire it stands for. A net read in one place
 * is one slot; a net read in several places gets a slot per reading pin (a fan-out branch)
 * beside the slot of its stem. {@code index} is the gate, latch, input or lamp the wire
 * belongs to (by {@link Place}), {@code pin} the reading pin (0 for stems).
 */
public record Site(int slot, int net, Place place, int index, int pin) {

    /** Where a wire sits. */
    public enum Place {
        /** Constant 0 or 1: no wire, never a fault site. */
        CONSTANT,
        /** A machine input (a switch). */
        INPUT,
        /** A data line of the program memory. */
        ROM,
        /** The output of a gate stage (or of a flip-flop's free second output). */
        GATE_OUT,
        /** The output of a latch stage. */
        LATCH_OUT,
        /** A fan-out branch into a gate's input pin. */
        GATE_IN,
        /** A fan-out branch into a latch's data input. */
        LATCH_DATA,
        /** A fan-out branch into a latch's load enable. */
        LATCH_ENABLE,
        /** A fan-out branch into the program counter's jump request. */
        PC_JUMP,
        /** A fan-out branch into a program counter target bit ({@code pin} = bit). */
        PC_TARGET,
        /** A fan-out branch into a lamp (what the builder sees). */
        LAMP;

        /** True for stems (the net itself), false for branches into one reader. */
        public boolean stem() {
            return ordinal() <= LATCH_OUT.ordinal();
        }
    }

    /** True where a single stuck-at fault can sit (every wire but the constants). */
    public boolean line() {
        return place != Place.CONSTANT;
    }
}
