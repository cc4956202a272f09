package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class SeparationTest {

    @Test
    void theBringUpPanelsGroupsAboveThreeAreProvenAlikeAndEachGetsALampThatSplitsIt() {
        Machine m = Bench.load(Path.of("examples", "bringup-panel", "bringup-panel.machine"));
        FaultCircuit c = FaultCircuit.of(m);
        FaultList faults = FaultList.of(c, SocketPins.of(m));
        try (FaultSimulator sim = new FaultSimulator(c, null, 2)) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            Separation sep = Separation.of(sim, faults, plan.steps(), 3, Effort.DEFAULT);
            Diagnosis d = new Diagnosis(sim, faults, sep.steps());
            // Every group the steps leave above three is reported, with its reason.
            assertThat(sep.alike()).hasSize(d.classesAbove(3));
            for (Separation.Alike a : sep.alike()) {
                assertThat(a.faults()).hasSizeGreaterThan(3);
                // Switch-fed: the switches are every input there is, so the search proves it.
                assertThat(a.proven()).isTrue();
                assertThat(a.otherProgram()).isNull();
                assertThat(a.net()).isNotNull();
                assertThat(a.parts()).hasSizeGreaterThanOrEqualTo(2);
                assertThat(a.parts().stream().mapToInt(Integer::intValue).sum()).isEqualTo(a.faults().size());
                // Proven alike: every later run of cycles shows each pair the same lamps (one sample run).
                List<Step> longer = new java.util.ArrayList<>(sep.steps());
                longer.addAll(Step.random(new java.util.Random(5), c.inputCount(), 6, 3));
                byte[][] r = sim.responses(a.faults(), longer);
                for (byte[] row : r) {
                    assertThat(row).isEqualTo(r[0]);
                }
            }
        }
    }

    @Test
    void aPairOfFaultsThePlanLeavesTogetherIsToldApartByTheSearchWhenSomeRunCan() {
        // c17's lamps n22 and n23: n22 stuck-at-0 and n23 stuck-at-0 look alike while both lamps are dark
        // (the last step of its plan) and a search from there finds the cycle that tells them apart.
        Machine m = Bench.c17();
        FaultCircuit c = FaultCircuit.of(m);
        FaultList faults = FaultList.of(c);
        try (FaultSimulator sim = new FaultSimulator(c, null, 1)) {
            Fault a = faults.all().stream().filter(f -> f.kind() == FaultKind.STUCK_AT_0
                    && m.netlist().netName(c.sites().get(f.subject()).net()).equals("n22")
                    && c.sites().get(f.subject()).place().stem()).findFirst().orElseThrow();
            Fault b = faults.all().stream().filter(f -> f.kind() == FaultKind.STUCK_AT_0
                    && m.netlist().netName(c.sites().get(f.subject()).net()).equals("n23")
                    && c.sites().get(f.subject()).place().stem()).findFirst().orElseThrow();
            StateSearch s = new StateSearch(sim, PlanGenerator.everySetting(5), true, 100);
            StateSearch.Result r = s.tellApart(a, sim.loaded(List.of(a), 0, 1), b, sim.loaded(List.of(b), 0, 1));
            assertThat(r.end()).isEqualTo(StateSearch.End.FOUND);
            List<Step> steps = PlanGenerator.merge(r.cycles());
            byte[][] resp = sim.responses(List.of(a, b), steps);
            assertThat(resp[0]).isNotEqualTo(resp[1]);
            // A fault against itself: nothing ever tells it apart, and the search proves so.
            assertThat(s.tellApart(a, sim.loaded(List.of(a), 0, 1), a, sim.loaded(List.of(a), 0, 1)).end())
                    .isEqualTo(StateSearch.End.EXHAUSTED);
        }
    }
}
