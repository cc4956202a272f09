package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.IsaOp;
import org.thermion.lang.ast.Prop;
import org.thermion.model.AddressedBit;
import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.IsaField;
import org.thermion.model.Port;
import org.thermion.model.StateBit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Resolves an {@code isa} block against the elaborated logic: word, fields, state bits, the bit
 * map and the opcodes; each instruction's meaning goes to {@link IsaMeanings}.
 */
final class IsaBuilder {
    private final Diagnostics diags;
    private final Map<String, Signal> topScope;
    private final NetBuilder nb;
    private final List<Port> inputs;
    private final List<Port> outputs;

    IsaBuilder(Diagnostics diags, Map<String, Signal> topScope, NetBuilder nb, List<Port> inputs, List<Port> outputs) {
        this.diags = diags;
        this.topScope = topScope;
        this.nb = nb;
        this.inputs = inputs;
        this.outputs = outputs;
    }

    /** A switch-fed word excludes a ROM; a meaning that moves the PC needs one. */
    static void checkWordSource(Isa isa, org.thermion.model.Rom rom, org.thermion.model.ProgramCounter pc, Decl.Isa d,
                                Diagnostics diags) {
        if (isa.wordFromSwitches() && rom != null) {
            diags.error(d.name().span(), "the isa's word comes from switches, but the machine has a rom too",
                    "drop `from ...` from `word`, or the machine's rom");
        }
        if (pc == null && isa.inhibitNet() >= 0) {
            diags.error(d.name().span(), "the isa inhibits the decoder to skip, but the machine has no pc",
                    "a skip needs a program counter; drop `inhibit` from a switch-fed machine");
        }
        if (pc == null) {
            for (org.thermion.model.Instruction ins : isa.instructions()) {
                if (org.thermion.model.Meanings.writesPc(ins.body())) {
                    diags.error(d.name().span(), ins.mnemonic() + " assigns the pc, but the machine has none",
                            "give the machine a `pc { ... }`, or leave pc out of the meanings of a switch-fed machine");
                    return;
                }
            }
        }
    }

