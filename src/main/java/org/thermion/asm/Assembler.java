package org.thermion.asm;

import org.thermion.lang.Diagnostic;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.ProgramReader;
import org.thermion.lang.SourceSet;
import org.thermion.lang.SourceText;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Ident;
import org.thermion.lang.program.AsmExpr;
import org.thermion.lang.program.ProgramLine;
import org.thermion.lang.program.ProgramSource;
import org.thermion.lang.program.Statement;
import org.thermion.model.AddressedBit;
import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.IsaField;
import org.thermion.model.Machine;
import org.thermion.model.Meanings;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Assembles a program for a described machine in two passes: the first places every word
 * and defines labels and constants, the second encodes each instruction from the machine's
 * ISA (opcode field plus the operand in the field {@link OperandRule} chooses).
 */
public final class Assembler {
    /** The directives, without their dot. */
    static final List<String> DIRECTIVES = List.of("at", "const", "word");

    private final Machine machine;
    private final Isa isa;
    private final Diagnostics diags;
    private final Symbols symbols;

    private Assembler(Machine machine, Diagnostics diags) {
        this.machine = machine;
        this.isa = machine.isa();
        this.diags = diags;
        this.symbols = new Symbols(isa, diags);
    }

    /** Reads and assembles {@code program}; null after errors (they are in {@code d}). */
    public static Assembly assemble(Machine m, Path program, Diagnostics d) {
        return assemble(m, program, new SourceSet(), d);
    }

    /** As {@link #assemble(Machine, Path, Diagnostics)}, keeping the text in {@code sources} for diagnostics. */
    public static Assembly assemble(Machine m, Path program, SourceSet sources, Diagnostics d) {
        String text = SourceText.read(program, "program", sources, d);
        if (text == null) {
            return null;
        }
        return assembleText(m, program, text, sources, d);
    }

    /** Assembles {@code text} as if read from {@code nominal}. */
    public static Assembly assembleText(Machine m, Path nominal, String text, SourceSet sources, Diagnostics d) {
        sources.put(nominal, text);
        if (m.isa() == null) {
            d.error(new Span(nominal, 0, 0, 0, 0), "machine '" + m.name() + "' has no isa block, so it has no instructions", null);
            return null;
        }
        // Both passes and the reader report into a local list, handed on in source order.
        Diagnostics local = new Diagnostics();
        ProgramSource src = ProgramReader.parse(nominal, text, local);
        Assembly a = new Assembler(m, local).run(src);
        local.all().stream()
                .sorted(Comparator.comparingInt((Diagnostic x) -> x.span().line()).thenComparingInt(x -> x.span().col()))
                .forEach(d::add);
        // Errors past the local limit were counted but not kept; hand on the count, so the
        // summary still says how many there were (d keeps none of these: it is full by now).
        for (int i = 0; i < local.dropped(); i++) {
            d.add(Diagnostic.error(Span.none(), "error past the limit", null));
        }
        return local.hasErrors() ? null : a;
    }

    /** Where pass one put a word-producing line. */
    private record Placed(ProgramLine line, int address) {
    }

    private Assembly run(ProgramSource src) {
        for (ProgramLine l : src.lines()) {
            if (l.label() != null) {
                symbols.announceLabel(l.label().text());
            }
        }
        List<Placed> placed = place(src);
        long[] rom = new long[machine.rom().words()];
        Map<Integer, Long> wordOf = new HashMap<>();
        for (Placed p : placed) {
            Long w = encode(p.line().statement(), p.address());
            if (w != null) {
                rom[p.address()] = w;
                wordOf.put(p.line().number(), w);
            }
        }
        if (diags.hasErrors()) {
            return null;
        }
        Map<Integer, Integer> addressOf = new HashMap<>();
        placed.forEach(p -> addressOf.put(p.line().number(), p.address()));
        List<ListingLine> listing = new ArrayList<>();
        for (ProgramLine l : src.lines()) {
            Integer a = addressOf.get(l.number());
            listing.add(a == null ? new ListingLine(-1, 0, false, l.number(), l.text())
                    : new ListingLine(a, wordOf.get(l.number()), true, l.number(), l.text()));
        }
        return new Assembly(rom, List.copyOf(listing));
    }

