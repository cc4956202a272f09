package org.thermion.lang;

import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/** The pre-scan that keeps pathological nesting away from the recursive parser. */
class NestingLimitTest {
    private static final Path FILE = Path.of("deep.machine");

    @Test
    void sixThousandParenthesesAreOneErrorAtTheFirstBracketPastTheLimit() {
        String text = "module m {\n  y = " + "(".repeat(6000) + "a" + ")".repeat(6000) + "\n}\n";
        Diagnostics diags = new Diagnostics();
        SourceFileCheck.assertNoStackOverflow(() -> MachineReader.parse(FILE, text, diags));
        assertThat(diags.errorCount()).isEqualTo(1);
        Diagnostic d = diags.all().get(0);
        assertThat(d.message()).isEqualTo("nesting deeper than 100 levels");
        // The module's brace is level 1, so the 100th '(' (column 106) is level 101.
        assertThat(d.span().line()).isEqualTo(2);
        assertThat(d.span().col()).isEqualTo(6 + NestingLimit.MAX_DEPTH);
    }

    @Test
    void aDepthAtTheLimitIsAccepted() {
        String text = "module m {\n  y = " + "(".repeat(NestingLimit.MAX_DEPTH - 1) + "a" + ")".repeat(NestingLimit.MAX_DEPTH - 1) + "\n}\n";
        Diagnostics diags = new Diagnostics();
        assertThat(NestingLimit.scan(FILE, text, '#', true, false, diags)).isEmpty();
        MachineReader.parse(FILE, text, diags);
        assertThat(diags.hasErrors()).isFalse();
    }

    @Test
    void prefixOperatorsCountAsNesting() {
        Diagnostics diags = new Diagnostics();
        Set<Integer> bad = NestingLimit.scan(FILE, "y = " + "!".repeat(200) + "a\n", '#', true, false, diags);
        assertThat(bad).containsExactly(1);
    }

    @Test
    void bracketsInCommentsAndStringsDoNotCount() {
        Diagnostics diags = new Diagnostics();
        String text = "# " + "(".repeat(500) + "\ninclude \"" + "[".repeat(500) + "\"\n";
        assertThat(NestingLimit.scan(FILE, text, '#', true, false, diags)).isEmpty();
    }

    @Test
    void tooManyOperatorsOnOneLineAreReported() {
        Diagnostics diags = new Diagnostics();
        String text = "y = a" + " | a".repeat(NestingLimit.MAX_OPERATORS + 5) + "\n";
        assertThat(NestingLimit.scan(FILE, text, '#', true, false, diags)).containsExactly(1);
        assertThat(diags.all().get(0).message()).isEqualTo("more than 1000 operators on one line");
    }

    @Test
    void aProgramLineTooDeepIsDroppedAndTheOthersAreRead() {
        Diagnostics diags = new Diagnostics();
        String text = "start: NOP\n.const X = " + "(".repeat(6000) + "1" + ")".repeat(6000) + "\nJMP start\n";
        var src = ProgramReader.parse(Path.of("p.asm"), text, diags);
        assertThat(diags.errorCount()).isEqualTo(1);
        assertThat(diags.all().get(0).span().line()).isEqualTo(2);
        assertThat(src.lines().get(0).statement()).isNotNull();
        assertThat(src.lines().get(1).statement()).isNull();
        assertThat(src.lines().get(2).statement()).isNotNull();
    }

    /** Runs a parse and turns a stack overflow into a plain test failure with a reason. */
    static final class SourceFileCheck {
        static void assertNoStackOverflow(Runnable r) {
            try {
                r.run();
            } catch (StackOverflowError e) {
                throw new AssertionError("the parser recursed past the stack: the pre-scan let the text through", e);
            }
        }
    }
}
