package org.thermion.timing;

import org.thermion.model.NetLabels;
import org.junit.jupiter.api.Test;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.Tolerances;
import org.thermion.model.Machine;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Hold, pulse-width and overlap checks, remedies and net labels on the hand-summed test machines. */
class ShortPathAndAdviceTest {

    /** CHAIN with a same-phase path: latch a (phase 1) -> t_inv -> latch w (phase 1). */
    static final String RACE = StaticTimingTest.CHAIN.replace("latch y on phase 2 = e",
                    "latch y on phase 2 = e\n  net g\n  g = t_inv(a)\n  latch w on phase 1 = g")
            .replace("outputs y", "outputs y w").replace("  out y\n", "  out y, w\n");

    private static RaceChecks.Check find(List<RaceChecks.Check> all, String kind, int phase) {
        return all.stream().filter(c -> c.kind().equals(kind) && c.phase() == phase).findFirst().orElseThrow();
    }

    @Test
    void holdIsTheEarliestSamePhaseChangeAgainstTheCapturingFlipFlopsFasterEdge() {
        Machine m = TimingMachines.elaborate(RACE);
        List<RaceChecks.Check> checks = new RaceChecks(m, new DelayCalculator(m), 0).checks(50e-6);
        RaceChecks.Check hold = find(checks, "hold", 1);
        // By hand: a switches on its faster edge 0.5 us, t_inv's faster edge adds 1 us: 1.5 us; w's
        // own faster edge (its hold time) is 0.5 us: 1 us to spare.
        assertThat(hold.endpoint()).isEqualTo("latch w");
        assertThat(hold.have()).isCloseTo(1.5e-6, within(1e-12));
        assertThat(hold.need()).isCloseTo(0.5e-6, within(1e-12));
        assertThat(hold.passes()).isTrue();
    }

    /**
     * RACE with the same-phase path through two non-inverting gates whose fast edges differ, as a
     * diode AND (falls through its diode, rises through its pull-up) feeding a diode OR (the other
     * way round): a -> t_and -> t_or -> latch w (phase 1).
     */
    static final String RACE_THROUGH_GATES = RACE
            .replace("stage t_ff :", "stage t_and : and { tube PQ1; circuit none; sections 1; load 10 k from bplus; rise 3 us; fall 0.1 us }\n"
                    + "stage t_or : or { tube PQ1; circuit none; sections 1; load 10 k from bplus; rise 0.2 us; fall 4 us }\n"
                    + "stage t_ff :")
            .replace("latch t_ff }", "latch t_ff\n and t_and\n or t_or }")
            .replace("g = t_inv(a)", "g = t_or(t_and(a, x), x)");

    @Test
    void holdFollowsEachChangesEdgeThroughTheGates() {
        Machine m = TimingMachines.elaborate(RACE_THROUGH_GATES);
        RaceChecks.Check hold = find(new RaceChecks(m, new DelayCalculator(m), 0).checks(50e-6), "hold", 1);
        // By hand: a changes at its faster edge, 0.5 us. Rising: t_and rises 3 us, t_or rises 0.2 us:
        // 3.7 us. Falling: t_and falls 0.1 us, t_or falls 4 us: 4.6 us. The earlier is 3.7 us (each
        // gate's faster edge regardless of the change's direction would give 0.8 us).
        assertThat(hold.endpoint()).isEqualTo("latch w");
        assertThat(hold.have()).isCloseTo(3.7e-6, within(1e-12));
        assertThat(hold.need()).isCloseTo(0.5e-6, within(1e-12));
    }

    @Test
    void aPhaseShorterThanTheLatchSwitchingFailsPulseWidth() {
        Machine m = TimingMachines.elaborate(StaticTimingTest.CHAIN);
        // 3 us period, two phases: 1.5 us each; t_ff's slower edge takes 2 us.
        RaceChecks.Check pw = find(new RaceChecks(m, new DelayCalculator(m), 0).checks(1.5e-6), "pulse width", 1);
        assertThat(pw.slack()).isCloseTo(-0.5e-6, within(1e-12));
        assertThat(pw.passes()).isFalse();
    }

    @Test
    void overlapToleratedIsTheSlackOfTheWorstPathIntoTheLaterPhase() {
        Machine m = TimingMachines.elaborate(StaticTimingTest.CHAIN);
        TimingReport r = new StaticTiming(m).analyse();
        List<RaceChecks.Check> o = RaceChecks.overlaps(r);
        // Into phase 1: 46 - 7 = 39 us (StaticTimingTest's sums); into phase 2: 46 - 5 = 41 us.
        assertThat(find(o, "overlap", 1).have()).isCloseTo(39e-6, within(1e-12));
        assertThat(find(o, "overlap", 2).have()).isCloseTo(41e-6, within(1e-12));
    }

    @Test
    void aFailingPathGetsComputedRemedies() {
        Machine m = TimingMachines.elaborate(RcStageTest.RC);
        DelayCalculator slow = new DelayCalculator(m, MachineCircuits.of(m), Tolerances.DEFAULT);
        TimingReport r = new StaticTiming(m, 0, slow).analyse(8.7e-6);
        assertThat(r.passes()).isFalse();
        List<PathAdvice.Remedy> advice = new PathAdvice(m, slow).advise(r);
        // The slowest step is g1's rise through its 10 k load (+5 % at the slow corner).
        PathAdvice.Remedy load = advice.stream().filter(a -> a.kind().equals("lower load")).findFirst().orElseThrow();
        assertThat(load.net()).isEqualTo("g1");
        assertThat(load.delayBefore()).isCloseTo(Math.log(9) * 10.5e3 * 17e-12, within(1e-15));
        // A declared load scales its edge in proportion: the first E12 value that is enough.
        double v = Double.parseDouble(load.change().replaceAll(".*-> ([0-9.]+) k", "$1")) * 1e3;
        assertThat(load.delayAfter()).isCloseTo(load.delayBefore() * v / 10e3, within(1e-15));
        assertThat(load.enough()).isTrue();
        assertThat(load.slackAfter()).isCloseTo(r.perPhase().get(0).slack() + load.delayBefore() - load.delayAfter(),
                within(1e-15));
        // The phase that would fit the path as it is leaves no slack over.
        PathAdvice.Remedy phase = advice.stream().filter(a -> a.kind().equals("longer phase")).findFirst().orElseThrow();
        assertThat(phase.slackAfter()).isCloseTo(0, within(1e-12));
    }

    @Test
    void aGeneratedNetIsNamedByItsExpressionAndLine() {
        String text = StaticTimingTest.CHAIN
                .replace("stage t_ff :", "stage t_nor : nor { tube PQ1; circuit none; sections 1; load 10 k from bplus; rise 3 us; fall 1 us }\n"
                        + "stage t_ff :")
                .replace("latch t_ff }", "latch t_ff\n nor t_nor }")
                .replace("d = t_inv(c)", "d = t_inv(!(c | x))");
        Machine m = TimingMachines.elaborate(text);
        NetLabels labels = new NetLabels(m.netlist());
        int temp = -1;
        for (int n = 0; n < m.netlist().netCount(); n++) {
            if (m.netlist().isGenerated(n)) {
                temp = n;
            }
        }
        assertThat(temp).isNotNegative();
        int line = text.substring(0, text.indexOf("d = t_inv(")).split("\n").length;
        assertThat(labels.label(temp)).isEqualTo("!(c | x) (test.machine:" + line + ")");
    }
}
