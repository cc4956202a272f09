package org.thermion.model;

/**
 * A combinational cell. {@code stage} is the stage type that realizes it, or -1 for a
 * free connection (a flip-flop's complementary output), which draws and delays nothing.
 * The input nets are copied in and handed out as copies; loops read {@link #input(int)}.
 */
public record Gate(int id, GateFn fn, int[] inputs, int output, int stage, int module) {
    public Gate {
        inputs = inputs.clone();
    }

    /** A copy of the input nets. */
    @Override
    public int[] inputs() {
        return inputs.clone();
    }

    /** Input net of pin {@code pin}. */
    public int input(int pin) {
        return inputs[pin];
    }

    /** Number of inputs. */
    public int arity() {
        return inputs.length;
    }
}
