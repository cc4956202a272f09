package org.thermion.sim.run;

import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.sim.OutputChange;

import java.util.ArrayDeque;
import java.util.BitSet;
import java.util.List;

/**
 * Records every change of the machine's outputs, a bus of output ports as one number, in the
 * phase whose latch loads cause it (gate-driven outputs are read with the logic settled after
 * the loads). Keeps the last {@code capacity} changes and counts them all.
 */
public final class OutputRecorder implements RunObserver {
    private final Clocked machine;
    private final Machine model;
    private final List<Watch> outputs;
    // Per output: its nets LSB first, and their levels at the last change.
    private final int[][] nets;
    private final char[][] last;
    private final int capacity;
    private final boolean settled;
    private final ArrayDeque<OutputChange> changes = new ArrayDeque<>();
    private long count;
    private String initial = "";

    /** @param capacity how many of the latest changes to keep (at least 1) */
    public OutputRecorder(Clocked machine, Machine model, int capacity) {
        this.machine = machine;
        this.model = model;
        this.outputs = Watches.outputs(model);
        this.nets = new int[outputs.size()][];
        this.last = new char[outputs.size()][];
        for (int i = 0; i < nets.length; i++) {
            nets[i] = outputs.get(i).nets();
            last[i] = new char[nets[i].length];
        }
        this.capacity = Math.max(1, capacity);
        BitSet latched = new BitSet();
        for (Latch l : model.netlist().latches()) {
            latched.set(l.output());
        }
        boolean all = true;
        for (Watch w : outputs) {
            for (int n : w.nets()) {
                all &= latched.get(n);
            }
        }
        this.settled = !all;
    }

    /** Keeps every change. */
    public OutputRecorder(Clocked machine, Machine model) {
        this(machine, model, Integer.MAX_VALUE);
    }

    @Override
    public void begin(long cycle) {
        changes.clear();
        count = 0;
        for (int i = 0; i < last.length; i++) {
            for (int b = 0; b < nets[i].length; b++) {
                last[i][b] = machine.level(nets[i][b]);
            }
        }
        StringBuilder sb = new StringBuilder();
        model.outputs().forEach(p -> sb.append(machine.level(p.net())));
        initial = sb.toString();
    }

    @Override
    public boolean wantsSettledPhases() {
        return settled;
    }

    @Override
    public void phaseSettled(long cycle, int phase) {
        for (int i = 0; i < last.length; i++) {
            int[] n = nets[i];
            char[] was = last[i];
            boolean changed = false;
            for (int b = 0; b < n.length; b++) {
                char now = machine.level(n[b]);
                changed |= now != was[b];
                was[b] = now;
            }
            if (changed) {
                count++;
                if (changes.size() == capacity) {
                    changes.removeFirst();
                }
                changes.addLast(new OutputChange(cycle, phase, outputs.get(i).name(), Levels.text(was)));
            }
        }
    }

    /** The changes kept, oldest first. */
    public List<OutputChange> changes() {
        return List.copyOf(changes);
    }

    /** Changes since {@link #begin}, also those no longer kept. */
    public long count() {
        return count;
    }

    /** Every output port's level at the start, one '0', '1' or 'x' each, in machine order. */
    public String initial() {
        return initial;
    }
}
