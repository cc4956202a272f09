package org.thermion.tui;

import com.googlecode.lanterna.input.KeyType;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.elab.Elaborator;
import org.thermion.faults.Diagnosis;
import org.thermion.faults.FaultSimulator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

class BenchModeTest {
    private static final Path C17 = Path.of("src", "test", "resources", "org", "thermion", "faults", "c17.machine");

    private static Machine c17() {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborate(C17);
        assertThat(d.hasErrors()).isFalse();
        return m;
    }

    @Test
    void typingWhatAWorkingC17ShowsKeepsTheWorkingMachineFirstAndOneLampWrongNarrowsTheSuspects() {
        BenchSession b = new BenchSession(c17(), null);
        assertThat(b.stepCount()).isBetween(4, 5);
        // Step 1 as expected (the entry starts as the working machine's lamps).
        b.record();
        assertThat(b.ranked().get(0).looksGood()).isTrue();
        int tiedBefore = (int) b.ranked().stream().filter(s -> s.rank() == 1).count();
        // Step 2: one lamp is expected lit (c17's plan: n23); the builder sees it dark.
        int n22 = b.expected(0) == FaultSimulator.ONE ? 0 : 1;
        assertThat(b.expected(n22)).isEqualTo(FaultSimulator.ONE);
        while (b.lamp() != n22) {
            b.moveLamp(n22 > b.lamp() ? 1 : -1);
        }
        b.toggleLamp();
        assertThat(b.entry(n22)).isEqualTo((byte) 0);
        b.record();
        Diagnosis.Suspect first = b.ranked().get(0);
        assertThat(first.looksGood()).isFalse();
        assertThat(first.contradicted()).isZero();
        assertThat(b.ranked().stream().filter(s -> s.rank() == 1).flatMap(s -> b.words(s).stream()))
                .contains("lamp " + b.lampName(n22) + ": burnt-out lamp");
        assertThat(b.ranked().stream().filter(s -> s.rank() == 1).count()).isLessThanOrEqualTo(tiedBefore);
        assertThat(b.step()).isEqualTo(2);
    }

    @Test
    void whenTheLeadersCannotBeSplitTheProposedStepReachesTheNearestGroupsAsDiagnoseDoes() {
        BenchSession b = new BenchSession(c17(), null);
        // every step as expected: the working machine leads alone, and no step splits one class; the step
        // proposed tells it from the nearest groups (those one lamp away), as `diagnose --top 8` proposes
        for (int i = 0; i < b.stepCount(); i++) {
            b.record();
        }
        assertThat(b.ranked().get(0).looksGood()).isTrue();
        assertThat(b.leadingCount()).isEqualTo(1);
        assertThat(b.nextStep()).isNotNull();
        assertThat(b.nextWidened()).isTrue();
        assertThat(b.nextSplits()).isBetween(2, BenchSession.WIDEST);
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void goldenScreenOfTheBenchOnTheDemoAfterOneStepWithTheAlarmLampDark() throws IOException {
        UiFixture ui = new UiFixture(100, 30);
        ui.type("d");
        ui.ui.bench().await();
        ui.press(KeyType.ArrowDown).type(" ").press(KeyType.Enter);
        assertThat(ui.text()).contains("step 2 of").contains("suspects after 1 step");
        ui.assertGolden("bench-100x30.txt");
    }
}
