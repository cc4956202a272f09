package org.thermion.verify;

import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.Latch;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.thermion.verify.CaseText.b01;
import static org.thermion.verify.CaseText.bit;

/**
 * Explains one group of mismatches as a {@link Counterexample}: what the latch (or the PC) was
 * given, the first nets that differ from a comparison run, and the gates feeding the pin at fault.
 */
final class CounterexampleBuilder {
    private final Machine machine;
    private final Isa isa;
    private final Verifier.Options opt;
    private final BatchRun logic;
    private final ItemComparison items;
    private final CaseText text;
    private final int stateBits;
    private final int inputBits;
    private final int pcMask;
    private NetTrace netTrace;

    CounterexampleBuilder(Machine machine, Verifier.Options opt, BatchRun logic, ItemComparison items, CaseText text,
                          int pcMask) {
        this.machine = machine;
        this.isa = machine.isa();
        this.opt = opt;
        this.logic = logic;
        this.items = items;
        this.text = text;
        this.stateBits = isa.state().size();
        this.inputBits = machine.inputs().size();
        this.pcMask = pcMask;
    }

    Counterexample build(ItemComparison.Group g, OperandPlan plan) {
        Batch b = g.batch;
        int lane = g.lane;
        Instruction ins = plan.instruction();
        String mn = b.inhibited ? ins.mnemonic() + " while skipped" : ins.mnemonic();
        BatchRun.Result r = logic.run(b, true);
        IsaLanes.Expected e = items.expected(b);
        String item = g.item < stateBits ? isa.state().get(g.item).name() : "pc";
        String kind;
        String explanation;
        int[] pins;
        int phase;
        if (g.item < stateBits) {
            Latch l = machine.netlist().latches().get(logic.stateLatch(g.item));
            phase = l.phase();
            long[] at = r.atPhase[phase];
            boolean en = l.enable() < 0 || bit(at[l.enable()], lane);
            boolean d = bit(at[l.data()], lane);
            boolean q = b.state(g.item, lane);
            boolean x = bit(e.state()[g.item], lane);
            boolean w = bit(e.written()[g.item], lane);
            String enName = l.enable() < 0 ? "(always)" : text.net(l.enable());
            if (en && !w) {
                kind = "unexpected write";
                explanation = "latch " + item + " loaded (enable " + enName + " = 1) although " + mn
                        + " does not write " + item + "; data " + text.net(l.data()) + " = " + b01(d);
                pins = new int[]{l.enable()};
            } else if (!en && x != q) {
                kind = "missed write";
                explanation = "latch " + item + " did not load (enable " + enName + " = 0); " + mn
                        + " writes " + item + " = " + b01(x);
                pins = new int[]{l.enable()};
            } else {
                kind = "wrong value";
                explanation = "latch " + item + " loaded data " + text.net(l.data()) + " = " + b01(d) + ", expected "
                        + b01(x) + " (enable " + enName + " = " + b01(en) + ")";
                pins = new int[]{l.data()};
            }
        } else if (isa.inhibitNet() >= 0 && (b.inhibited || bit(r.inhibit, lane))) {
            Latch l = latchOf(isa.inhibitNet());
            phase = l.phase();
            kind = "skip";
            explanation = String.format(Locale.ROOT, "inhibit latch %s = %s after the cycle, pc 0x%X; %s expects pc 0x%X"
                    + " (a skip: the next address with the decoder inhibited, which then clears)",
                    text.net(isa.inhibitNet()), b01(bit(r.inhibit, lane)), r.pc[lane], mn, items.expectedPc(b, e, lane));
            pins = new int[]{l.data()};
        } else {
            phase = machine.pc().phase();
            long[] at = r.atPhase[phase];
            int jn = machine.pc().jumpNet();
            boolean j = jn >= 0 && bit(at[jn], lane);
            boolean jx = bit(e.jump(), lane);
            if (j != jx) {
                kind = "jump";
                explanation = "jump net " + (jn >= 0 ? text.net(jn) : "(none)") + " = " + b01(j) + "; " + mn
                        + (jx ? " jumps here" : " does not jump here");
                pins = new int[]{jn};
            } else {
                kind = "target";
                int[] t = machine.pc().targetNets();
                List<Integer> badBits = new ArrayList<>();
                int want = e.jumpTarget()[lane];
                for (int i = 0; i < t.length; i++) {
                    if (bit(at[t[i]], lane) != ((want >>> i & 1) != 0)) {
                        badBits.add(t[i]);
                    }
                }
                explanation = String.format(Locale.ROOT, "jump target 0x%X, expected 0x%X", r.pc[lane], want & pcMask);
                pins = badBits.stream().mapToInt(Integer::intValue).toArray();
            }
        }
        String compared;
        List<NetDiff> nets;
        if (opt.reference() != null) {
            BatchRun ref = new BatchRun(opt.reference());
            BatchRun.Result rr = ref.run(b, true);
            compared = "the unmutated logic, same case";
            nets = nets().firstDifferences(r, rr, lane, lane, opt.reference().netlist().netCount(), null, 0);
        } else {
            Neighbour nb = passingNeighbour(b, lane, g.item);
            if (nb == null) {
                compared = "no passing case of " + mn + " one bit away";
                nets = List.of();
            } else {
                compared = "the passing case with " + nb.change;
                boolean[] cone = nets().cone(pins);
                nets = nets().firstDifferences(nb.result, nb.result, 0, nb.lane, machine.netlist().netCount(), cone, phase);
            }
        }
        return new Counterexample(mn, ins.opcode(), b.word(lane), text.operandText(ins, b.word(lane)), item,
                kind, explanation, text.stateText(b, lane), text.inputText(b, lane), text.afterText(e.state(), lane),
                text.afterText(r.state, lane), items.expectedPc(b, e, lane), r.pc[lane], g.cases, compared, nets,
                nets().trace(pins, r.atPhase[phase], lane));
    }

