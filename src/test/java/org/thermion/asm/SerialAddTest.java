package org.thermion.asm;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.lang.Diagnostics;
import org.thermion.model.Machine;

import java.nio.file.Path;
import java.util.SplittableRandom;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * programs/serial-add.asm driven through its documented handshake for all 256 pairs of 4-bit
 * numbers in one run, each result checked against Java's integer addition. The presenter waits
 * a seeded-random 0..3 cycles before each of its moves, puts noise on in_a and in_b outside the
 * data window and on the fifth pulse (where the program ignores them).
 */
class SerialAddTest {
    static Machine m;
    static long[] rom;

    @BeforeAll
    static void assemble() {
        m = DemoMachine.load();
        Diagnostics d = new Diagnostics();
        rom = Assembler.assemble(m, Path.of("programs", "serial-add.asm"), d).words();
    }

    /** Runs the protocol on a level; returns it with its recorded output changes. */
    static RunLevel present(RunLevel l) {
        SplittableRandom rng = new SplittableRandom(42);
        for (int a = 0; a < 16; a++) {
            for (int b = 0; b < 16; b++) {
                int sum = 0;
                for (int pulse = 0; pulse < 5; pulse++) {
                    waitFor(l, "ready", true, rng);
                    boolean data = pulse < 4;
                    l.input("in_a", data ? (a >> pulse & 1) == 1 : rng.nextBoolean());
                    l.input("in_b", data ? (b >> pulse & 1) == 1 : rng.nextBoolean());
                    pause(l, rng);
                    l.input("strobe", true);
                    waitFor(l, "ready", false, rng);
                    if (l.output("sum")) {
                        sum |= 1 << pulse;
                    }
                    l.input("strobe", false);
                    l.input("in_a", rng.nextBoolean());
                    l.input("in_b", rng.nextBoolean());
                }
                assertThat(sum).as("%d + %d", a, b).isEqualTo(a + b);
            }
        }
        return l;
    }

    private static void waitFor(RunLevel l, String output, boolean value, SplittableRandom rng) {
        long start = l.cycle();
        while (l.output(output) != value) {
            l.step();
            assertThat(l.cycle() - start).as("waiting for %s = %s", output, value).isLessThan(200);
        }
        pause(l, rng);
    }

    private static void pause(RunLevel l, SplittableRandom rng) {
        l.steps(rng.nextInt(4));
    }

    @Test
    @Timeout(10)
    void addsAllPairsAtTheIsaLevel() {
        RunLevel l = present(new RunLevel.Isa(m, rom));
        assertThat(l.changes).isNotEmpty();
    }

    @Test
    @Timeout(30)
    void logicLevelMakesTheSameOutputChangesOnTheSameCycles() {
        RunLevel ref = present(new RunLevel.Isa(m, rom));
        RunLevel logic = present(new RunLevel.Logic(m, rom));
        assertThat(logic.changes).containsExactlyElementsOf(ref.changes);
    }
}
