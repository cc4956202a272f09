package org.thermion.tui;

import org.thermion.text.Nouns;
import org.thermion.asm.ListingLine;
import org.thermion.model.Instruction;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * After a reload: carries what the builder had set up in the old session over to the new one
 * where the machine still fits (latches and switches by name, the PC while the ROM still holds
 * it, the cycle count, breakpoints and the listing cursor by source line), and says in plain
 * lines what changed in the description and program and what could not be kept.
 */
final class Carry {
    private Carry() {
    }

    /** Moves the state over, points the view at the same source line; returns the lines for the notice. */
    static List<String> over(Session old, Session fresh, View view) {
        List<String> lines = new ArrayList<>(changes(old, fresh));
        lines.add("");
        lines.addAll(keep(old, fresh, view));
        return lines;
    }

    /** What differs between the two descriptions and programs, one line a kind of change. */
    static List<String> changes(Session old, Session fresh) {
        Machine a = old.machine();
        Machine b = fresh.machine();
        List<String> out = new ArrayList<>();
        if (!a.name().equals(b.name())) {
            out.add("machine " + a.name() + " is now " + b.name());
        }
        if (a.clock().phases() != b.clock().phases() || a.clock().periodSeconds() != b.clock().periodSeconds()) {
            out.add("clock: " + clock(a) + " \u2192 " + clock(b));
        }
        int tubesA = tubes(old);
        int tubesB = tubes(fresh);
        if (tubesA != tubesB) {
            out.add("tubes: " + tubesA + " \u2192 " + tubesB);
        }
        if (a.stageInstanceCount() != b.stageInstanceCount()) {
            out.add("stages: " + a.stageInstanceCount() + " \u2192 " + b.stageInstanceCount());
        }
        names(out, "latch", latchNames(a), latchNames(b));
        names(out, "switch", portNames(a.inputs()), portNames(b.inputs()));
        names(out, "lamp", portNames(a.outputs()), portNames(b.outputs()));
        instructions(out, a, b);
        java.util.Set<String> buses = new java.util.TreeSet<>(a.radixes().keySet());
        buses.addAll(b.radixes().keySet());
        for (String bus : buses) {
            if (a.radix(bus) != b.radix(bus)) {
                out.add("bus " + bus + " now written in " + Radix.of(b.radix(bus)).word() + " (was "
                        + Radix.of(a.radix(bus)).word() + ")");
            }
        }
        long[] wa = old.assembly().words();
        long[] wb = fresh.assembly().words();
        int differ = 0;
        for (int i = 0; i < Math.max(wa.length, wb.length); i++) {
            if ((i < wa.length ? wa[i] : 0) != (i < wb.length ? wb[i] : 0)) {
                differ++;
            }
        }
        if (differ > 0) {
            out.add("program: " + count(differ, "word") + " changed");
        }
        if (out.isEmpty()) {
            out.add("no change to the logic, the instruction set or the program");
        }
        return out;
    }

    /** Carries the state over; the lines say what was kept and what starts again. */
    static List<String> keep(Session old, Session fresh, View view) {
        List<String> out = new ArrayList<>();
        Machine a = old.machine();
        Machine b = fresh.machine();
        Map<String, Integer> newLatches = index(b.netlist().latches(), l -> b.netlist().netName(l.output()));
        int kept = 0;
        List<String> unknown = new ArrayList<>();
        List<Latch> oldLatches = a.netlist().latches();
        for (Latch l : oldLatches) {
            String name = a.netlist().netName(l.output());
            Integer at = newLatches.remove(name);
            if (at == null) {
                continue;
            }
            Level level = old.level(l.output());
            if (level == Level.UNKNOWN) {
                unknown.add(name);
            } else {
                fresh.carryLatch(at, level == Level.ON);
            }
            kept++;
        }
        int switches = 0;
        for (int i = 0; i < a.inputs().size(); i++) {
            Port p = a.inputs().get(i);
            int at = indexOf(b.inputs(), p.name());
            if (at >= 0) {
                fresh.carryInput(at, old.input(i));
                switches++;
            }
        }
        String pc = "";
        if (b.pc() != null && a.pc() != null) {
            if (b.rom() != null && old.pc() < b.rom().words()) {
                fresh.carryPc(old.pc());
                pc = "PC " + Hex.address(old.pc(), b) + ", ";
            } else {
                out.add("the PC starts at 0: the new ROM has no address " + Hex.address(old.pc(), a));
            }
        }
        fresh.carryCycles(old.cycle());
        int breakpoints = breakpoints(old, fresh);
        out.add(0, "kept: cycle " + String.format("%,d", old.cycle()) + ", " + pc + kept + " of " + count(oldLatches.size(), "latch")
                + ", " + count(switches, "switch") + ", " + count(breakpoints, "breakpoint"));
        if (!newLatches.isEmpty()) {
            out.add("at power-up state: " + list(new ArrayList<>(newLatches.keySet())) + " (new)");
        }
        if (!unknown.isEmpty()) {
            out.add("still unknown: " + list(unknown));
        }
        if (old.midCycle()) {
            out.add("the cycle in flight starts again at phase 1 (latches keep what this cycle loaded)");
        }
        out.add("the current meter's peaks start again from here");
        fresh.carried("reloaded");
        cursor(old, fresh, view);
        return out;
    }

