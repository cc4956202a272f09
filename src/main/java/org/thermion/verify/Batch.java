package org.thermion.verify;

/**
 * Up to 64 cases of one instruction, one per lane, all as lane words (bit i = lane i): each
 * bit of the instruction word, each state bit and each machine input (on a switch-fed machine
 * the word's switches carry the word). {@code valid} marks the lanes in use.
 */
final class Batch {
    final int instruction;
    final long[] wordBits;
    final long[] state;
    final long[] inputs;
    long valid;
    /** The PC every lane starts at. */
    int pc;
    /** The cycle runs with the decoder inhibited (the ISA's {@code inhibit} latch set): a skipped instruction. */
    boolean inhibited;

    Batch(int instruction, int wordWidth, int stateBits, int inputBits) {
        this.instruction = instruction;
        this.wordBits = new long[wordWidth];
        this.state = new long[stateBits];
        this.inputs = new long[inputBits];
    }

    boolean state(int s, int lane) {
        return (state[s] >>> lane & 1L) != 0;
    }

    boolean input(int i, int lane) {
        return (inputs[i] >>> lane & 1L) != 0;
    }

    /** The instruction word of one lane. */
    long word(int lane) {
        long w = 0;
        for (int b = 0; b < wordBits.length; b++) {
            w |= (wordBits[b] >>> lane & 1L) << b;
        }
        return w;
    }

    /** Sets the instruction word of one lane. */
    void setWord(int lane, long word) {
        long bit = 1L << lane;
        for (int b = 0; b < wordBits.length; b++) {
            wordBits[b] = (wordBits[b] & ~bit) | ((word >>> b & 1L) != 0 ? bit : 0);
        }
    }

    /** Copies lane {@code from} of {@code src} into lane {@code to} of this batch. */
    void copyLane(Batch src, int from, int to) {
        long bit = 1L << to;
        pc = src.pc;
        inhibited = src.inhibited;
        setWord(to, src.word(from));
        for (int s = 0; s < state.length; s++) {
            state[s] = (state[s] & ~bit) | (src.state(s, from) ? bit : 0);
        }
        for (int i = 0; i < inputs.length; i++) {
            inputs[i] = (inputs[i] & ~bit) | (src.input(i, from) ? bit : 0);
        }
        valid |= bit;
    }
}
