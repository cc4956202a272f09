package org.thermion.asm;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** Long chains of constants: values kept once known, chains bounded when they run backwards. */
class ConstantChainTest {
    private static Assembly assemble(String text, Diagnostics d) {
        Machine m = DemoMachine.load();
        return Assembler.assembleText(m, Path.of("chain.asm"), text, new SourceSet(), d);
    }

    @Test
    @Timeout(20)
    void eachConstantUsingThePreviousTwiceIsEvaluatedOnce() {
        // C_k = C_(k-1) + C_(k-1) with C_0 = 1 gives C_k = 2^k; without memoising, C_40 takes 2^40 steps.
        StringBuilder b = new StringBuilder(".const C0 = 1\n");
        for (int k = 1; k <= 40; k++) {
            b.append(".const C").append(k).append(" = C").append(k - 1).append(" + C").append(k - 1).append('\n');
        }
        b.append(".const W = C40 / C39 + C6\n.word W\n");
        Diagnostics d = new Diagnostics();
        Assembly a = assemble(b.toString(), d);
        assertThat(d.hasErrors()).as("%s", d.all()).isFalse();
        assertThat(a.words()[0]).isEqualTo(2 + 64);
    }

    @Test
    void aLongChainDefinedTopDownStaysShallow() {
        StringBuilder b = new StringBuilder(".const C0 = 1\n");
        for (int k = 1; k <= 5000; k++) {
            b.append(".const C").append(k).append(" = C").append(k - 1).append(" + 1\n");
        }
        b.append(".word C5000 - 4990\n");
        Diagnostics d = new Diagnostics();
        Assembly a = assemble(b.toString(), d);
        assertThat(d.hasErrors()).as("%s", d.all()).isFalse();
        assertThat(a.words()[0]).isEqualTo(11);
    }

    @Test
    void aLongChainDefinedBottomUpIsReportedNotOverflowed() {
        StringBuilder b = new StringBuilder(".word C0\n");
        for (int k = 0; k < 5000; k++) {
            b.append(".const C").append(k).append(" = C").append(k + 1).append(" + 1\n");
        }
        b.append(".const C5000 = 1\n");
        Diagnostics d = new Diagnostics();
        assertThat(assemble(b.toString(), d)).isNull();
        assertThat(d.all().get(0).message()).isEqualTo("constants refer to each other more than 200 deep");
    }

    @Test
    void aChainAtTheDepthLimitOfLongLinesAssemblesOnASmallStack() throws Exception {
        // 200 constants, each the next one plus 900 ones: at the depth limit and near the reader's
        // 1000 operators per line; settled with an explicit stack, so a quarter of the usual 1 MiB does.
        int depth = Symbols.MAX_CONST_DEPTH;
        int ones = 900;
        StringBuilder b = new StringBuilder();
        long expected = 1L + (long) (depth - 1) * ones;
        b.append(".word C0 - ").append(expected - 1).append('\n');
        for (int k = 0; k < depth - 1; k++) {
            b.append(".const C").append(k).append(" = C").append(k + 1).append(" + 1".repeat(ones)).append('\n');
        }
        b.append(".const C").append(depth - 1).append(" = 1\n");
        Diagnostics d = new Diagnostics();
        java.util.concurrent.atomic.AtomicReference<Object> result = new java.util.concurrent.atomic.AtomicReference<>();
        Thread t = new Thread(null, () -> {
            try {
                result.set(assemble(b.toString(), d));
            } catch (Throwable x) {
                result.set(x);
            }
        }, "small stack", 256 * 1024);
        t.start();
        t.join();
        assertThat(result.get()).as("%s", d.all()).isInstanceOf(Assembly.class);
        assertThat(((Assembly) result.get()).words()[0]).isEqualTo(1);
    }
}
