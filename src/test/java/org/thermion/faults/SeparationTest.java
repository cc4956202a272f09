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
    void theDemosGroupsShrinkWithEveryProgramThePlanFitsAndWhatIsLeftSaysWhetherAWholeRandomRomSplitsIt()
            throws Exception {
        Machine demo = Bench.demo();
        FaultCircuit c = FaultCircuit.of(demo);
        FaultList faults = FaultList.of(c, SocketPins.of(demo));
        long[] everyOp = Bench.rom(demo, java.nio.file.Files.readString(Path.of("programs", "every-op.asm")));
        try (FaultSimulator sim = FaultSimulator.running(c, List.of(Bench.demoRom(demo), everyOp), 2)) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            Separation sep = Separation.of(sim, faults, plan.steps(), 3, Effort.DEFAULT);
            List<Step> steps = sep.steps();
            try (FaultSimulator all = sim.withPrograms(sep.written())) {
                // The named second program is fitted first, each written one after it, each from power-up.
                List<Integer> restarts = new java.util.ArrayList<>();
                for (int i = 0; i < steps.size(); i++) {
                    if (steps.get(i).restarts()) {
                        assertThat(steps.get(i).program()).isEqualTo(restarts.size() + 1);
                        restarts.add(i);
                    }
                }
                assertThat(restarts).hasSize(1 + sep.written().size());
                assertThat(all.programs()).isEqualTo(2 + sep.written().size());
                // Every further program splits some group the ones before it left.
                restarts.add(steps.size());
                int before = new Diagnosis(all, faults, steps.subList(0, restarts.get(0))).classesAbove(3);
                for (int k = 1; k < restarts.size(); k++) {
                    int after = new Diagnosis(all, faults, steps.subList(0, restarts.get(k))).classesAbove(3);
                    assertThat(after).as("groups above three after program %d", k + 1).isLessThan(before);
                    before = after;
                }
                Diagnosis d = new Diagnosis(all, faults, steps);
                assertThat(sep.alike()).hasSize(d.classesAbove(3));
                // Each group left says whether a whole ROM of random words splits it (the written programs
                // are 16 words): on this demo most are alike under every program tried, not all.
                long splitByWholeRom = 0;
                for (Separation.Alike a : sep.alike()) {
                    assertThat(a.faults()).hasSizeGreaterThan(3);
                    assertThat(a.otherProgram()).isNotNull();
                    splitByWholeRom += Boolean.TRUE.equals(a.otherProgram()) ? 1 : 0;
                }
                assertThat(splitByWholeRom).isLessThan(sep.alike().size());
                // A written program is short: random words first, zeros after.
                for (long[] w : sep.written()) {
                    assertThat(w.length).isLessThanOrEqualTo(Separation.WRITTEN_WORDS);
                    assertThat(java.util.Arrays.stream(w).anyMatch(x -> x != 0L)).isTrue();
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