    private Latch latchOf(int net) {
        for (Latch l : machine.netlist().latches()) {
            if (l.output() == net) {
                return l;
            }
        }
        throw new IllegalStateException("no latch drives " + net);
    }

    // Made on the first counterexample: most runs find none.
    private NetTrace nets() {
        if (netTrace == null) {
            netTrace = new NetTrace(machine, opt.maxNets());
        }
        return netTrace;
    }

    private record Neighbour(BatchRun.Result result, int lane, String change) {
    }

    /**
     * Runs the failing case in lane 0 beside its one-bit neighbours (each state bit, input and
     * non-opcode word bit flipped) and returns the first neighbour that gets the item right.
     */
    private Neighbour passingNeighbour(Batch failing, int lane, int item) {
        Batch nb = new Batch(failing.instruction, isa.wordBits(), stateBits, inputBits);
        List<String> change = new ArrayList<>();
        nb.copyLane(failing, lane, 0);
        change.add("");
        long opMask = isa.opcode().place(-1L);
        int next = 1;
        for (int s = 0; s < stateBits && next < 64; s++, next++) {
            nb.copyLane(failing, lane, next);
            nb.state[s] ^= 1L << next;
            change.add(isa.state().get(s).name() + " = " + b01(nb.state(s, next)));
        }
        for (int i = 0; i < inputBits && next < 64; i++, next++) {
            nb.copyLane(failing, lane, next);
            nb.inputs[i] ^= 1L << next;
            change.add(machine.inputs().get(i).name() + " = " + b01(nb.input(i, next)));
        }
        for (int bit = 0; bit < isa.wordBits() && next < 64; bit++) {
            if ((opMask >>> bit & 1L) != 0) {
                continue;
            }
            nb.copyLane(failing, lane, next);
            nb.wordBits[bit] ^= 1L << next;
            change.add(String.format(Locale.ROOT, "word 0x%X", nb.word(next)));
            next++;
        }
        BatchRun.Result r = logic.run(nb, true);
        IsaLanes.Expected e = items.expected(nb);
        long bad = items.wrong(nb, e, r, item);
        long good = nb.valid & ~bad & ~1L;
        if (good == 0) {
            return null;
        }
        // Prefer a neighbour where the item really changes (a write of a new value, a jump),
        // so the comparison shows logic at work rather than a latch keeping its value.
        long changes;
        if (item < stateBits) {
            changes = e.state()[item] ^ nb.state[item];
        } else {
            changes = e.jump();
        }
        int p = Long.numberOfTrailingZeros((good & changes) != 0 ? good & changes : good);
        return new Neighbour(r, p, change.get(p));
    }

}