    // Breakpoints move with their source line (the same text nearest the old line number).
    private static int breakpoints(Session old, Session fresh) {
        int kept = 0;
        List<ListingLine> was = old.assembly().listing();
        for (int i = 0; i < was.size(); i++) {
            ListingLine l = was.get(i);
            if (l.hasWord() && old.breakpoint(l.address())) {
                int now = sameLine(was, i, fresh.assembly().listing());
                if (now >= 0 && fresh.assembly().listing().get(now).hasWord()) {
                    int address = fresh.assembly().listing().get(now).address();
                    if (!fresh.breakpoint(address)) {
                        fresh.toggleBreakpoint(address);
                        kept++;
                    }
                }
            }
        }
        return kept;
    }

    // The listing cursor and scroll stay on the same source line where the new program still has it.
    private static void cursor(Session old, Session fresh, View view) {
        List<ListingLine> was = old.assembly().listing();
        List<ListingLine> now = fresh.assembly().listing();
        int at = view.cursor < was.size() ? sameLine(was, view.cursor, now) : -1;
        int moved = at >= 0 ? at - view.cursor : 0;
        view.cursor = Math.max(0, Math.min(Math.max(0, now.size() - 1), at >= 0 ? at : view.cursor));
        view.top = Math.max(0, view.top + moved);
    }

    /** The index in {@code now} of the line with the text of {@code was[i]} nearest its place, or -1. */
    static int sameLine(List<ListingLine> was, int i, List<ListingLine> now) {
        String text = was.get(i).sourceText().strip();
        int best = -1;
        for (int j = 0; j < now.size(); j++) {
            if (now.get(j).sourceText().strip().equals(text) && (best < 0 || Math.abs(j - i) < Math.abs(best - i))) {
                best = j;
            }
        }
        return best;
    }

    private static void names(List<String> out, String noun, List<String> was, List<String> now) {
        List<String> gone = new ArrayList<>(was);
        gone.removeAll(now);
        List<String> added = new ArrayList<>(now);
        added.removeAll(was);
        String plural = Nouns.plural(noun);
        if (!added.isEmpty()) {
            out.add((added.size() == 1 ? "new " + noun + ": " : "new " + plural + ": ") + list(added));
        }
        if (!gone.isEmpty()) {
            out.add((gone.size() == 1 ? noun + " gone: " : plural + " gone: ") + list(gone));
        }
    }

    private static void instructions(List<String> out, Machine a, Machine b) {
        if (a.isa() == null || b.isa() == null) {
            return;
        }
        Map<String, Instruction> was = new LinkedHashMap<>();
        a.isa().instructions().forEach(i -> was.put(i.mnemonic(), i));
        List<String> added = new ArrayList<>();
        List<String> changed = new ArrayList<>();
        for (Instruction i : b.isa().instructions()) {
            Instruction w = was.remove(i.mnemonic());
            if (w == null) {
                added.add(i.mnemonic());
            } else if (w.opcode() != i.opcode() || !w.body().equals(i.body())) {
                changed.add(i.mnemonic());
            }
        }
        if (!added.isEmpty()) {
            out.add("new instructions: " + list(added));
        }
        if (!was.isEmpty()) {
            out.add("instructions gone: " + list(new ArrayList<>(was.keySet())));
        }
        if (!changed.isEmpty()) {
            out.add("instructions with a new opcode or meaning: " + list(changed));
        }
    }

    private static String clock(Machine m) {
        return m.clock().phases() + " phases, " + StatusLines.machineTime(1, m.clock().periodSeconds()) + " a cycle";
    }

    private static int tubes(Session s) {
        int n = 0;
        for (ModuleLoad m : s.modules()) {
            n += m.tubes();
        }
        return n;
    }

    private static List<String> latchNames(Machine m) {
        Netlist n = m.netlist();
        List<String> names = new ArrayList<>();
        n.latches().forEach(l -> names.add(n.netName(l.output())));
        return names;
    }

    private static List<String> portNames(List<Port> ports) {
        List<String> names = new ArrayList<>();
        ports.forEach(p -> names.add(p.name()));
        return names;
    }

    private static int indexOf(List<Port> ports, String name) {
        for (int i = 0; i < ports.size(); i++) {
            if (ports.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    private static <T> Map<String, Integer> index(List<T> items, Function<T, String> name) {
        Map<String, Integer> m = new LinkedHashMap<>();
        for (int i = 0; i < items.size(); i++) {
            m.putIfAbsent(name.apply(items.get(i)), i);
        }
        return m;
    }

    private static String list(List<String> names) {
        return Words.list(names);
    }

    private static String count(long n, String noun) {
        return Nouns.count(n, noun);
    }
}