    Isa build(Decl.Isa d) {
        int word = 0;
        List<IsaField> fields = new ArrayList<>();
        Map<String, Span> fieldSpans = new HashMap<>();
        List<Prop> fieldProps = new ArrayList<>();
        String opcode = null, target = null, select = null;
        Span opcodeSpan = d.span(), targetSpan = d.span(), selectSpan = d.span();
        List<StateBit> state = new ArrayList<>();
        List<Prop> bitProps = new ArrayList<>();
        String wordPort = null;
        Span wordPortSpan = d.span();
        int inhibitNet = -1;
        for (Prop p : d.props()) {
            PropReader r = new PropReader(p, diags);
            switch (p.key().text()) {
                case "word" -> {
                    word = (int) r.whole("instruction word width", 1, 63);
                    r.acceptWord("bits");
                    if (r.acceptWord("from")) {
                        wordPort = r.word("the machine input (switches) the word comes from");
                        wordPortSpan = r.lastSpan();
                    }
                }
                case "inhibit" -> {
                    String path = r.word("the latch that inhibits the decoder");
                    Span ps = r.lastSpan();
                    if (path != null) {
                        StateBit sb = bindState("inhibit", path, ps, ps);
                        if (sb != null) {
                            inhibitNet = sb.net();
                        }
                    }
                }
                case "field" -> {
                    String name = r.word("a field name");
                    Span ns = r.lastSpan();
                    // Bounded here, fitted to the word after the block: `word` may come later.
                    long hi = r.whole("the field's high bit", 0, 62);
                    r.expectSym("..");
                    long lo = r.whole("the field's low bit", 0, 62);
                    if (name != null && !r.failed()) {
                        if (fieldSpans.containsKey(name)) {
                            diags.error(ns, "duplicate field '" + name + "'", "first declared at " + fieldSpans.get(name));
                        } else if (hi < lo) {
                            diags.error(p.span(), "field '" + name + "' bits " + hi + ".." + lo + " are written low..high",
                                    "write fields high..low, e.g. " + lo + ".." + hi);
                        } else {
                            fields.add(new IsaField(name, (int) hi, (int) lo));
                            fieldSpans.put(name, ns);
                            fieldProps.add(p);
                        }
                    }
                }
                case "opcode" -> {
                    opcode = r.word("the opcode field");
                    opcodeSpan = r.lastSpan();
                }
                case "target" -> {
                    target = r.word("the jump-target field");
                    targetSpan = r.lastSpan();
                }
                case "select" -> {
                    select = r.word("the bit-address field");
                    selectSpan = r.lastSpan();
                }
                case "state" -> {
                    String name = r.word("a state bit name");
                    Span ns = r.lastSpan();
                    r.expectSym("=");
                    String path = r.word("a latch in the top module");
                    Span ps = r.lastSpan();
                    if (name != null && path != null) {
                        StateBit sb = bindState(name, path, ns, ps);
                        if (sb != null) {
                            if (state.stream().anyMatch(x -> x.name().equals(name))) {
                                diags.error(ns, "duplicate state bit '" + name + "'", null);
                            } else {
                                state.add(sb);
                            }
                        }
                    }
                }
                case "bit" -> {
                    bitProps.add(p);
                    continue;
                }
                default -> diags.error(p.key().span(), "unknown property '" + p.key().text() + "' in isa",
                        Declarations.hintFor(p.key().text(), List.of("word", "field", "opcode", "target", "select", "state", "bit",
                                "inhibit", "op"), "expected word, field, opcode, target, select, state, bit, inhibit or op"));
            }
            r.end();
        }
        if (word == 0) {
            diags.error(d.name().span(), "isa has no word width", "add `word 12` (bits per instruction)");
            return null;
        }
        List<IsaField> fitting = new ArrayList<>();
        for (int i = 0; i < fields.size(); i++) {
            IsaField fd = fields.get(i);
            if (fd.hi() >= word) {
                diags.error(fieldProps.get(i).span(), "field '" + fd.name() + "' bits " + fd.hi() + ".." + fd.lo()
                        + " do not fit a " + word + "-bit word", "write fields high..low within 0.." + (word - 1));
            } else {
                fitting.add(fd);
            }
        }
        fields = fitting;
        int opcodeField = field(fields, opcode, opcodeSpan, "opcode", true);
        int targetField = field(fields, target, targetSpan, "target", false);
        int selectField = field(fields, select, selectSpan, "select", false);
        List<AddressedBit> map = new ArrayList<>();
        for (Prop p : bitProps) {
            PropReader r = new PropReader(p, diags);
            Span as = r.here();
            long addr = r.whole("a bit address");
            r.expectSym("=");
            String name = r.word("an input or state bit");
            Span ns = r.lastSpan();
            r.end();
            if (r.failed()) {
                continue;
            }
            if (selectField >= 0 && addr >= (1L << fields.get(selectField).width())) {
                diags.error(as, "bit address " + addr + " does not fit the " + fields.get(selectField).width()
                        + "-bit select field", null);
                continue;
            }
            if (map.stream().anyMatch(b -> b.address() == addr)) {
                diags.error(as, "bit address " + addr + " is mapped twice", null);
                continue;
            }
            int in = indexOf(inputs, name);
            int st = stateIndex(state, name);
            if (in < 0 && st < 0) {
                List<String> known = new ArrayList<>();
                inputs.forEach(x -> known.add(x.name()));
                state.forEach(x -> known.add(x.name()));
                diags.error(ns, "unknown bit '" + name + "'", Declarations.hintFor(name, known, "name a machine input or a state bit"));
                continue;
            }
            map.add(new AddressedBit(addr, name, st >= 0 ? -1 : in, st));
        }
        List<Instruction> instrs = new ArrayList<>();
        Map<Long, IsaOp> byCode = new HashMap<>();
        Map<String, IsaOp> byName = new HashMap<>();
        IsaMeanings meanings = new IsaMeanings(diags, fields, state, inputs, selectField);
        for (IsaOp op : d.ops()) {
            long code = constantOf(op);
            String m = op.mnemonic().text();
            if (byName.containsKey(m.toUpperCase())) {
                diags.error(op.mnemonic().span(), "mnemonic '" + m + "' is defined twice", "first at " + byName.get(m.toUpperCase()).span());
                continue;
            }
            byName.put(m.toUpperCase(), op);
            if (code < 0) {
                continue;
            }
            if (opcodeField >= 0 && code >= (1L << fields.get(opcodeField).width())) {
                diags.error(op.opcode().span(), "opcode " + code + " of " + m + " is wider than the "
                        + fields.get(opcodeField).width() + "-bit opcode field",
                        "use an opcode from 0 to " + ((1L << fields.get(opcodeField).width()) - 1));
                continue;
            }
            if (byCode.containsKey(code)) {
                diags.error(op.opcode().span(), "opcode " + code + " is used twice: by " + byCode.get(code).mnemonic().text()
                        + " and " + m, "give each instruction its own opcode");
                continue;
            }
            byCode.put(code, op);
            instrs.add(new Instruction(m, code, meanings.stmts(op.body())));
        }
        int[] wordInputs = wordPort == null ? new int[0] : wordInputs(wordPort, wordPortSpan, word);
        return new Isa(word, List.copyOf(fields), Math.max(0, opcodeField), targetField, List.copyOf(state), List.copyOf(map),
                selectField, List.copyOf(instrs), wordInputs, inhibitNet);
    }

