package org.thermion.model;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** Each stage function's facts, checked against Boolean algebra written out here, not against the enum. */
class StageFunctionTest {

    /** The truth function of a gate, written independently of the production code. */
    private static boolean eval(GateFn fn, boolean[] in) {
        boolean and = true, or = false, xor = false;
        for (boolean b : in) {
            and &= b;
            or |= b;
            xor ^= b;
        }
        return switch (fn) {
            case AND -> and;
            case OR -> or;
            case NAND -> !and;
            case NOR -> !or;
            case XOR -> xor;
            case NOT -> !in[0];
            case BUF -> in[0];
        };
    }

    @Test
    void theEdgeRuleFollowsFromTheTruthTable() {
        // Raising input 0 with the others held: can the output rise (positive), fall (negative)?
        for (GateFn fn : GateFn.values()) {
            int n = fn == GateFn.NOT || fn == GateFn.BUF ? 1 : 3;
            boolean canRise = false, canFall = false;
            for (int others = 0; others < (1 << (n - 1)); others++) {
                boolean[] lo = new boolean[n], hi = new boolean[n];
                hi[0] = true;
                for (int i = 1; i < n; i++) {
                    lo[i] = hi[i] = ((others >> (i - 1)) & 1) == 1;
                }
                boolean a = eval(fn, lo), b = eval(fn, hi);
                canRise |= !a && b;
                canFall |= a && !b;
            }
            assertThat(fn.causes(true, true)).as(fn + ": rising input, rising output").isEqualTo(canRise);
            assertThat(fn.causes(true, false)).as(fn + ": rising input, falling output").isEqualTo(canFall);
            assertThat(fn.causes(false, false)).as(fn + ": falling input, falling output").isEqualTo(canRise);
        }
    }

    @Test
    void oneInputReducesToTheFunctionItComputes() {
        for (GateFn fn : GateFn.values()) {
            GateFn one = fn.withInputs(1);
            for (boolean x : new boolean[]{false, true}) {
                assertThat(eval(one, new boolean[]{x})).as(fn + " of one input " + x).isEqualTo(eval(fn, new boolean[]{x}));
            }
            assertThat(fn.withInputs(2)).isEqualTo(fn);
        }
    }

    @Test
    void wordsRolesAndInputs() {
        assertThat(StageFunction.byWord("nand")).isEqualTo(StageFunction.NAND);
        assertThat(StageFunction.byWord("NAND")).as("words are lower case").isNull();
        assertThat(StageFunction.words()).containsExactly("not", "nand", "nor", "and", "or", "xor", "buffer", "latch",
                "lamp", "relay");
        // realize chooses stages for operators and latches; lamps and relays are only called by name
        assertThat(StageFunction.realizableWords()).containsExactly("not", "nand", "nor", "and", "or", "xor", "buffer",
                "latch");
        assertThat(StageFunction.LATCH.callable()).isFalse();
        assertThat(StageFunction.RELAY.isDriver()).isTrue();
        assertThat(StageFunction.NOT.minInputs()).isEqualTo(1);
        assertThat(StageFunction.NOR.minInputs()).isEqualTo(2);
        assertThat(StageFunction.NAND.gate(1)).isEqualTo(GateFn.NOT);
        assertThat(StageFunction.LAMP.gate(1)).isEqualTo(GateFn.BUF);
    }
}
