package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;
import java.util.List;

class ScratchTest {
    @Test
    void dump() {
        Machine demo = Bench.demo();
        FaultCircuit c = FaultCircuit.of(demo);
        FaultList faults = FaultList.of(c);
        try (FaultSimulator sim = new FaultSimulator(c, Bench.demoRom(demo), 2)) {
            Plan plan = new PlanGenerator(sim, faults, Effort.DEFAULT).generate();
            List<Step> longer = Diagnosis.extend(sim, faults, plan.steps(), 3, Effort.DEFAULT);
            Diagnosis d = new Diagnosis(sim, faults, longer);
            System.out.println("steps " + plan.steps().size() + " -> " + longer.size());
            for (Diagnosis.Suspect s : d.classes()) {
                if (s.looksGood() || Diagnosis.size(faults, s) <= 3) continue;
                System.out.println("CLASS size " + Diagnosis.size(faults, s));
                for (Fault f : Diagnosis.distinct(faults, s)) {
                    System.out.println("   " + FaultPlace.of(c, f).text());
                }
            }
        }
    }
}
