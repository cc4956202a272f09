package org.thermion.asm;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.lang.Diagnostics;
import org.thermion.model.Machine;

import java.nio.file.Path;
import java.util.function.BiFunction;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * programs/pump.asm against the hysteresis rule of the task, written out as a truth table:
 * the pump starts when the low switch is dry and runs until the high switch is wet; manual
 * forces it on; the alarm lights while high is wet and low is dry. With both switches
 * disagreeing the stop wins (documented in pump.asm). One pass of the loop is 10 cycles.
 */
class PumpProgramTest {
    static final int PASS = 10;
    static Machine m;
    static long[] rom;

    /** run before, low_sw, high_sw, manual  ->  run after, pump, alarm (1 = wet / on). */
    static final int[][] TABLE = {
            {0, 0, 0, 0, 1, 1, 0}, // tank low: start
            {0, 0, 0, 1, 1, 1, 0},
            {0, 0, 1, 0, 0, 0, 1}, // switches disagree: no automatic run, alarm
            {0, 0, 1, 1, 0, 1, 1}, // ... the hand switch still runs the pump
            {0, 1, 0, 0, 0, 0, 0}, // level between the switches, idle: stay off
            {0, 1, 0, 1, 0, 1, 0},
            {0, 1, 1, 0, 0, 0, 0}, // full
            {0, 1, 1, 1, 0, 1, 0},
            {1, 0, 0, 0, 1, 1, 0}, // low, running: keep running
            {1, 0, 0, 1, 1, 1, 0},
            {1, 0, 1, 0, 0, 0, 1}, // disagree while running: stop, alarm
            {1, 0, 1, 1, 0, 1, 1},
            {1, 1, 0, 0, 1, 1, 0}, // filling between the switches: hysteresis keeps it on
            {1, 1, 0, 1, 1, 1, 0},
            {1, 1, 1, 0, 0, 0, 0}, // high switch wet: stop
            {1, 1, 1, 1, 0, 1, 0},
    };

    @BeforeAll
    static void assemble() {
        m = DemoMachine.load();
        rom = Assembler.assemble(m, Path.of("programs", "pump.asm"), new Diagnostics()).words();
    }

    static void inputs(RunLevel l, int low, int high, int manual) {
        l.input("low_sw", low == 1);
        l.input("high_sw", high == 1);
        l.input("manual", manual == 1);
    }

    static void checkTable(BiFunction<Machine, long[], RunLevel> make) {
        for (int[] row : TABLE) {
            RunLevel l = make.apply(m, rom);
            // Bring the run request to the row's starting value: empty tank sets it, full clears it.
            if (row[0] == 1) {
                inputs(l, 0, 0, 0);
            } else {
                inputs(l, 1, 1, 0);
            }
            l.steps(2 * PASS);
            assertThat(l.stateBit("s0")).isEqualTo(row[0] == 1);
            inputs(l, row[1], row[2], row[3]);
            l.steps(PASS);
            String r = java.util.Arrays.toString(row);
            assertThat(l.stateBit("s0")).as("run after %s", r).isEqualTo(row[4] == 1);
            assertThat(l.output("pump")).as("pump %s", r).isEqualTo(row[5] == 1);
            assertThat(l.output("alarm")).as("alarm %s", r).isEqualTo(row[6] == 1);
        }
    }

    @Test
    void followsTheTruthTableAtTheIsaLevel() {
        checkTable(RunLevel.Isa::new);
    }

    @Test
    void followsTheTruthTableAtTheLogicLevel() {
        checkTable(RunLevel.Logic::new);
    }

    /**
     * A tank of 0..100 units: the pump adds 3 a pass, the town draws 1; the low switch is wet
     * above 20, the high one above 80. The level must swing between the switches, and both
     * levels must switch the outputs on the same cycles.
     */
    static RunLevel tank(RunLevel l) {
        int level = 50;
        int min = 100, max = 0, starts = 0;
        boolean wasOn = false;
        for (int pass = 0; pass < 400; pass++) {
            inputs(l, level > 20 ? 1 : 0, level > 80 ? 1 : 0, 0);
            l.steps(PASS);
            boolean on = l.output("pump");
            if (on && !wasOn) {
                starts++;
            }
            wasOn = on;
            level = Math.max(0, Math.min(100, level + (on ? 3 : 0) - 1));
            min = Math.min(min, level);
            max = Math.max(max, level);
            assertThat(l.output("alarm")).isFalse();
        }
        assertThat(min).isBetween(17, 20);
        assertThat(max).isBetween(81, 84);
        assertThat(starts).isGreaterThan(3);
        return l;
    }

    @Test
    @Timeout(20)
    void tankSwingsBetweenTheSwitchesWithTheSameOutputChangesOnBothLevels() {
        RunLevel ref = tank(new RunLevel.Isa(m, rom));
        RunLevel logic = tank(new RunLevel.Logic(m, rom));
        assertThat(logic.changes).containsExactlyElementsOf(ref.changes);
        assertThat(ref.changes).hasSizeGreaterThan(6);
    }
}
