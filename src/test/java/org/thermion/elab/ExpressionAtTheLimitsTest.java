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
    void aLineAtTheOperatorAndNestingLimitsElaboratesOnASmallStack() throws Exception {
        int depth = NestingLimit.MAX_DEPTH - 2; // the module's brace is one level
        int chain = NestingLimit.MAX_OPERATORS - depth;
        String expr = "(".repeat(depth) + "a" + ")".repeat(depth) + " | b".repeat(chain);
        String text = "rail bplus { voltage 48 V }\nrail bias { voltage -24 V }\n"
                + "realize { not pentode_inverter; and diode_and; or diode_or; latch triode_flipflop }\n"
                + "module wide {\n  in a, b\n  out y\n  y = " + expr + "\n}\n";
        Diagnostics diags = new Diagnostics();
        AtomicReference<Throwable> failure = new AtomicReference<>();
        AtomicReference<Elaborator> done = new AtomicReference<>();
        Thread t = new Thread(null, () -> {
            try {
                Elaborator e = new Elaborator(new SourceSet(), diags);
                e.elaborateText(Path.of("wide.machine"), text);
                done.set(e);
            } catch (Throwable x) {
                failure.set(x);
            }
        }, "small stack", SMALL_STACK);
        t.start();
        t.join();
        assertThat(failure.get()).as("nothing escapes, no stack overflow").isNull();
        assertThat(diags.all()).as("no diagnostics").isEmpty();
        assertThat(done.get().modulesAlone()).hasSize(1);
    }
}
