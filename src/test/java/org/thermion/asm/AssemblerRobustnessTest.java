package org.thermion.asm;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.lang.Diagnostic;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Seeded random edits of the bundled programs (characters deleted, duplicated or replaced,
 * lines swapped): the assembler must never throw, must return an image exactly when it
 * reports no error, and every error must point at a line of the file.
 */
class AssemblerRobustnessTest {
    static final String ALPHABET = "abcLDSTJMPNOR_0123456789xb:;.=+-*/() \t\n@,";

    @Test
    @Timeout(60)
    void mutantsGiveDiagnosticsNeverExceptions() throws IOException {
        Machine m = DemoMachine.load();
        SplittableRandom rng = new SplittableRandom(7);
        int withErrors = 0;
        for (String name : new String[] {"pump.asm", "serial-add.asm", "every-op.asm"}) {
            String original = Files.readString(Path.of("programs", name));
            for (int k = 0; k < 250; k++) {
                String text = mutate(original, rng);
                Diagnostics d = new Diagnostics();
                Assembly a = Assembler.assembleText(m, Path.of("mutant.asm"), text, new SourceSet(), d);
                assertThat(a == null).as("image exactly when no error:\n%s", text).isEqualTo(d.hasErrors());
                int lines = (int) text.lines().count();
                for (Diagnostic x : d.all()) {
                    assertThat(x.span().line()).as("%s\n%s", x.message(), text).isBetween(1, Math.max(1, lines));
                }
                if (d.hasErrors()) {
                    withErrors++;
                }
            }
        }
        // About half the edits land in comments and change nothing (577 of 1200 broke the program in a run of 400 a program).
        assertThat(withErrors).as("the mutations do break programs").isGreaterThan(250);
    }

    static String mutate(String s, SplittableRandom rng) {
        StringBuilder b = new StringBuilder(s);
        int edits = 1 + rng.nextInt(4);
        for (int e = 0; e < edits && b.length() > 1; e++) {
            int at = rng.nextInt(b.length());
            switch (rng.nextInt(4)) {
                case 0 -> b.deleteCharAt(at);
                case 1 -> b.insert(at, b.charAt(at));
                case 2 -> b.setCharAt(at, ALPHABET.charAt(rng.nextInt(ALPHABET.length())));
                default -> {
                    int end = Math.min(b.length(), at + 1 + rng.nextInt(12));
                    String cut = b.substring(at, end);
                    b.delete(at, end);
                    b.insert(rng.nextInt(b.length() + 1), cut);
                }
            }
        }
        return b.toString();
    }
}
