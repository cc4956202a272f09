package org.thermion.faults;

import java.util.Arrays;

/**
 * One step of a bench procedure: set every switch (machine input, in the machine's order),
 * clock {@code cycles} whole cycles with the single-step clock, then read the lamps. A step with
 * a {@code program} (0 the first, 1 the second ...; {@link #SAME} for none) starts by switching
 * off, fitting that program's ROM and switching on again: the machine is back at power-up.
 */
public record Step(boolean[] inputs, int cycles, int program) {
    /** The program of a step that goes on with whatever runs. */
    public static final int SAME = -1;

    public Step {
        inputs = inputs.clone();
        if (cycles < 1) {
            throw new IllegalArgumentException("a step clocks at least one cycle, not " + cycles);
        }
        if (program < SAME) {
            throw new IllegalArgumentException("no program " + program);
        }
    }

    /** A step that goes on with the program that runs. */
    public Step(boolean[] inputs, int cycles) {
        this(inputs, cycles, SAME);
    }

    /** This step, started by switching off and on with program {@code k} in the ROM. */
    public Step restarting(int k) {
        return new Step(inputs, cycles, k);
    }

    /** True when the step starts from power-up with a program fitted. */
    public boolean restarts() {
        return program != SAME;
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
        return o instanceof Step s && s.cycles == cycles && s.program == program && Arrays.equals(s.inputs, inputs);
    }

    @Override
    public int hashCode() {
        return (Arrays.hashCode(inputs) * 31 + cycles) * 31 + program;
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder();
        for (boolean in : inputs) {
            b.append(in ? '1' : '0');
        }
        return (program == SAME ? "" : "program " + program + ": ") + b + " x" + cycles;
    }
}
