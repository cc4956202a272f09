package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

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
            double random = RandomSequences.median(sim, plan.faults(), plan.count(Outcome.DETECTED), 16, 400);
            System.out.println("demo: random sequences need " + random + " steps for the same coverage");
            assertThat((double) plan.steps().size()).isLessThanOrEqualTo(random / 2);
        }
    }
}
