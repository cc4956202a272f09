package org.thermion.verify;

import org.junit.jupiter.api.Test;
import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.Machine;
import org.thermion.sim.reference.IsaInterpreter;

import java.util.SplittableRandom;

import static org.assertj.core.api.Assertions.assertThat;

/** The lane-parallel evaluator agrees with the scalar ISA interpreter, case by case. */
class IsaLanesTest {

    @Test
    void agreesWithTheScalarInterpreterOnRandomDemoCases() {
        Machine m = VerifyMachines.demo();
        Isa isa = m.isa();
        IsaLanes lanes = new IsaLanes(isa);
        long seed = 20261201L;
        SplittableRandom rnd = new SplittableRandom(seed);
        int states = isa.state().size();
        int inputs = m.inputs().size();
        for (int round = 0; round < 200; round++) {
            Instruction ins = isa.instructions().get(rnd.nextInt(isa.instructions().size()));
            long[] wordBits = new long[isa.wordBits()];
            long[] state = new long[states];
            long[] in = new long[inputs];
            for (int b = 0; b < wordBits.length; b++) {
                wordBits[b] = rnd.nextLong();
            }
            long op = ins.opcode();
            for (int b = isa.opcode().lo(); b <= isa.opcode().hi(); b++) {
                wordBits[b] = (op >>> (b - isa.opcode().lo()) & 1L) != 0 ? -1L : 0L;
            }
            for (int s = 0; s < states; s++) {
                state[s] = rnd.nextLong();
            }
            for (int i = 0; i < inputs; i++) {
                in[i] = rnd.nextLong();
            }
            IsaLanes.Expected e = lanes.evaluate(ins, wordBits, state, in);
            for (int lane = 0; lane < 64; lane++) {
                long word = 0;
                for (int b = 0; b < wordBits.length; b++) {
                    word |= (wordBits[b] >>> lane & 1L) << b;
                }
                boolean[] st = new boolean[states];
                boolean[] inp = new boolean[inputs];
                for (int s = 0; s < states; s++) {
                    st[s] = (state[s] >>> lane & 1L) != 0;
                }
                for (int i = 0; i < inputs; i++) {
                    inp[i] = (in[i] >>> lane & 1L) != 0;
                }
                IsaInterpreter.Outcome o = IsaInterpreter.execute(isa, word, st, inp, 5, m.pc().width());
                for (int s = 0; s < states; s++) {
                    assertThat((e.state()[s] >>> lane & 1L) != 0)
                            .as("seed %d round %d %s word 0x%X state %s", seed, round, ins.mnemonic(), word,
                                    isa.state().get(s).name())
                            .isEqualTo(o.state()[s]);
                    assertThat((e.written()[s] >>> lane & 1L) != 0).isEqualTo(o.written()[s]);
                }
                boolean jumps = (e.jump() >>> lane & 1L) != 0;
                assertThat(jumps ? e.jumpTarget()[lane] : 6).isEqualTo(o.pc());
            }
        }
    }
}