    /** The machine inputs of {@code port} (one bit, or a bus LSB first) that carry a {@code word}-bit instruction word. */
    private int[] wordInputs(String port, Span at, int word) {
        java.util.TreeMap<Integer, Integer> bits = new java.util.TreeMap<>();
        for (int i = 0; i < inputs.size(); i++) {
            String n = inputs.get(i).name();
            if (n.equals(port)) {
                bits.put(0, i);
            } else if (n.startsWith(port + "[") && n.endsWith("]")) {
                bits.put(Integer.parseInt(n.substring(port.length() + 1, n.length() - 1)), i);
            }
        }
        if (bits.isEmpty()) {
            List<String> known = inputs.stream().map(p -> p.name().replaceAll("\\[\\d+]$", "")).distinct().toList();
            diags.error(at, "the instruction word comes from '" + port + "', which is no machine input",
                    Declarations.hintFor(port, known, "list the switches under `inputs` in the machine block"));
            return new int[0];
        }
        if (bits.size() != word) {
            diags.error(at, "the instruction word is " + word + " bits but input '" + port + "' has " + bits.size(),
                    "make `word` and the switches agree");
            return new int[0];
        }
        return bits.values().stream().mapToInt(Integer::intValue).toArray();
    }

    private long constantOf(IsaOp op) {
        if (op.opcode() instanceof org.thermion.lang.ast.Expr.Num n) {
            return n.value();
        }
        diags.error(op.opcode().span(), "an opcode is a number", "write it as 0x5 or 5");
        return -1;
    }

    private StateBit bindState(String name, String path, Span ns, Span ps) {
        String base = path;
        int bit = -1;
        int br = path.indexOf('[');
        if (br > 0 && path.endsWith("]")) {
            base = path.substring(0, br);
            bit = Integer.parseInt(path.substring(br + 1, path.length() - 1));
        }
        Signal s = topScope.get(base);
        if (s == null) {
            diags.error(ps, "ISA state bit '" + name + "' is not bound: no net '" + path + "' in the top module",
                    Declarations.hintFor(base, new ArrayList<>(topScope.keySet()), "bind it to a latch of the top module"));
            return null;
        }
        if (s.width() != 1 && bit < 0) {
            diags.error(ps, "state bit '" + name + "' is bound to a " + s.width() + "-bit bus", "name one bit, e.g. " + path + "[0]");
            return null;
        }
        int net = s.nets()[Math.max(0, bit)];
        if (!nb.isLatchOutput(net)) {
            diags.error(ps, "ISA state bit '" + name + "' is not bound to a latch: '" + path + "' is not stored",
                    "state bits must be latches or flip-flops");
            return null;
        }
        String out = null;
        for (Port p : outputs) {
            if (p.net() == net) {
                out = p.name();
            }
        }
        return new StateBit(name, net, out);
    }

    private int field(List<IsaField> fields, String name, Span at, String role, boolean required) {
        if (name == null) {
            if (required) {
                diags.error(at, "isa names no opcode field", "add `opcode FIELD`");
            }
            return -1;
        }
        for (int i = 0; i < fields.size(); i++) {
            if (fields.get(i).name().equals(name)) {
                return i;
            }
        }
        diags.error(at, "unknown field '" + name + "' for " + role,
                Declarations.hintFor(name, fields.stream().map(IsaField::name).toList(), "declare it with `field " + name + " HI..LO`"));
        return -1;
    }

    private static int indexOf(List<Port> ports, String name) {
        for (int i = 0; i < ports.size(); i++) {
            if (ports.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    private static int stateIndex(List<StateBit> s, String name) {
        for (int i = 0; i < s.size(); i++) {
            if (s.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }
}
