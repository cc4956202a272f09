package org.thermion.synth;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostic;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class SyntheticMachineTest {

    static Machine elaborate(SyntheticMachine sm) {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborateText(Path.of(sm.name() + ".machine"), sm.text());
        assertThat(d.all()).as("diagnostics").extracting(Diagnostic::toString).isEmpty();
        assertThat(m).isNotNull();
        return m;
    }

    @ParameterizedTest
    @ValueSource(ints = {1000, 1234, 10_000})
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void elaboratesCleanlyToTheExactSize(int size) {
        SyntheticMachine sm = SyntheticMachine.ofSize(size);
        Machine m = elaborate(sm);
        assertThat(sm.stageInstances()).isEqualTo(size);
        assertThat(m.stageInstanceCount()).isEqualTo(size);
        assertThat(m.rom().dataNets()).hasSize(12);
        assertThat(m.inputs()).hasSize(6);
        assertThat(m.outputs()).hasSize(4);
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void hundredThousandStagesElaborate() {
        // The only 10^5 elaboration in the unit tests.
        SyntheticMachine sm = SyntheticMachine.ofSize(100_000);
        Machine m = elaborate(sm);
        assertThat((double) m.stageInstanceCount()).isCloseTo(100_000, org.assertj.core.data.Percentage.withPercentage(3));
        assertThat(m.stageInstanceCount()).isEqualTo(sm.stageInstances());
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void structureHasBothPhasesAndBoundedFanInAndFanOut() {
        Machine m = elaborate(SyntheticMachine.ofSize(5000));
        boolean phase1 = false, phase2 = false;
        for (Latch l : m.netlist().latches()) {
            phase1 |= l.phase() == 1;
            phase2 |= l.phase() == 2;
        }
        assertThat(phase1).isTrue();
        assertThat(phase2).isTrue();
        int[] fanOut = new int[m.netlist().netCount()];
        int maxIn = 0;
        for (Gate g : m.netlist().gates()) {
            maxIn = Math.max(maxIn, g.inputs().length);
            for (int in : g.inputs()) {
                fanOut[in]++;
            }
        }
        for (Latch l : m.netlist().latches()) {
            fanOut[l.data()]++;
            if (l.enable() >= 0) {
                fanOut[l.enable()]++;
            }
        }
        int maxOut = 0;
        for (int n = 2; n < fanOut.length; n++) {
            maxOut = Math.max(maxOut, fanOut[n]);
        }
        // Fan-in is the library's widest stage (diode AND, 4); fan-out stays within the
        // buffer tree's design: 8 children, up to 3 uses of a control line per slice.
        assertThat(maxIn).isLessThanOrEqualTo(4);
        int worst = 2;
        for (int n = 2; n < fanOut.length; n++) {
            if (fanOut[n] > fanOut[worst]) {
                worst = n;
            }
        }
        assertThat(maxOut).as(m.netlist().netName(worst)).isLessThanOrEqualTo(32);
    }

    @Test
    void refusesSizesOutOfRange() {
        assertThatThrownBy(() -> SyntheticMachine.ofSize(10)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("at least");
    }
}
