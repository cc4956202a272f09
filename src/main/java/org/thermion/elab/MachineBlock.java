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
    int phases = 2;
    double period = 100e-6;
    String top;
    Span topSpan;
    int romWords = 0, romWidth = 0;
    String romData;
    Span romDataSpan;
    boolean romOffBoard = true;
    int pcWidth = 0, pcPhase = 0;
    String pcJump, pcTarget;
    Span pcJumpSpan, pcTargetSpan;
    final List<Value> inputs = new ArrayList<>();
    final List<Value> outputs = new ArrayList<>();
    Span span = Span.none();

    static MachineBlock read(Prop p, Parts parts, Diagnostics diags) {
        MachineBlock m = new MachineBlock();
        m.span = p.span();
        if (!p.values().isEmpty()) {
            m.name = p.values().get(0).text();
            m.nameSpan = p.values().get(0).span();
        }
        for (Prop q : p.block()) {
            PropReader r = new PropReader(q, diags);
            switch (q.key().text()) {
                case "clock" -> {
                    r.end();
                    for (Prop c : q.block()) {
                        PropReader cr = new PropReader(c, diags);
                        switch (c.key().text()) {
                            case "phases" -> m.phases = (int) Math.max(1, cr.whole("number of phases", 1, 8));
                            case "period" -> {
                                double v = cr.positive(Unit.SECOND, "clock period", false);
                                if (!Double.isNaN(v)) {
                                    m.period = v;
                                }
                            }
                            default -> parts.unknownKey(c, "clock", List.of("phases", "period"));
                        }
                        cr.end();
                    }
                }
                case "top" -> {
                    m.top = r.word("the top module's name");
                    m.topSpan = r.lastSpan();
                    r.end();
                }
                case "rom" -> {
                    r.end();
                    for (Prop c : q.block()) {
                        PropReader cr = new PropReader(c, diags);
                        switch (c.key().text()) {
                            case "words" -> m.romWords = (int) cr.whole("ROM size in words", 1, 1 << 20);
                            case "width" -> m.romWidth = (int) cr.whole("ROM word width", 1, 63);
                            case "data" -> {
                                m.romData = cr.word("the top module's input port for ROM data");
                                m.romDataSpan = cr.lastSpan();
                            }
                            case "offboard" -> m.romOffBoard = true;
                            default -> parts.unknownKey(c, "rom", List.of("words", "width", "data", "offboard"));
                        }
                        cr.end();
                    }
                }
                case "pc" -> {
                    r.end();
                    for (Prop c : q.block()) {
                        PropReader cr = new PropReader(c, diags);
                        switch (c.key().text()) {
                            case "width" -> m.pcWidth = (int) cr.whole("program counter width", 1, 20);
                            case "phase" -> m.pcPhase = (int) cr.whole("the phase the program counter loads on", 1, 8);
                            case "jump" -> {
                                m.pcJump = cr.word("the top module's jump output");
                                m.pcJumpSpan = cr.lastSpan();
                            }
                            case "target" -> {
                                m.pcTarget = cr.word("the top module's jump-target output");
                                m.pcTargetSpan = cr.lastSpan();
                            }
                            case "offboard" -> { }
                            default -> parts.unknownKey(c, "pc", List.of("width", "phase", "jump", "target", "offboard"));
                        }
                        cr.end();
                    }
                }
                case "inputs" -> m.inputs.addAll(words(q));
                case "outputs" -> m.outputs.addAll(words(q));
                default -> parts.unknownKey(q, "machine", List.of("clock", "top", "rom", "pc", "inputs", "outputs"));
            }
        }
        return m;
    }

    private static List<Value> words(Prop q) {
        List<Value> out = new ArrayList<>();
        for (Value v : q.values()) {
            if (!(v instanceof Value.Sym)) {
                out.add(v);
            }
        }
        return out;
    }
}