    /** Pass one: addresses, labels, constants, origins; the ROM's bounds and overlaps. */
    private List<Placed> place(ProgramSource src) {
        int romWords = machine.rom().words();
        long address = 0;
        boolean overflowReported = false;
        Map<Long, ProgramLine> holder = new HashMap<>();
        List<Placed> placed = new ArrayList<>();
        for (ProgramLine l : src.lines()) {
            Statement s = l.statement();
            String directive = null;
            if (s instanceof Statement.Directive d && checkShape(d)) {
                directive = d.word().text().toLowerCase();
            }
            if ("at".equals(directive)) {
                Statement.Directive d = (Statement.Directive) s;
                Long v = symbols.value(d.value(), "name");
                if (v != null) {
                    if (v < 0 || v >= romWords) {
                        diags.error(d.value().span(), "origin " + v + " is outside the ROM",
                                "the " + romWords + "-word ROM has addresses 0.." + (romWords - 1));
                    } else {
                        address = v;
                    }
                }
            }
            if (l.label() != null) {
                symbols.defineLabel(l.label().text(), l.label().span(), address);
            }
            if ("const".equals(directive)) {
                Statement.Directive d = (Statement.Directive) s;
                symbols.defineConstant(d.name().text(), d.name().span(), d.value());
            }
            boolean makesWord = s instanceof Statement.Op || "word".equals(directive);
            if (!makesWord) {
                continue;
            }
            if (address >= romWords) {
                if (!overflowReported) {
                    diags.error(s.span(), "program larger than the ROM: this word would go to address " + address,
                            "the " + romWords + "-word ROM ends at address " + (romWords - 1));
                    overflowReported = true;
                }
                address++;
                continue;
            }
            ProgramLine before = holder.putIfAbsent(address, l);
            if (before != null) {
                diags.error(s.span(), "address " + address + " already holds the word from line " + before.number(),
                        "check the .at origins: they make the program overlap itself");
            } else {
                placed.add(new Placed(l, (int) address));
            }
            address++;
        }
        return placed;
    }

    /** Checks a directive's word and shape (once, in pass one); reports problems. */
    private boolean checkShape(Statement.Directive d) {
        String w = d.word().text().toLowerCase();
        switch (w) {
            case "at" -> {
                if (d.name() != null || d.value() == null) {
                    return shapeError(d, "`.at ADDRESS` places the next word at ADDRESS");
                }
            }
            case "const" -> {
                if (d.name() == null || d.value() == null) {
                    return shapeError(d, "`.const NAME = VALUE` names a constant");
                }
            }
            case "word" -> {
                if (d.name() != null || d.value() == null) {
                    return shapeError(d, "`.word VALUE` puts VALUE into the ROM as it is");
                }
            }
            default -> {
                String near = Names.nearestWord(w, DIRECTIVES, 1);
                diags.error(d.word().span(), "unknown directive '." + d.word().text() + "'",
                        near != null ? "did you mean '." + near + "'?"
                                : "the directives are .at ADDRESS, .const NAME = VALUE and .word VALUE");
                return false;
            }
        }
        return true;
    }

    private boolean shapeError(Statement.Directive d, String how) {
        diags.error(d.span(), "malformed ." + d.word().text().toLowerCase() + " directive", how);
        return false;
    }

