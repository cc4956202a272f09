package org.thermion.circuit;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.model.StageType;

class MachineCircuitsTest {
    @Test
    void everyLogicStageOfTheDemoHasACircuitThatSolvesAtItsRails() throws Exception {
        Machine m = elaborate(Path.of("examples/pumpstation/pumpstation.machine"));
        MachineCircuits mc = MachineCircuits.of(m);
        for (StageType t : m.stages()) {
            mc.circuit(t).ifPresent(c -> {
                DcResult r = mc.solver().solve(c, new double[c.inputs()], false, java.util.List.of(), Corner.NOMINAL);
                assertThat(r).as(t.name()).isInstanceOf(OperatingPoint.class);
            });
        }
        assertThat(m.stages().stream().filter(t -> mc.circuit(t).isPresent())).isNotEmpty();
    }

    private static Machine elaborate(Path path) {
        Diagnostics diags = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), diags).elaborate(path);
        assertThat(diags.hasErrors()).as("errors in " + path).isFalse();
        return m;
    }
}
