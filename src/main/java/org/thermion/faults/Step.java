package org.thermion.faults;

import java.util.Arrays;

/**
 * One step of a bench procedure: set every switch (machine input, in the machine's order),
 * clock {@code cycles} whole cycles with the single-step clock, then read the lamps.
 */
public record Step(boolean[] inputs, int cycles) {
    public Step {
        inputs = inputs.clone();
        if (cycles < 1) {
            throw new IllegalArgumentException("a step clocks at least one cycle, not " + cycles);
        }
    }

    /** {@code n} random steps over {@code inputs} switches, each clocked 1 to {@code maxCycles} cycles. */
    public static java.util.List<Step> random(java.util.Random r, int inputs, int n, int maxCycles) {
        java.util.List<Step> out = new java.util.ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            boolean[] in = new boolean[inputs];
            for (int i = 0; i < inputs; i++) {
                in[i] = r.nextBoolean();
            }
            out.add(new Step(in, 1 + r.nextInt(maxCycles)));
        }
        return out;
    }

    @Override
    public boolean[] inputs() {
        return inputs.clone();
    }

    boolean input(int i) {
        return inputs[i];
    }

    int inputCount() {
        return inputs.length;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Step s && s.cycles == cycles && Arrays.equals(s.inputs, inputs);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(inputs) * 31 + cycles;
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder();
        for (boolean in : inputs) {
            b.append(in ? '1' : '0');
        }
        return b + " x" + cycles;
    }
}
