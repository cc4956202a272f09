package org.thermion.elab;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.NestingLimit;
import org.thermion.lang.SourceSet;

/**
 * The input limits are what keep the recursive parts (the generated parser, the tree builder,
 * expression lowering) off the JVM's stack limit: text right at the limits goes all the way
 * through on a thread with a quarter of the JVM's usual 1 MiB stack.
 */
class ExpressionAtTheLimitsTest {
    private static final long SMALL_STACK = 256 * 1024;

    @Test
    void aLineAtTheOperatorAndNestingLimitsElaboratesOnASmallStack() {
        int depth = NestingLimit.MAX_DEPTH - 2; // the module's brace is one level
        int chain = NestingLimit.MAX_OPERATORS - depth;
        String expr = "(".repeat(depth) + "a" + ")".repeat(depth) + " | b".repeat(chain);
        String text = "rail bplus { voltage 48 V }\nrail bias { voltage -24 V }\n"
                + "realize { not pentode_inverter; and diode_and; or diode_or; latch triode_flipflop }\n"
                + "module wide {\n  in a, b\n  out y\n  y = " + expr + "\n}\n";
        Diagnostics diags = new Diagnostics();
        Elaborator e = onASmallStack(elaborator -> elaborator.elaborateText(Path.of("wide.machine"), text), diags);
        assertThat(diags.all()).as("no diagnostics").isEmpty();
        assertThat(e.modulesAlone()).hasSize(1);
    }

    @Test
    void anInstructionMeaningAtTheOperatorAndNestingLimitsElaboratesOnASmallStack() {
        // On the op's line: the isa's and the op's braces, then `<-` (two operator characters, its
        // '-' counted as a prefix in front of the brackets).
        int depth = NestingLimit.MAX_DEPTH - 3;
        int chain = NestingLimit.MAX_OPERATORS - 2;
        String meaning = "(".repeat(depth) + "y" + ")".repeat(depth) + " ^ a".repeat(chain);
        String text = "rail bplus { voltage 48 V }\nrail bias { voltage -24 V }\nrail heat { voltage 12.6 V }\n"
                + "heaters on heat { parallel 12AU7 at 12.6 V }\nrealize { latch triode_flipflop }\n"
                + "module top { in a; out y; latch y on phase 1 = a }\n"
                + "machine t { clock { phases 1; period 1 ms }; top top; inputs a; outputs y }\n"
                + "isa t {\n  word 4\n  field opcode 3..0\n  opcode opcode\n  state y = y\n  bit 0 = a\n"
                + "  op FLIP 1 { y <- " + meaning + " }\n}\n";
        Diagnostics diags = new Diagnostics();
        Elaborator e = onASmallStack(elaborator -> elaborator.elaborateText(Path.of("meaning.machine"), text), diags);
        assertThat(diags.all()).as("no diagnostics").isEmpty();
        assertThat(e).isNotNull();
        assertThat(diags.hasErrors()).isFalse();
    }

    /** Runs an elaboration on a thread with {@link #SMALL_STACK}; nothing may escape it. */
    private static Elaborator onASmallStack(java.util.function.Consumer<Elaborator> work, Diagnostics diags) {
        AtomicReference<Throwable> failure = new AtomicReference<>();
        AtomicReference<Elaborator> done = new AtomicReference<>();
        Thread t = new Thread(null, () -> {
            try {
                Elaborator e = new Elaborator(new SourceSet(), diags);
                work.accept(e);
                done.set(e);
            } catch (Throwable x) {
                failure.set(x);
            }
        }, "small stack", SMALL_STACK);
        t.start();
        try {
            t.join();
        } catch (InterruptedException x) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(x);
        }
        assertThat(failure.get()).as("nothing escapes, no stack overflow").isNull();
        return done.get();
    }
}
