package org.thermion.sim.run;

import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.model.StateBit;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.sim.reference.IsaInterpreter;

import java.util.Arrays;
import java.util.List;

/**
 * The instruction-set meaning as the {@link RunDriver} clocks it: one instruction a cycle, run in
 * the phase the PC loads on (where the logic executes it; the last phase on a switch-fed machine,
 * whose word comes from the switches), no gates. A net reads as the state bit
 * it holds, the output it shows or the input it carries; any other net reads 0.
 */
public final class IsaLane implements Clocked {
    private final IsaInterpreter isa;
    private final int phases;
    private final int pcPhase;
    private final long[] rom;
    private final boolean hasPc;
    private final boolean switchFed;
    // Per net: the state bit it holds or shows (>= 0), or -2 - the input it carries, or -1.
    private final int[] source;
    private final boolean[] inputs;
    private final boolean[] before;
    private int nextPhase = 1;
    private long cycle;
    private int pcStart;
    private long lastWord = -1;

    /**
     * @param init zero, or random:SEED for the state the logic would power up in (lane 0);
     *             unknown has no meaning without gates
     */
    public IsaLane(Machine machine, long[] rom, InitMode init) {
        if (init instanceof InitMode.Unknown) {
            throw new IllegalArgumentException("init mode unknown needs the logic level: the ISA level has no X");
        }
        this.isa = new IsaInterpreter(machine);
        this.phases = machine.clock().phases();
        // A switch-fed machine has no PC: its instruction acts in the last phase, where its latches load.
        this.pcPhase = machine.pc() == null ? phases : machine.pc().phase();
        this.hasPc = machine.pc() != null;
        this.switchFed = machine.isa().wordFromSwitches();
        this.rom = Arrays.copyOf(rom, Math.min(rom.length, machine.rom() == null ? 0 : machine.rom().words()));
        isa.loadRom(this.rom);
        isa.reset();
        List<StateBit> state = machine.isa().state();
        if (init instanceof InitMode.Random) {
            Simulator s = new Simulator(machine);
            s.reset(init);
            for (int i = 0; i < state.size(); i++) {
                isa.setState(i, (s.value(state.get(i).net()) & 1L) != 0);
            }
        }
        this.inputs = new boolean[machine.inputs().size()];
        this.before = new boolean[state.size()];
        this.source = new int[machine.netlist().netCount()];
        Arrays.fill(source, -1);
        for (int i = 0; i < inputs.length; i++) {
            source[machine.inputs().get(i).net()] = -2 - i;
        }
        for (int s = 0; s < state.size(); s++) {
            if (state.get(s).net() >= 0) {
                source[state.get(s).net()] = s;
            }
        }
        for (Port o : machine.outputs()) {
            for (int s = 0; s < state.size(); s++) {
                if (o.name().equals(state.get(s).output())
                        || (state.get(s).output() == null && state.get(s).net() == o.net())) {
                    source[o.net()] = s;
                }
            }
        }
    }

    /** The interpreter, for its state bits by index. */
    public IsaInterpreter interpreter() {
        return isa;
    }

    @Override
    public int phases() {
        return phases;
    }

    @Override
    public long cycle() {
        return cycle;
    }

    @Override
    public int nextPhase() {
        return nextPhase;
    }

    @Override
    public void stepPhase() {
        if (nextPhase == pcPhase) {
            isa.step();
        }
        if (++nextPhase > phases) {
            nextPhase = 1;
            cycle++;
        }
    }

    @Override
    public void settle() {
    }

    @Override
    public void setInput(int index, boolean value) {
        inputs[index] = value;
        isa.setInput(index, value);
    }

    @Override
    public int pc() {
        return isa.pc();
    }

    @Override
    public boolean pcKnown() {
        return true;
    }

    @Override
    public boolean hasPc() {
        return hasPc;
    }

    @Override
    public char level(int net) {
        int s = source[net];
        boolean v = s >= 0 ? isa.state(s) : s <= -2 && inputs[-2 - s];
        return v ? '1' : '0';
    }

    @Override
    public void beginCycle() {
        for (int s = 0; s < before.length; s++) {
            before[s] = isa.state(s);
        }
        pcStart = isa.pc();
    }

    // As the logic's instruction register must first take the repeated word, a cycle counts as
    // repeating only when it ran the same word as the cycle before it.
    @Override
    public boolean repeated() {
        long word = switchFed ? IsaInterpreter.switchWord(isa.machine().isa(), inputs) : pcStart < rom.length ? rom[pcStart] : 0L;
        boolean same = isa.pc() == pcStart && word == lastWord;
        lastWord = word;
        for (int s = 0; s < before.length && same; s++) {
            same = before[s] == isa.state(s);
        }
        return same;
    }
}
