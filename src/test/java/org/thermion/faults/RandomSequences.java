package org.thermion.faults;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

/** How many random steps reach a given number of detected faults: the yardstick for plans. */
final class RandomSequences {
    private RandomSequences() {
    }

    /** Steps a random sequence from {@code seed} needs to detect {@code wanted} faults, or {@code cap} + 1. */
    static int stepsToReach(FaultSimulator sim, List<Fault> faults, int wanted, long seed, int maxCycles, int cap) {
        List<Step> steps = Step.random(new Random(seed), sim.circuit().inputCount(), cap, maxCycles);
        int[] first = sim.firstDetection(faults, steps);
        int[] found = Arrays.stream(first).filter(s -> s >= 0).sorted().toArray();
        return found.length < wanted ? cap + 1 : found[wanted - 1] + 1;
    }

    /** The median over ten seeds. */
    static double median(FaultSimulator sim, List<Fault> faults, int wanted, int maxCycles, int cap) {
        int[] n = new int[10];
        for (int s = 0; s < 10; s++) {
            n[s] = stepsToReach(sim, faults, wanted, 1000 + s, maxCycles, cap);
        }
        Arrays.sort(n);
        return (n[4] + n[5]) / 2.0;
    }
}
