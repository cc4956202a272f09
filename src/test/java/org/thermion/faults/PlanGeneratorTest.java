package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class PlanGeneratorTest {

    @Test
    void c17PlanDetectsAllTwentyTwoCollapsedFaultsInAtMostFiveSteps() {
        // Brglez & Fujiwara 1985 (c17): all 22 collapsed stuck-at faults detectable, four vectors suffice.
        FaultCircuit c = FaultCircuit.of(Bench.c17());
        FaultList faults = FaultList.of(c);
        try (FaultSimulator sim = new FaultSimulator(c, null, 2)) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            assertThat(plan.steps()).hasSizeLessThanOrEqualTo(5);
            long stuckDetected = 0;
            for (int i = 0; i < plan.faults().size(); i++) {
                if (plan.faults().get(i).kind().stuckAt()) {
                    assertThat(plan.outcome()[i]).as("%s", plan.faults().get(i)).isEqualTo(Outcome.DETECTED);
                    stuckDetected++;
                }
            }
            assertThat(stuckDetected).isEqualTo(22);
            assertThat(plan.count(Outcome.ABORTED)).isZero();
            double random = RandomSequences.median(sim, plan.faults(), plan.count(Outcome.DETECTED), 1, 400);
            System.out.println("c17 plan: " + plan.steps() + " " + plan.counts() + "; random sequences need " + random);
            assertThat((double) plan.steps().size()).isLessThanOrEqualTo(random / 2);
        }
    }

    @Test
    void demoPlanClassifiesEveryFault() {
        Machine demo = Bench.demo();
        FaultCircuit c = FaultCircuit.of(demo);
        FaultList faults = FaultList.of(c);
        try (FaultSimulator sim = new FaultSimulator(c, Bench.demoRom(demo), 2)) {
            long t0 = System.nanoTime();
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            System.out.println("demo plan: " + plan.steps().size() + " steps " + plan.counts() + " of "
                    + plan.faults().size() + " in " + (System.nanoTime() - t0) / 1e6 + " ms " + plan.steps());
            assertThat(plan.count(Outcome.DETECTED)).isGreaterThan(plan.faults().size() / 2);
            // Issue 18 item 7: every fault detected or proven, none left to the effort budget.
            assertThat(plan.count(Outcome.ABORTED)).isZero();
            // A proof must hold against any steps: long random sequences detect none of the proven faults.
            List<Fault> proven = new java.util.ArrayList<>();
            for (int i = 0; i < plan.faults().size(); i++) {
                if (plan.outcome()[i].proven()) {
                    proven.add(plan.faults().get(i));
                }
            }
            for (int seed = 1; seed <= 4; seed++) {
                List<Step> random = Step.random(new java.util.Random(seed), demo.inputs().size(), 60, 16);
                assertThat(sim.firstDetection(proven, random)).as("seed " + seed).containsOnly(-1);
            }
            double random = RandomSequences.median(sim, plan.faults(), plan.count(Outcome.DETECTED), 16, 400);
            System.out.println("demo: random sequences need " + random + " steps for the same coverage");
            assertThat((double) plan.steps().size()).isLessThanOrEqualTo(random / 2);
        }
    }
}
