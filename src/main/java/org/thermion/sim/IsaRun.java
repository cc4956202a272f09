package org.thermion.sim;

import org.thermion.lang.Names;
import org.thermion.model.Isa;
import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.model.StateBit;
import org.thermion.sim.reference.IsaInterpreter;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Runs a program on the instruction-set level: the isa block's meanings, one instruction
 * per cycle, no gates. Output changes are stamped with the phase the PC loads on (the phase
 * the logic executes in). Ends like {@link LogicRun}: cycle limit or fixed point, where a
 * fixed point is a cycle that ran the same word as the one before it and changed no state
 * bit and not the PC (so it ends on the cycle the logic, with its instruction register, does).
 */
public final class IsaRun {
    private final Machine machine;
    private final IsaInterpreter isa;
    private final Stimulus stimulus;
    private final List<String> watchNames;
    private final long[] rom;

    /**
     * @param init zero, or random:SEED for the state the logic level would power up in (lane 0);
     *             unknown is not meaningful without gates
     * @param watchNames state bit or input names for the watch table
     */
    public IsaRun(Machine machine, long[] rom, InitMode init, Stimulus stimulus, List<String> watchNames) {
        if (init instanceof InitMode.Unknown) {
            throw new IllegalArgumentException("init mode unknown needs the logic level: the ISA level has no X");
        }
        this.machine = machine;
        this.isa = new IsaInterpreter(machine);
        this.stimulus = stimulus;
        this.watchNames = List.copyOf(watchNames);
        this.rom = Arrays.copyOf(rom, Math.min(rom.length, machine.rom().words()));
        isa.loadRom(this.rom);
        isa.reset();
        if (init instanceof InitMode.Random) {
            Simulator s = new Simulator(machine);
            s.reset(init);
            List<StateBit> state = machine.isa().state();
            for (int i = 0; i < state.size(); i++) {
                isa.setState(i, (s.value(state.get(i).net()) & 1L) != 0);
            }
        }
        for (String n : watchNames) {
            if (machine.isa().stateIndex(n) < 0 && machine.input(n) == null) {
                throw new IllegalArgumentException("no state bit or input named '" + n + "' at the ISA level"
                        + hint(n));
            }
        }
    }

    private String hint(String n) {
        List<String> names = new ArrayList<>(machine.isa().state().stream().map(StateBit::name).toList());
        machine.inputs().forEach(p -> names.add(p.name()));
        String h = Names.didYouMean(n, names);
        return h == null ? "" : "; " + h;
    }

    public RunResult run(long maxCycles) {
        Isa spec = machine.isa();
        List<StateBit> state = spec.state();
        List<Port> inputs = machine.inputs();
        boolean[] in = new boolean[inputs.size()];
        Stimulus.Cursor cursor = stimulus == null ? null : stimulus.cursor();
        if (cursor != null) {
            cursor.advance(0, in);
        }
        applyInputs(in);
        List<Port> outputs = machine.outputs();
        int[] outState = new int[outputs.size()];
        for (int o = 0; o < outputs.size(); o++) {
            outState[o] = -1;
            for (int s = 0; s < state.size(); s++) {
                if (outputs.get(o).name().equals(state.get(s).output())
                        || (state.get(s).output() == null && state.get(s).net() == outputs.get(o).net())) {
                    outState[o] = s;
                }
            }
        }
        boolean[] last = new boolean[outputs.size()];
        for (int o = 0; o < outputs.size(); o++) {
            last[o] = outState[o] >= 0 && isa.state(outState[o]);
        }
        StringBuilder initial = new StringBuilder();
        for (boolean b : last) {
            initial.append(b ? '1' : '0');
        }
        int phase = machine.pc().phase();
        List<OutputChange> changes = new ArrayList<>();
        List<WatchRow> rows = new ArrayList<>();
        String stop = "cycle limit of " + maxCycles + " reached";
        long cycles = 0;
        boolean[] before = new boolean[state.size()];
        long lastWord = -1;
        for (long c = 0; c < maxCycles; c++) {
            if (c > 0 && cursor != null && cursor.advance(c, in)) {
                applyInputs(in);
            }
            for (int s = 0; s < before.length; s++) {
                before[s] = isa.state(s);
            }
            int pcStart = isa.pc();
            isa.step();
            cycles = c + 1;
            for (int o = 0; o < outputs.size(); o++) {
                if (outState[o] >= 0 && isa.state(outState[o]) != last[o]) {
                    last[o] = !last[o];
                    changes.add(new OutputChange(c, phase, outputs.get(o).name(), last[o] ? '1' : '0'));
                }
            }
            if (!watchNames.isEmpty()) {
                StringBuilder sb = new StringBuilder();
                for (String n : watchNames) {
                    int s = spec.stateIndex(n);
                    boolean v = s >= 0 ? isa.state(s) : in[inputIndex(n)];
                    sb.append(v ? '1' : '0');
                }
                rows.add(new WatchRow(c, pcStart, sb.toString()));
            }
            // As the logic's instruction register must first take the repeated word, a cycle counts as
            // repeating only when it ran the same word as the cycle before it.
            long word = pcStart < rom.length ? rom[pcStart] : 0L;
            boolean same = isa.pc() == pcStart && word == lastWord;
            lastWord = word;
            for (int s = 0; s < before.length && same; s++) {
                same = before[s] == isa.state(s);
            }
            if (same && (cursor == null || !cursor.pending())) {
                stop = "fixed point at address " + pcStart + ": the machine repeats cycle " + c
                        + " unchanged from here on";
                break;
            }
        }
        StringBuilder st = new StringBuilder();
        for (int s = 0; s < state.size(); s++) {
            st.append(isa.state(s) ? '1' : '0');
        }
        return new RunResult(cycles, stop, changes, List.of(), state.stream().map(StateBit::name).toList(),
                st.toString(), isa.pc(), true, watchNames, rows, initial.toString());
    }

    private int inputIndex(String name) {
        List<Port> inputs = machine.inputs();
        for (int i = 0; i < inputs.size(); i++) {
            if (inputs.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    private void applyInputs(boolean[] in) {
        for (int i = 0; i < in.length; i++) {
            isa.setInput(i, in[i]);
        }
    }
}
