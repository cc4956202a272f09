package org.thermion.tui;

import org.junit.jupiter.api.Test;

import java.io.IOException;

import static org.assertj.core.api.Assertions.assertThat;

/** Running at the machine's own clock: cycles due are elapsed time over the clock period. */
class PaceTest {
    private static final long MS = 1_000_000L;

    @Test
    void cyclesDueAreTheElapsedTimeOverThePeriod() {
        // The demo's clock: period 100 us (examples/pumpstation/pumpstation.machine), so 10 cycles a millisecond.
        Pace p = new Pace(100e-6);
        assertThat(p.due(0)).as("nothing is due at the first look").isZero();
        assertThat(p.due(50 * MS)).isEqualTo(500);
        p.ran(500);
        assertThat(p.due(50 * MS + 150_000L)).as("a cycle and a half: one due, the half carried").isEqualTo(1);
        p.ran(1);
        assertThat(p.due(50 * MS + 200_000L)).isEqualTo(1);
    }

    @Test
    void arrearsAreCappedSoAPauseDoesNotEndInABurst() {
        Pace p = new Pace(100e-6);
        p.due(0);
        // Ten seconds without a look: only a tenth of a second (1,000 cycles) is owed.
        assertThat(p.due(10_000 * MS)).isEqualTo(1_000);
        p.restart();
        assertThat(p.due(20_000 * MS)).isZero();
    }

    @Test
    void tSwitchesBetweenMachineSpeedAndFlatOutAndTheStatusSaysWhich() throws IOException {
        UiFixture f = new UiFixture(120, 40).type("t");
        assertThat(f.ui.view().machineSpeed).isTrue();
        assertThat(f.status()).contains("machine's own clock");
        f.type(" ");
        assertThat(f.status()).contains("running at machine speed");
        // The first frame of a paced run only starts the clock: no cycle is due yet.
        assertThat(f.ui.runFor(5 * MS)).isZero();
        f.type("t");
        assertThat(f.ui.view().machineSpeed).isFalse();
        assertThat(f.ui.runFor(5 * MS)).isPositive();
        assertThat(f.status()).doesNotContain("machine speed");
    }

    @Test
    void speedRatiosReadAsMultiplesOfTheRealMachine() {
        assertThat(StatusLines.times(1.0)).isEqualTo("1.00\u00D7");
        assertThat(StatusLines.times(15.9066)).isEqualTo("16\u00D7");
    }
}
