package org.thermion.sim.reference;

import org.thermion.model.AddressedBit;
import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.IsaField;
import org.thermion.model.Machine;
import org.thermion.model.Rtl;
import org.thermion.model.Transfer;

import java.util.Arrays;
import java.util.List;

/**
 * Runs programs on the meaning the {@code isa} block gives each instruction, without the
 * netlist: the reference the gate-level simulation is checked against.
 *
 * <p>One {@link #step()} is one instruction and one machine cycle. Every right-hand side and
 * every condition reads the state as it was before the instruction; writes take effect together
 * afterwards (a later write to the same bit within one instruction wins). {@code [sel] <- x} writes
 * the state bit mapped at the select field's address, and nothing when that address maps to an
 * input or to nothing; reading {@code [sel]} gives the mapped input or state bit, 0 when unmapped
 * (or when the ISA has no select field). The PC takes the target field when a {@code pc <- field}
 * runs, or its own address plus or minus what a {@code pc <- pc + ...} adds (a skip, a relative
 * jump), else counts up by one, all modulo 2^pcWidth. A switch-fed machine reads its word from the
 * switches every cycle and has no PC. A word whose opcode no instruction claims changes
 * nothing but the PC. Addresses at or beyond the ROM's size fetch the word 0.
 */
public final class IsaInterpreter {
    private final Machine machine;
    private final Isa isa;
    private final int pcWidth;
    private final long[] rom;
    private boolean[] state;
    private final boolean[] inputs;
    private int pc;
    private long cycle;

    public IsaInterpreter(Machine machine) {
        this.machine = machine;
        this.isa = machine.isa();
        if (isa == null) {
            throw new IllegalArgumentException("machine '" + machine.name() + "' has no isa block to interpret");
        }
        this.pcWidth = machine.pc() == null ? 0 : machine.pc().width();
        this.rom = new long[machine.rom() == null ? 0 : machine.rom().words()];
        this.state = new boolean[isa.state().size()];
        this.inputs = new boolean[machine.inputs().size()];
    }

    public Machine machine() {
        return machine;
    }

    /** All state bits 0, PC 0, cycle count 0. The ROM and the inputs stay as they are. */
    public void reset() {
        state = new boolean[isa.state().size()];
        pc = 0;
        cycle = 0;
    }

    /** Copies {@code words} into the ROM from address 0; the rest of the ROM reads 0. */
    public void loadRom(long[] words) {
        if (words.length > rom.length) {
            throw new IllegalArgumentException("program of " + words.length + " words does not fit the "
                    + rom.length + "-word ROM");
        }
        Arrays.fill(rom, 0);
        System.arraycopy(words, 0, rom, 0, words.length);
    }

    /** Drives machine input {@code inputIndex} (an index into {@code machine.inputs()}). */
    public void setInput(int inputIndex, boolean v) {
        inputs[inputIndex] = v;
    }

    /** Drives the machine input of that name. */
    public void setInput(String name, boolean v) {
        for (int i = 0; i < machine.inputs().size(); i++) {
            if (machine.inputs().get(i).name().equals(name)) {
                inputs[i] = v;
                return;
            }
        }
        throw new IllegalArgumentException("machine '" + machine.name() + "' has no input '" + name + "'");
    }

    /** Fetches the word at the PC (or reads it from the switches) and executes it: one machine cycle. */
    public void step() {
        long word = isa.wordFromSwitches() ? switchWord(isa, inputs) : pc < rom.length ? rom[pc] : 0;
        Outcome o = execute(isa, word, state, inputs, pc, pcWidth);
        state = o.state();
        pc = o.pc();
        cycle++;
    }

    public boolean state(int stateIndex) {
        return state[stateIndex];
    }

    /** The state bit of that ISA name. */
    public boolean state(String name) {
        int i = isa.stateIndex(name);
        if (i < 0) {
            throw new IllegalArgumentException("isa has no state bit '" + name + "'");
        }
        return state[i];
    }

    public void setState(int stateIndex, boolean v) {
        state[stateIndex] = v;
    }

    public int pc() {
        return pc;
    }

    public void setPc(int pc) {
        this.pc = (int) (pc & mask(pcWidth));
    }

