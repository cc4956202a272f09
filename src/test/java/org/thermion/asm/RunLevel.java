package org.thermion.asm;

import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.model.StateBit;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.sim.reference.IsaInterpreter;

import java.util.ArrayList;
import java.util.List;

/**
 * One machine running one program, at the ISA level or the logic level, seen the way the
 * field sees it: inputs set before a cycle, outputs read after it. Records every output
 * change as "cycle name=value" so runs on both levels can be compared line for line.
 */
abstract class RunLevel {
    final Machine machine;
    final List<String> changes = new ArrayList<>();
    private final boolean[] last;

    RunLevel(Machine machine) {
        this.machine = machine;
        this.last = new boolean[machine.outputs().size()];
    }

    abstract void input(String name, boolean v);

    /** Runs one machine cycle (one instruction). */
    abstract void cycleOnce();

    abstract long cycle();

    /** The address of the next instruction. */
    abstract int pc();

    abstract boolean stateBit(String isaName);

    boolean output(String name) {
        for (StateBit s : machine.isa().state()) {
            if (name.equals(s.output())) {
                return stateBit(s.name());
            }
        }
        throw new IllegalArgumentException("no output " + name);
    }

    /** One cycle, then note which outputs changed. */
    void step() {
        cycleOnce();
        List<Port> outs = machine.outputs();
        for (int i = 0; i < outs.size(); i++) {
            boolean v = output(outs.get(i).name());
            if (v != last[i]) {
                changes.add(cycle() + " " + outs.get(i).name() + "=" + (v ? 1 : 0));
                last[i] = v;
            }
        }
    }

    void steps(int n) {
        for (int i = 0; i < n; i++) {
            step();
        }
    }

    /** The ISA level: the reference interpreter. */
    static final class Isa extends RunLevel {
        private final IsaInterpreter in;

        Isa(Machine m, long[] rom) {
            super(m);
            in = new IsaInterpreter(m);
            in.loadRom(rom);
            in.reset();
        }

        @Override
        void input(String name, boolean v) {
            in.setInput(name, v);
        }

        @Override
        void cycleOnce() {
            in.step();
        }

        @Override
        long cycle() {
            return in.cycle();
        }

        @Override
        int pc() {
            return in.pc();
        }

        @Override
        boolean stateBit(String isaName) {
            return in.state(isaName);
        }
    }

    /** The logic level: the netlist in the simulator, lane 0. */
    static final class Logic extends RunLevel {
        private final Simulator sim;

        Logic(Machine m, long[] rom) {
            super(m);
            sim = new Simulator(m);
            sim.loadRom(rom);
            sim.reset(new InitMode.Zero());
        }

        @Override
        void input(String name, boolean v) {
            sim.setInput(name, v);
        }

        @Override
        void cycleOnce() {
            sim.stepCycle();
            sim.settle();
        }

        @Override
        long cycle() {
            return sim.cycle();
        }

        @Override
        int pc() {
            return sim.pc(0);
        }

        @Override
        boolean stateBit(String isaName) {
            int i = machine.isa().stateIndex(isaName);
            return (sim.value(machine.isa().state().get(i).net()) & 1L) != 0;
        }
    }
}
