package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;
import org.thermion.synth.SyntheticMachine;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class FaultSimulatorTest {

    /**
     * Every fault's lamps, every step, from the fast simulator and from the one-at-a-time reference:
     * the machine's faults with its sockets' solder bridges, and bridges between nets picked at random
     * with every joining table (loops through a bridge, latch outputs, switches, fights included).
     */
    private static void assertAgree(Machine m, long[] rom, List<Step> steps, String what) {
        assertAgreeRunning(m, java.util.Collections.singletonList(rom), steps, what);
    }

    private static void assertAgreeRunning(Machine m, List<long[]> programs, List<Step> steps, String what) {
        FaultCircuit c = FaultCircuit.of(m);
        List<Fault> faults = new ArrayList<>(FaultList.of(c, SocketPins.of(m)).all());
        faults.addAll(randomBridges(c, what.hashCode(), faults.size(), 48));
        OneFaultSimulator ref = OneFaultSimulator.running(c, programs);
        try (FaultSimulator fast = FaultSimulator.running(c, programs, 2)) {
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
        // One worker reloads one machine for every batch: bridges first, so stuck-at batches follow
        // bridge batches in the same machine, and nothing of an earlier batch may stay behind.
        List<Fault> reversed = new ArrayList<>(faults);
        java.util.Collections.reverse(reversed);
        try (FaultSimulator single = FaultSimulator.running(c, programs, 1)) {
            for (int round = 0; round < 2; round++) {
                byte[][] got = single.responses(round == 0 ? reversed : faults, steps);
                for (int i = 0; i < faults.size(); i++) {
                    Fault f = (round == 0 ? reversed : faults).get(i);
                    assertThat(got[i]).as("%s, one reused machine: fault %s", what, f).isEqualTo(ref.run(f, steps));
                }
            }
        }
    }

    /** {@code n} bridges between random stems (inputs, ROM lines, gate and latch outputs), ids from {@code firstId}. */
    static List<Fault> randomBridges(FaultCircuit c, long seed, int firstId, int n) {
        java.util.Random r = new java.util.Random(seed);
        List<Integer> stems = new ArrayList<>();
        for (Site s : c.sites()) {
            if (s.line() && s.place().stem()) {
                stems.add(s.slot());
            }
        }
        List<Fault> out = new ArrayList<>();
        for (int k = 0; k < n && stems.size() >= 2; k++) {
            int a = stems.get(r.nextInt(stems.size()));
            int b = stems.get(r.nextInt(stems.size()));
            if (a == b) {
                continue;
            }
            Bridge br = new Bridge(Math.min(a, b), Math.max(a, b), (byte) r.nextInt(3), (byte) r.nextInt(3), "XV" + k,
                    "V" + k, "6AL5", -1, 1, 2);
            out.add(new Fault(firstId + out.size(), FaultKind.BRIDGE, k, List.of(), br));
        }
        return out;
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
    void agreesWithTheReferenceOnTheDemoSwitchedOffAndOnWithAnotherProgramAndBack() throws Exception {
        Machine demo = Bench.demo();
        long[] second = Bench.rom(demo, java.nio.file.Files.readString(java.nio.file.Path.of("programs", "every-op.asm")));
        List<Step> steps = new ArrayList<>(RandomMachines.steps(5, demo.inputs().size(), 6));
        List<Step> more = RandomMachines.steps(6, demo.inputs().size(), 12);
        steps.add(more.get(0).restarting(1));
        steps.addAll(more.subList(1, 6));
        steps.add(more.get(6).restarting(0));
        steps.addAll(more.subList(7, 12));
        assertAgreeRunning(demo, List.of(Bench.demoRom(demo), second), steps, "demo, two programs");
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
