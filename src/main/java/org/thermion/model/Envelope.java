package org.thermion.model;

import java.util.List;

/**
 * One glass envelope: a tube of a type in a module, with the sections its stages use.
 * {@code slots} says which stage instance uses which section (in section order); a stage wider
 * than one envelope has slots in several. {@code pinned} when the description named it.
 */
public record Envelope(int id, String designator, int tube, int module, int sectionsUsed, List<Slot> slots,
                       boolean pinned) {
    public Envelope {
        slots = List.copyOf(slots);
    }

    /** Section {@code section} (1-based) used by a gate or latch of the netlist; index -1: a stage outside it (a soft start's). */
    public record Slot(int section, boolean latch, int index) {
    }
}