    /** Pass two: one word, or null after a reported error. */
    private Long encode(Statement s, int address) {
        if (s instanceof Statement.Directive d) {
            Long v = symbols.value(d.value(), "name");
            if (v == null) {
                return null;
            }
            if (v < 0 || (isa.wordBits() < 63 && v >= (1L << isa.wordBits()))) {
                diags.error(d.value().span(), "value " + v + " does not fit a " + isa.wordBits() + "-bit ROM word",
                        "use 0.." + ((1L << isa.wordBits()) - 1));
                return null;
            }
            return v;
        }
        Statement.Op op = (Statement.Op) s;
        Ident m = op.mnemonic();
        Instruction ins = isa.byMnemonic(m.text());
        if (ins == null) {
            List<String> known = isa.instructions().stream().map(Instruction::mnemonic).toList();
            String near = Names.nearestWord(m.text(), known, 2);
            diags.error(m.span(), "unknown mnemonic '" + m.text() + "'",
                    near != null ? "did you mean '" + near + "'?" : (known.size() == 1 ? "the one instruction is " : "the " + known.size() + " instructions are ") + String.join(" ", known));
            return null;
        }
        long word = isa.opcode().place(ins.opcode());
        OperandRule rule = OperandRule.of(isa, ins);
        if (rule.kind() == OperandRule.Kind.NONE) {
            if (op.operand() != null) {
                diags.error(op.operand().span(), ins.mnemonic() + " takes no operand", "write " + ins.mnemonic() + " alone");
                return null;
            }
            return word;
        }
        IsaField f = isa.fields().get(rule.field());
        long max = (1L << f.width()) - 1;
        boolean jumps = rule.kind() == OperandRule.Kind.TARGET || rule.kind() == OperandRule.Kind.OFFSET;
        String what = jumps ? "a jump target (label or address)" : "a bit (name or address)";
        if (op.operand() == null) {
            diags.error(new Span(m.span().file(), m.span().line(), m.span().endCol(), m.span().line(), m.span().endCol() + 1),
                    ins.mnemonic() + " needs an operand", "expected " + what + " for the " + f.width() + "-bit field '"
                            + f.name() + "' (0.." + max + ")");
            return null;
        }
        Long v = symbols.value(op.operand(), jumps ? "label" : "name");
        if (v == null) {
            return null;
        }
        if (rule.kind() == OperandRule.Kind.OFFSET) {
            long range = 1L << machine.pc().width();
            long distance = rule.fieldFor(v, address, range);
            if (distance > max) {
                diags.error(op.operand().span(), "jump target " + v + " is out of reach of " + ins.mnemonic() + " at address "
                        + address + ": the " + f.width() + "-bit field '" + f.name() + "' would need " + distance,
                        "a relative jump " + (rule.step().minusField() ? "goes back" : "goes ahead") + " 0.." + max
                                + " words from address + " + rule.step().offset());
                return null;
            }
            return word | f.place(distance);
        }
        if (v < 0 || v > max) {
            diags.error(op.operand().span(), "operand " + v + (v < 0 ? " is negative: it does not fit" : " is too wide for")
                    + " the " + f.width() + "-bit field '" + f.name() + "'", "expected " + what + " from 0 to " + max);
            return null;
        }
        if (rule.kind() == OperandRule.Kind.BIT) {
            warnAboutBit(ins, op.operand(), v);
        } else if (v >= machine.rom().words()) {
            diags.warning(op.operand().span(), "jump target " + v + " is past the end of the "
                    + machine.rom().words() + "-word ROM", null);
        }
        return word | f.place(v);
    }

    /** Stores to an input, or to an address nothing is mapped at, change nothing: say so. */
    private void warnAboutBit(Instruction ins, AsmExpr operand, long address) {
        if (!Meanings.writesSelected(ins.body())) {
            return;
        }
        AddressedBit b = symbols.bitAt(address);
        if (b == null) {
            diags.warning(operand.span(), ins.mnemonic() + " writes address " + address
                    + ", where no bit is mapped: it changes nothing", null);
        } else if (!b.writable()) {
            diags.warning(operand.span(), ins.mnemonic() + " writes '" + b.name() + "', a machine input: it changes nothing", null);
        }
    }
}
