package org.thermion.verify;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.GateFn;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.sim.reference.IsaInterpreter;

import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

class MutationTest {

    @Test
    void mutantsAreNewMachinesAndTheOriginalStaysAsItWas() {
        Machine m = VerifyMachines.tiny();
        Mutator mut = new Mutator(m);
        List<SeededFault> sites = mut.sites();
        assertThat(sites).hasAtLeastOneElementOfType(SeededFault.SwapFunction.class)
                .hasAtLeastOneElementOfType(SeededFault.InvertInput.class)
                .hasAtLeastOneElementOfType(SeededFault.MoveWire.class)
                .hasAtLeastOneElementOfType(SeededFault.InvertLatchData.class)
                .hasAtLeastOneElementOfType(SeededFault.MoveLatchData.class);
        int gates = m.netlist().gates().size();
        SeededFault.InvertInput inv = sites.stream().filter(f -> f instanceof SeededFault.InvertInput).map(f -> (SeededFault.InvertInput) f)
                .findFirst().orElseThrow();
        Machine x = mut.apply(inv);
        assertThat(x.netlist().gates()).hasSize(gates + 1);
        assertThat(x.netlist().netCount()).isEqualTo(m.netlist().netCount() + 1);
        assertThat(m.netlist().gates()).hasSize(gates);
        for (int i = 0; i < x.netlist().gates().size(); i++) {
            assertThat(x.netlist().gates().get(i).id()).isEqualTo(i);
        }
        SeededFault.SwapFunction sw = sites.stream().filter(f -> f instanceof SeededFault.SwapFunction).map(f -> (SeededFault.SwapFunction) f)
                .findFirst().orElseThrow();
        Machine y = mut.apply(sw);
        assertThat(y.netlist().gates().get(sw.gate()).fn()).isEqualTo(sw.to());
        assertThat(m.netlist().gates().get(sw.gate()).fn()).isEqualTo(sw.from());
        assertThat(mut.choose(5, 3)).isEqualTo(mut.choose(5, 3)).hasSize(5);
    }

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void everyFaultOfTheTinyMachineIsCaughtOrShownEquivalentIndependently() {
        Machine m = VerifyMachines.tiny();
        Mutator mut = new Mutator(m);
        int all = mut.sites().size();
        MutationReport r = new MutationRun(m, Verifier.Options.defaults(), null).run(all, 1, null);
        assertThat(r.outcomes()).hasSize(all);
        assertThat(r.missed()).isZero();
        assertThat(r.caught()).isGreaterThan(all / 2);
        // Each mutant called equivalent must really agree with the ISA: checked here with the
        // scalar ISA interpreter against the simulator lane by lane on seeded random cases.
        List<SeededFault> faults = mut.choose(all, 1);
        int caughtAndDiffering = 0;
        for (int i = 0; i < all; i++) {
            MutantOutcome o = r.outcomes().get(i);
            if (o.status() != MutantOutcome.Status.CAUGHT) {
                assertThat(differsFromIsa(mut.apply(faults.get(i)), 4000, 77)).as(o.fault()).isFalse();
            } else if (differsFromIsa(mut.apply(faults.get(i)), 4000, 77)) {
                caughtAndDiffering++;
            }
        }
        // The independent cross-check can see faults: most caught mutants differ there too.
        assertThat(caughtAndDiffering).isGreaterThan((int) r.caught() / 2);
    }

    @Test
    void aKnownFaultIsCaughtWithTheFirstDivergentNetAgainstTheUnmutatedLogic() {
        Machine m = VerifyMachines.tiny();
        Mutator mut = new Mutator(m);
        // The gate driving line[2] (opcode 2 decode) turned from AND into OR.
        int line2 = m.netlist().gates().stream().filter(g -> m.netlist().netName(g.output()).equals("line[2]"))
                .findFirst().orElseThrow().id();
        SeededFault f = new SeededFault.SwapFunction(line2, GateFn.AND, GateFn.OR);
        Verifier.Options o = Verifier.Options.defaults().withReference(m, false);
        VerifyReport r = new Verifier(mut.apply(f), o).run();
        assertThat(r.passes()).isFalse();
        Counterexample c = r.counterexamples().get(0);
        assertThat(c.comparedWith()).contains("unmutated");
        assertThat(c.nets()).isNotEmpty();
        assertThat(c.nets().get(0).name()).isEqualTo("line[2]");
    }

    @Test
    @Timeout(value = 300, unit = TimeUnit.SECONDS)
    void theDemoCatchesEveryIsaChangingMutant() {
        Machine m = VerifyMachines.demo();
        MutationReport r = new MutationRun(m, Verifier.Options.defaults(), null).run(10, 11, null);
        assertThat(r.outcomes()).hasSize(10);
        assertThat(r.missed()).isZero();
        assertThat(r.caught()).isPositive();
        System.out.printf("demo fault seeding, seed 11: %d of %d mutants caught, %d equivalent%n", r.caught(),
                r.outcomes().size(), r.equivalent());
        List<SeededFault> faults = new Mutator(m).choose(10, 11);
        for (int i = 0; i < faults.size(); i++) {
            if (r.outcomes().get(i).status() != MutantOutcome.Status.CAUGHT) {
                assertThat(differsFromIsa(new Mutator(m).apply(faults.get(i)), 2000, 5)).as(r.outcomes().get(i).fault())
                        .isFalse();
            }
        }
    }

    /** Random single-instruction cases, scalar interpreter against the simulator: any difference? */
    static boolean differsFromIsa(Machine m, int rounds, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        Simulator sim = new Simulator(m);
        var isa = m.isa();
        int states = isa.state().size();
        int[] latchOfState = new int[states];
        for (int s = 0; s < states; s++) {
            int net = isa.state().get(s).net();
            latchOfState[s] = m.netlist().latches().stream().filter(l -> l.output() == net).findFirst().orElseThrow().id();
        }
        int width = m.rom().dataNets().length;
        for (int round = 0; round < rounds; round++) {
            var ins = isa.instructions().get(rnd.nextInt(isa.instructions().size()));
            long word = isa.opcode().place(ins.opcode()) | (rnd.nextLong() & ~isa.opcode().place(-1L)
                    & ((1L << isa.wordBits()) - 1));
            boolean[] st = new boolean[states];
            boolean[] in = new boolean[m.inputs().size()];
            sim.reset(new InitMode.Zero());
            for (int s = 0; s < states; s++) {
                st[s] = rnd.nextBoolean();
                sim.setLatch(latchOfState[s], st[s] ? -1L : 0L);
            }
            for (int i = 0; i < in.length; i++) {
                in[i] = rnd.nextBoolean();
                sim.setInput(i, in[i] ? -1L : 0L);
            }
            long[] bits = new long[width];
            for (int b = 0; b < width; b++) {
                bits[b] = (word >>> b & 1L) != 0 ? -1L : 0L;
            }
            sim.forceRomWord(bits);
            sim.stepCycle();
            IsaInterpreter.Outcome o = IsaInterpreter.execute(isa, word, st, in, 0, m.pc().width());
            for (int s = 0; s < states; s++) {
                if (((sim.value(isa.state().get(s).net()) & 1L) != 0) != o.state()[s]) {
                    return true;
                }
            }
            if (sim.pc(0) != o.pc()) {
                return true;
            }
        }
        return false;
    }
}
