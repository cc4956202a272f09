package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;
import org.thermion.synth.SyntheticMachine;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class FaultSimulatorTest {

    /** Every fault's lamps, every step, from the fast simulator and from the one-at-a-time reference. */
    private static void assertAgree(Machine m, long[] rom, List<Step> steps, String what) {
        FaultCircuit c = FaultCircuit.of(m);
        List<Fault> faults = FaultList.of(c).all();
        OneFaultSimulator ref = new OneFaultSimulator(c, rom);
        try (FaultSimulator fast = new FaultSimulator(c, rom, 2)) {
            byte[][] got = fast.responses(faults, steps);
            for (Fault f : faults) {
                assertThat(got[f.id()]).as("%s: fault %s", what, f).isEqualTo(ref.run(f, steps));
            }
            byte[][] good = fast.expected(steps);
            byte[] refGood = ref.run(null, steps);
            int lamps = c.lamps().size();
            for (int s = 0; s < steps.size(); s++) {
                for (int i = 0; i < lamps; i++) {
                    assertThat(good[s][i]).as("%s: good lamp %d at step %d", what, i, s).isEqualTo(refGood[s * lamps + i]);
                }
            }
            int[] first = fast.firstDetection(faults, steps);
            for (Fault f : faults) {
                assertThat(first[f.id()]).as("%s: first detection of %s", what, f)
                        .isEqualTo(firstDifference(refGood, ref.run(f, steps), lamps));
            }
        }
    }

    private static int firstDifference(byte[] good, byte[] bad, int lamps) {
        for (int k = 0; k < good.length; k++) {
            if (good[k] != FaultSimulator.UNKNOWN && bad[k] != FaultSimulator.UNKNOWN && good[k] != bad[k]) {
                return k / lamps;
            }
        }
        return -1;
    }

    @Test
    void agreesWithTheReferenceOnC17ForAllThirtyTwoVectors() {
        List<Step> steps = new ArrayList<>();
        for (int v = 0; v < 32; v++) {
            boolean[] in = new boolean[5];
            for (int i = 0; i < 5; i++) {
                in[i] = (v >> i & 1) != 0;
            }
            steps.add(new Step(in, 1));
        }
        assertAgree(Bench.c17(), null, steps, "c17");
    }

    @Test
    void agreesWithTheReferenceOnTheDemoRunningItsProgram() {
        Machine demo = Bench.demo();
        assertAgree(demo, Bench.demoRom(demo), RandomMachines.steps(5, demo.inputs().size(), 12), "demo");
    }

    @Test
    void agreesWithTheReferenceOnTheDecoderBoard() {
        Machine m = Bench.load(java.nio.file.Path.of("examples", "decoder-board", "decoder-board.machine"));
        assertAgree(m, null, RandomMachines.steps(9, m.inputs().size(), 10), "decoder board");
    }

    @Test
    void agreesWithTheReferenceOnASmallSyntheticMachine() {
        SyntheticMachine s = SyntheticMachine.ofSize(160);
        Machine m = Bench.text(s.text());
        long[] rom = Bench.rom(m, s.program());
        assertAgree(m, rom, RandomMachines.steps(3, m.inputs().size(), 6), "synthetic 160");
    }

    @Test
    void agreesWithTheReferenceOnRandomMachines() {
        for (long seed = 1; seed <= 40; seed++) {
            String text = RandomMachines.text(seed);
            Machine m;
            try {
                m = Bench.text(text);
            } catch (AssertionError e) {
                throw new AssertionError("seed " + seed + " did not elaborate:\n" + text + "\n" + e.getMessage(), e);
            }
            assertAgree(m, null, RandomMachines.steps(seed, m.inputs().size(), 8), "random seed " + seed);
        }
    }
}
