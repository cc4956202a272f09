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
}
