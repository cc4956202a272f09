package org.thermion.model;

/**
 * The program counter: its width, the phase it loads on, the net that asks for a jump
 * and the nets of the jump target (LSB first). Without a jump it counts up by one.
 */
public record ProgramCounter(int width, int phase, int jumpNet, int[] targetNets, boolean offBoard) {
    public ProgramCounter {
        targetNets = targetNets.clone();
    }

    /** A copy of the jump-target nets. */
    @Override
    public int[] targetNets() {
        return targetNets.clone();
    }
}
