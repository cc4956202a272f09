package org.thermion.verify;

import org.thermion.model.AddressedBit;
import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.IsaField;
import org.thermion.model.Rtl;
import org.thermion.model.Transfer;

import java.util.List;

/**
 * The ISA's meaning of one instruction evaluated over 64 cases at once: bit i of every word
 * belongs to case i. Right-hand sides and conditions read the state before the instruction;
 * {@code [sel] <- x} writes the state bit mapped at the select address (nothing for inputs
 * and unmapped addresses); reading {@code [sel]} gives the mapped bit, 0 when unmapped;
 * {@code pc <- field} takes the field, {@code pc <- pc + ...} adds to the instruction's address
 * (a skip, a relative jump), otherwise the PC counts up by one.
 */
public final class IsaLanes {
    private final Isa isa;

    public IsaLanes(Isa isa) {
        this.isa = isa;
    }

    /** What the ISA says 64 cases of one instruction do. */
    public record Expected(long[] state, long[] written, long jump, int[] jumpTarget) {
    }

    /**
     * Evaluates {@code ins} on 64 cases. {@code wordBits[b]} holds bit b of each case's
     * instruction word, {@code state[s]} and {@code inputs[i]} the state and input bits.
     */
    public Expected evaluate(Instruction ins, long[] wordBits, long[] state, long[] inputs) {
        return evaluate(ins, wordBits, state, inputs, 0);
    }

    /** As {@link #evaluate(Instruction, long[], long[], long[])}, every case at address {@code pc}. */
    public Expected evaluate(Instruction ins, long[] wordBits, long[] state, long[] inputs, int pc) {
        Run r = new Run(wordBits, state, inputs, pc);
        r.run(ins.body(), -1L);
        return new Expected(r.after, r.written, r.jump, r.target);
    }

    private final class Run {
        /** Word bits as lane words. */
        final long[] words;
        final long[] before;
        final long[] inputs;
        final long[] after;
        final long[] written;
        long jump;
        final int[] target = new int[64];
        /** Lanes whose select field addresses each bit-map entry. */
        final long[] selLanes;

        final int pc;

        Run(long[] wordBits, long[] state, long[] inputs, int pc) {
            this.pc = pc;
            this.words = wordBits;
            this.before = state;
            this.inputs = inputs;
            this.after = state.clone();
            this.written = new long[state.length];
            List<AddressedBit> map = isa.bitMap();
            selLanes = new long[map.size()];
            if (isa.selectField() >= 0) {
                IsaField f = isa.fields().get(isa.selectField());
                for (int k = 0; k < map.size(); k++) {
                    long addr = map.get(k).address();
                    long lanes = addr >>> f.width() == 0 ? -1L : 0L;
                    for (int i = 0; i < f.width() && lanes != 0; i++) {
                        long b = f.lo() + i < wordBits.length ? wordBits[f.lo() + i] : 0L;
                        lanes &= (addr >>> i & 1L) != 0 ? b : ~b;
                    }
                    selLanes[k] = lanes;
                }
            }
        }

        void run(List<Transfer> body, long active) {
            if (active == 0) {
                return;
            }
            // Later writes of the same bit win, lane by lane, as statements run in order.
            for (Transfer t : body) {
                if (t instanceof Transfer.ToState s) {
                    long v = value(s.value());
                    after[s.state()] = (after[s.state()] & ~active) | (v & active);
                    written[s.state()] |= active;
                } else if (t instanceof Transfer.ToSelected s) {
                    long v = value(s.value());
                    for (int k = 0; k < selLanes.length; k++) {
                        AddressedBit b = isa.bitMap().get(k);
                        long lanes = selLanes[k] & active;
                        if (b.writable() && lanes != 0) {
                            after[b.state()] = (after[b.state()] & ~lanes) | (v & lanes);
                            written[b.state()] |= lanes;
                        }
                    }
                } else if (t instanceof Transfer.ToPc p) {
                    IsaField f = isa.fields().get(p.field());
                    jump |= active;
                    for (int lane = 0; lane < 64; lane++) {
                        if ((active >>> lane & 1L) != 0) {
                            int tv = 0;
                            for (int i = 0; i < f.width() && i < 31; i++) {
                                long b = f.lo() + i < words.length ? words[f.lo() + i] : 0L;
                                tv |= (int) (b >>> lane & 1L) << i;
                            }
                            target[lane] = tv;
                        }
                    }
                } else if (t instanceof Transfer.PcStep p) {
                    jump |= active;
                    for (int lane = 0; lane < 64; lane++) {
                        if ((active >>> lane & 1L) != 0) {
                            long word = 0;
                            for (int b = 0; b < words.length; b++) {
                                word |= (words[b] >>> lane & 1L) << b;
                            }
                            target[lane] = (int) p.from(pc, word, isa.fields());
                        }
                    }
                } else if (t instanceof Transfer.When w) {
                    long c = value(w.cond());
                    run(w.then(), active & c);
                    run(w.otherwise(), active & ~c);
                }
            }
        }

        long value(Rtl e) {
            if (e instanceof Rtl.Const c) {
                return c.value() ? -1L : 0L;
            }
            if (e instanceof Rtl.State s) {
                return before[s.index()];
            }
            if (e instanceof Rtl.Input i) {
                return inputs[i.index()];
            }
            if (e instanceof Rtl.Selected) {
                long v = 0;
                for (int k = 0; k < selLanes.length; k++) {
                    AddressedBit b = isa.bitMap().get(k);
                    v |= selLanes[k] & (b.state() >= 0 ? before[b.state()] : inputs[b.input()]);
                }
                return v;
            }
            if (e instanceof Rtl.Not n) {
                return ~value(n.operand());
            }
            if (e instanceof Rtl.And a) {
                return value(a.left()) & value(a.right());
            }
            if (e instanceof Rtl.Or o) {
                return value(o.left()) | value(o.right());
            }
            if (e instanceof Rtl.Xor x) {
                return value(x.left()) ^ value(x.right());
            }
            throw new IllegalStateException("unknown expression " + e);
        }
    }
}
