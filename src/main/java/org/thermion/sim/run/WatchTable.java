package org.thermion.sim.run;

import org.thermion.sim.WatchRow;

import java.util.ArrayList;
import java.util.List;

/** Tables watched names at the end of each cycle, with the logic settled on the cycle's loads. */
public final class WatchTable implements RunObserver {
    private final Clocked machine;
    private final List<Watch> watches;
    private final int pcWidth;
    private final List<WatchRow> rows = new ArrayList<>();

    /** @param pcWidth the program counter's width in bits (for a watched {@code pc}) */
    public WatchTable(Clocked machine, List<Watch> watches, int pcWidth) {
        this.machine = machine;
        this.watches = List.copyOf(watches);
        this.pcWidth = Math.max(1, pcWidth);
    }

    @Override
    public boolean wantsSettledPhases() {
        return !watches.isEmpty();
    }

    @Override
    public Halt cycleDone(long cycle, int pcStart) {
        List<String> values = new ArrayList<>(watches.size());
        for (Watch w : watches) {
            values.add(value(w));
        }
        rows.add(new WatchRow(cycle, pcStart, values));
        return null;
    }

    private String value(Watch w) {
        if (w.isPc()) {
            return machine.pcKnown() ? Levels.hex(machine.pc(), pcWidth) : "x";
        }
        int[] nets = w.nets();
        char[] bits = new char[nets.length];
        for (int b = 0; b < bits.length; b++) {
            bits[b] = machine.level(nets[b]);
        }
        return Levels.text(bits);
    }

    public List<String> names() {
        return watches.stream().map(Watch::name).toList();
    }

    public List<WatchRow> rows() {
        return List.copyOf(rows);
    }
}