    public long cycle() {
        return cycle;
    }

    /** The instruction word the switches of a switch-fed machine set. */
    public static long switchWord(Isa isa, boolean[] inputs) {
        int[] bits = isa.wordInputs();
        long w = 0;
        for (int i = 0; i < bits.length; i++) {
            w |= inputs[bits[i]] ? 1L << i : 0;
        }
        return w;
    }

    /**
     * Executes one instruction word on a copy of {@code state}.
     *
     * @param inputs the machine inputs, by index into {@code machine.inputs()}
     * @return the state after, the next PC, and which state bits the instruction wrote
     */
    public static Outcome execute(Isa isa, long word, boolean[] state, boolean[] inputs, int pc, int pcWidth) {
        Eval ev = new Eval(isa, word, state, inputs, pc);
        Instruction ins = isa.byOpcode(isa.opcode().extract(word));
        if (ins != null) {
            ev.run(ins.body());
        }
        long next = ev.jumped ? ev.jumpTo : pc + 1;
        return new Outcome(ev.after, (int) (next & mask(pcWidth)), ev.written);
    }

    private static long mask(int width) {
        return width >= 63 ? Long.MAX_VALUE : (1L << width) - 1;
    }

    /** What one instruction did: the state after it, the next PC, the state bits it wrote. */
    public record Outcome(boolean[] state, int pc, boolean[] written) {
    }

    /** Evaluation of one instruction: reads {@code before}, writes {@code after}. */
    private static final class Eval {
        private final Isa isa;
        private final long word;
        private final boolean[] before;
        private final boolean[] inputs;
        final boolean[] after;
        final boolean[] written;
        private final long pc;
        boolean jumped;
        long jumpTo;

        Eval(Isa isa, long word, boolean[] before, boolean[] inputs, long pc) {
            this.isa = isa;
            this.pc = pc;
            this.word = word;
            this.before = before.clone();
            this.inputs = inputs;
            this.after = before.clone();
            this.written = new boolean[before.length];
        }

        void run(List<Transfer> body) {
            for (Transfer t : body) {
                if (t instanceof Transfer.ToState s) {
                    after[s.state()] = value(s.value());
                    written[s.state()] = true;
                } else if (t instanceof Transfer.ToSelected s) {
                    AddressedBit b = selected();
                    if (b != null && b.writable()) {
                        after[b.state()] = value(s.value());
                        written[b.state()] = true;
                    }
                } else if (t instanceof Transfer.ToPc p) {
                    jumped = true;
                    jumpTo = isa.fields().get(p.field()).extract(word);
                } else if (t instanceof Transfer.PcStep p) {
                    jumped = true;
                    jumpTo = p.from(pc, word, isa.fields());
                } else if (t instanceof Transfer.When w) {
                    run(value(w.cond()) ? w.then() : w.otherwise());
                }
            }
        }

        private AddressedBit selected() {
            if (isa.selectField() < 0) {
                return null;
            }
            IsaField f = isa.fields().get(isa.selectField());
            long addr = f.extract(word);
            for (AddressedBit b : isa.bitMap()) {
                if (b.address() == addr) {
                    return b;
                }
            }
            return null;
        }

        boolean value(Rtl e) {
            if (e instanceof Rtl.Const c) {
                return c.value();
            }
            if (e instanceof Rtl.State s) {
                return before[s.index()];
            }
            if (e instanceof Rtl.Input i) {
                return inputs[i.index()];
            }
            if (e instanceof Rtl.Selected) {
                AddressedBit b = selected();
                if (b == null) {
                    return false;
                }
                return b.state() >= 0 ? before[b.state()] : inputs[b.input()];
            }
            if (e instanceof Rtl.Not n) {
                return !value(n.operand());
            }
            if (e instanceof Rtl.And a) {
                return value(a.left()) && value(a.right());
            }
            if (e instanceof Rtl.Or o) {
                return value(o.left()) || value(o.right());
            }
            if (e instanceof Rtl.Xor x) {
                return value(x.left()) ^ value(x.right());
            }
            throw new IllegalStateException("unknown expression " + e);
        }
    }
}
