package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.lang.ast.Value;

import java.util.ArrayList;
import java.util.List;

/** The settings of a {@code machine} block, read but not yet bound to the logic. */
final class MachineBlock {
    String name = "machine";
    Span nameSpan = Span.none();
    int phases;
    double period;
    String top;
    Span topSpan;
    int romWords, romWidth;
    String romData;
    Span romDataSpan;
    boolean romOffBoard = true;
    /** 0 where not given: the width and phase then come from the ports and the clock. */
    int pcWidth, pcPhase;
    String pcJump, pcTarget;
    Span pcJumpSpan, pcTargetSpan;
    /** What the pc, rom and clock blocks say of how they are built. */
    BlockSpec pcSpec = BlockSpec.NONE;
    BlockSpec romSpec = BlockSpec.NONE;
    BlockSpec clockSpec = BlockSpec.NONE;
    final List<Value> inputs = new ArrayList<>();
    final List<Value> outputs = new ArrayList<>();
    /** Module instances not built yet (their outputs become switches). */
    final List<Value> notBuilt = new ArrayList<>();
    /** Per {@link #notBuilt} entry: the level its outputs are held at, or -1 for switches. */
    final List<Integer> notBuiltHeld = new ArrayList<>();
    /** Buses and the radix the screen writes them in (16, 10, 8 or 2), as declared. */
    final List<Value> radixBuses = new ArrayList<>();
    final List<Integer> radixes = new ArrayList<>();
    Span span = Span.none();

    static MachineBlock read(Prop p, Diagnostics diags) {
        MachineBlock m = new MachineBlock();
        m.span = p.span();
        if (!p.values().isEmpty()) {
            m.name = p.values().get(0).text();
            m.nameSpan = p.values().get(0).span();
        }
        PropBlock b = PropBlock.read(PropertyTable.MACHINE, p, "machine '" + m.name + "'",
                m.nameSpan.isKnown() ? m.nameSpan : p.key().span(), diags);
        PropBlock clock = b.nested("clock");
        m.phases = (int) clock.num("phases");
        m.period = clock.num("period");
        m.clockSpec = BlockSpec.read(clock);
        PropLine top = b.line("top");
        if (top != null) {
            m.top = top.word("module");
            m.topSpan = top.span("module");
        }
        PropBlock rom = b.nested("rom");
        m.romWords = (int) rom.num("words");
        m.romWidth = rom.has("width") ? (int) rom.num("width") : 0;
        m.romSpec = BlockSpec.read(rom);
        PropLine data = rom.line("data");
        if (data != null) {
            m.romData = data.word("port");
            m.romDataSpan = data.span("port");
        }
        PropBlock pc = b.nested("pc");
        m.pcWidth = pc.has("width") ? (int) pc.num("width") : 0;
        m.pcPhase = pc.has("phase") ? (int) pc.num("phase") : 0;
        m.pcSpec = BlockSpec.read(pc);
        PropLine jump = pc.line("jump");
        if (jump != null) {
            m.pcJump = jump.word("port");
            m.pcJumpSpan = jump.span("port");
        }
        PropLine target = pc.line("target");
        if (target != null) {
            m.pcTarget = target.word("port");
            m.pcTargetSpan = target.span("port");
        }
        for (PropLine l : b.lines("inputs")) {
            m.inputs.addAll(l.tokens("ports"));
        }
        for (PropLine l : b.lines("outputs")) {
            m.outputs.addAll(l.tokens("ports"));
        }
        for (PropLine l : b.lines("notbuilt")) {
            List<Value> names = l.tokens("instances");
            m.notBuilt.addAll(names);
            int held = l.has("held") ? (int) l.num("value") : -1;
            names.forEach(n -> m.notBuiltHeld.add(held));
        }
        for (PropLine l : b.lines("radix")) {
            String r = l.word("radix");
            int base = "decimal".equals(r) ? 10 : "octal".equals(r) ? 8 : "binary".equals(r) ? 2 : 16;
            for (Value v : l.tokens("buses")) {
                m.radixBuses.add(v);
                m.radixes.add(base);
            }
        }
        return m;
    }
}
