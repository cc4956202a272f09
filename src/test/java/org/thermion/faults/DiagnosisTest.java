package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class DiagnosisTest {

    /** Seeds every detected fault, observes what the plan predicts for it, and expects its class alone at rank 1. */
    private static void ranksSeededClassFirst(Diagnosis d, FaultList faults) {
        int seeded = 0;
        for (Diagnosis.Suspect cls : d.classes()) {
            if (cls.looksGood()) {
                continue;
            }
            Fault f = cls.members().get(0);
            List<Diagnosis.Suspect> ranked = d.rank(d.predicted(f.id()));
            assertThat(ranked.get(0).members()).as("seeded %s", f).contains(f);
            assertThat(ranked.get(0).rank()).isEqualTo(1);
            assertThat(ranked.get(1).rank()).as("seeded %s: next class", f).isGreaterThan(1);
            seeded++;
        }
        assertThat(seeded).isPositive();
    }

    @Test
    void c17ExtendedPlanLeavesNoClassAboveThreeAndRanksEverySeededFaultFirst() {
        FaultCircuit c = FaultCircuit.of(Bench.c17());
        FaultList faults = FaultList.of(c, SocketPins.of(Bench.c17()));
        try (FaultSimulator sim = new FaultSimulator(c, null, 2)) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            List<Step> longer = Diagnosis.extend(sim, faults, plan.steps(), 3, Effort.DEFAULT);
            Diagnosis d = new Diagnosis(sim, faults, longer);
            System.out.println("c17 diagnosis: " + longer.size() + " steps, largest class " + d.largestClass()
                    + ", classes " + d.classes().size());
            ranksSeededClassFirst(d, faults);
        }
    }

    @Test
    void demoDiagnosisRanksEverySeededDetectableFaultFirst() {
        Machine demo = Bench.demo();
        FaultCircuit c = FaultCircuit.of(demo);
        FaultList faults = FaultList.of(c, SocketPins.of(demo)); // solder bridges seeded too
        try (FaultSimulator sim = new FaultSimulator(c, Bench.demoRom(demo), 2)) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            long t0 = System.nanoTime();
            List<Step> longer = Diagnosis.extend(sim, faults, plan.steps(), 3, Effort.DEFAULT);
            Diagnosis d = new Diagnosis(sim, faults, longer);
            System.out.println("demo diagnosis: " + plan.steps().size() + " -> " + longer.size() + " steps, largest class "
                    + d.largestClass() + ", classes " + d.classes().size() + " in " + (System.nanoTime() - t0) / 1e6 + " ms");
            ranksSeededClassFirst(d, faults);
        }
    }

    @Test
    void twoStuckWiresAtOnceOnC17AlwaysGetANextStepThatSplitsTheCandidates() {
        // Every pair of c17's stuck-at faults seeded together (the reference simulator forcing both): no
        // single fault explains most of them, yet the builder is always told what to set next.
        FaultCircuit c = FaultCircuit.of(Bench.c17());
        FaultList faults = FaultList.of(c, SocketPins.of(Bench.c17()));
        OneFaultSimulator ref = new OneFaultSimulator(c, null);
        try (FaultSimulator sim = new FaultSimulator(c, null, 1)) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            Diagnosis d = new Diagnosis(sim, faults, plan.steps());
            List<Fault> stuck = faults.all().stream()
                    .filter(f -> f.kind() == FaultKind.STUCK_AT_0 || f.kind() == FaultKind.STUCK_AT_1).toList();
            int lamps = c.lamps().size();
            int seeded = 0;
            int silentFirst = 0;
            for (int i = 0; i < stuck.size(); i++) {
                for (int j = i + 1; j < stuck.size(); j++) {
                    List<Force> both = new java.util.ArrayList<>(stuck.get(i).forces());
                    both.addAll(stuck.get(j).forces());
                    byte[] r = ref.run(new Fault(-1, FaultKind.STUCK_AT_0, 0, both), plan.steps());
                    byte[][] seen = new byte[plan.steps().size()][lamps];
                    for (int k = 0; k < r.length; k++) {
                        seen[k / lamps][k % lamps] = r[k] == FaultSimulator.UNKNOWN ? Diagnosis.BLANK : r[k];
                    }
                    List<Diagnosis.Suspect> ranked = d.rank(seen);
                    if (ranked.get(0).looksGood() && ranked.get(0).contradicted() == 0) {
                        continue; // the pair masks itself along the plan
                    }
                    seeded++;
                    // A class that predicts none of the lamps seen is never nearer than one that predicts some.
                    Diagnosis.Suspect first = ranked.get(0);
                    silentFirst += first.unpredicted() > 0 && first.contradicted() == 0 ? 1 : 0;
                    Diagnosis.Proposal p = d.propose(ranked, 8, Effort.DEFAULT);
                    assertThat(p.step()).as("%s with %s: next step", stuck.get(i), stuck.get(j)).isNotNull();
                    assertThat(d.readings(p.candidates(), p.step())).as("the step splits its candidates").hasSizeGreaterThan(1);
                }
            }
            assertThat(seeded).isPositive();
            System.out.println("c17 two faults: " + seeded + " pairs seen, " + silentFirst + " led by a class that cannot predict a lamp");
        }
    }

    @Test
    void aStuckLampWithHalfTheObservationsMissingStillRanksFirstAndTheNextStepSplitsTheTies() {
        FaultCircuit c = FaultCircuit.of(Bench.c17());
        FaultList faults = FaultList.of(c);
        try (FaultSimulator sim = new FaultSimulator(c, null, 1)) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            Diagnosis d = new Diagnosis(sim, faults, plan.steps());
            // Net 22 stuck at 1: its lamp always lit. Only the first two steps were looked at.
            Fault lit = faults.all().stream().filter(f -> f.kind() == FaultKind.STUCK_AT_1)
                    .filter(f -> c.sites().get(f.subject()).place() == Site.Place.GATE_OUT)
                    .filter(f -> c.machine().netlist().netName(f.subject()).equals("n22")).findFirst().orElseThrow();
            byte[][] seen = d.predicted(lit.id());
            for (int s = 2; s < seen.length; s++) {
                java.util.Arrays.fill(seen[s], Diagnosis.BLANK);
            }
            List<Diagnosis.Suspect> ranked = d.rank(seen);
            assertThat(ranked.get(0).contradicted()).isZero();
            List<Diagnosis.Suspect> tied = ranked.stream().filter(s -> s.rank() == 1).toList();
            assertThat(tied.stream().anyMatch(s -> s.members().contains(lit))).isTrue();
            if (tied.size() > 1) {
                assertThat(d.nextStep(tied, Effort.DEFAULT)).isNotNull();
            }
        }
    }
}
