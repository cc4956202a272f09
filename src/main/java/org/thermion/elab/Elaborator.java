package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.Prop;
import org.thermion.lang.ast.SourceFile;
import org.thermion.lang.ast.Value;
import org.thermion.model.BuiltBlock;
import org.thermion.model.Clock;
import org.thermion.model.Gate;
import org.thermion.model.Isa;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Netlist;
import org.thermion.model.Port;
import org.thermion.model.ProgramCounter;
import org.thermion.model.Rom;
import org.thermion.model.SoftStart;
import org.thermion.model.StageType;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Turns .machine source into a checked {@link Machine}: loads includes and the parts
 * library, expands the modules, binds the machine block and the ISA, packs tubes and
 * heater strings, levelizes the logic and lints it.
 */
public final class Elaborator {
    private final SourceSet sources;
    private final Diagnostics diags;
    private boolean asDescribed;
    private static final int MAX_PHASES = 8;
    private List<ModuleCheck> modulesAlone = List.of();
    private ModulesAlone modulesAloneAssumed;
    private SourceMap sourceMap = SourceMap.NONE;
    private TubeModelCheck modelCheck = TubeModelCheck.NONE;

    public Elaborator(SourceSet sources, Diagnostics diags) {
        this.sources = sources;
        this.diags = diags;
    }

    /**
     * Keeps the modules a machine block marks {@code notbuilt} in the logic (still flagged not
     * built): the whole description, for {@code verify}'s proof of the built part among the
     * modules it was designed with.
     */
    public Elaborator asDescribed() {
        this.asDescribed = true;
        return this;
    }

    /** Reports a tube model that {@code check} cannot build (a fit that runs away) at the tube's fit line. */
    public Elaborator withTubeModelCheck(TubeModelCheck check) {
        this.modelCheck = check;
        return this;
    }

    /** Elaborates a file on disk; null when errors were reported. */
    public Machine elaborate(Path file) {
        SourceLoader loader = new SourceLoader(sources, diags);
        SourceFile lib = loader.library();
        List<SourceFile> files = loader.load(file);
        return build(lib, files);
    }

    /** Elaborates text given directly, as if read from {@code nominal}. */
    public Machine elaborateText(Path nominal, String text) {
        SourceLoader loader = new SourceLoader(sources, diags);
        SourceFile lib = loader.library();
        List<SourceFile> files = loader.loadText(nominal, text);
        return build(lib, files);
    }

    private Machine build(SourceFile lib, List<SourceFile> files) {
        Declarations decls = new Declarations();
        decls.add(lib, true, diags);
        for (SourceFile f : files) {
            decls.add(f, false, diags);
        }
        // Errors so far (syntax, duplicate names) go on with the declarations that were read,
        // so that one run reports the errors after them too; no machine is built from them.
        try {
            return buildChecked(decls, files);
        } catch (ElaborationInterrupted e) {
            Thread.currentThread().interrupt();
            diags.error(firstSpan(files), "elaboration stopped: interrupted", null);
            return null;
        } catch (TooLarge e) {
            diags.error(firstSpan(files), "expansion stopped: the description grows past " + NetBuilder.LIMIT
                    + " stage instances (or its loops past 10,000,000 steps)",
                    "check the ranges of generator loops and the bus widths");
            return null;
        }
    }

    private static Span firstSpan(List<SourceFile> files) {
        for (int i = files.size() - 1; i >= 0; i--) {
            for (Decl d : files.get(i).decls()) {
                if (d instanceof Decl.PropDecl p && p.prop().key().text().equals("machine")) {
                    return p.span();
                }
            }
        }
        return files.isEmpty() || files.get(files.size() - 1).decls().isEmpty() ? Span.none()
                : files.get(files.size() - 1).decls().get(0).span();
    }

    /**
     * A description without a machine block but with modules (a file meant for {@code include})
     * is checked module by module; false when it declares no module either.
     */
    private boolean checkModulesAlone(Declarations decls, Parts parts, List<SourceFile> files) {
        parts.forModulesAlone();
        List<ModuleCheck> found = new ArrayList<>();
        for (SourceFile f : files) {
            for (Decl d : f.decls()) {
                if (d instanceof Decl.Module m) {
                    // the clock is not known without a machine: every phase the language allows is accepted
                    ModuleExpansion ex = ModuleExpansion.of(m, decls, parts, diags, MAX_PHASES);
                    int stages = 0;
                    for (NetBuilder.GateB g : ex.nb.gates) {
                        stages += g.stage >= 0 ? 1 : 0;
                    }
                    found.add(new ModuleCheck(m.name().text(), stages, ex.nb.latches.size(), ex.nb.names.size() - 2));
                }
            }
        }
        modulesAlone = List.copyOf(found);
        modulesAloneAssumed = new ModulesAlone(modulesAlone,
                java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(parts.libraryDefaults())),
                List.copyOf(parts.assumedRails()));
        return !found.isEmpty();
    }

    /** Where the last machine elaborated was written (stage uses, heater rules) and its margin rules. */
    public SourceMap sourceMap() {
        return sourceMap;
    }

    /** The modules checked on their own when the description had no machine block (else empty). */
    public List<ModuleCheck> modulesAlone() {
        return modulesAlone;
    }

    /** The modules checked on their own, with the library stages and rails assumed for them (else null). */
    public ModulesAlone modulesAloneChecked() {
        return modulesAloneAssumed;
    }

    private Machine buildChecked(Declarations decls, List<SourceFile> files) {
        Parts parts = new Parts(decls, diags, modelCheck);
        if (decls.machines.isEmpty() && checkModulesAlone(decls, parts, files)) {
            return null;
        }
        if (decls.machines.isEmpty() && diags.hasErrors()) {
            return null; // its machine block may be among the declarations that did not parse
        }
        if (decls.machines.isEmpty()) {
            Path f = files.isEmpty() ? Path.of("?") : files.get(files.size() - 1).path();
            diags.error(new Span(f, 1, 1, 1, 2), "no machine block in " + f.getFileName(),
                    "add `machine NAME { top MODULE ... }` naming the top module");
            return null;
        }
        if (decls.machines.size() > 1) {
            diags.error(decls.machines.get(1).span(), "more than one machine block", "one machine per description");
        }
        MachineBlock mb = MachineBlock.read(decls.machines.get(0), diags);
        Decl.Module top = null;
        if (mb.top == null) {
            diags.error(mb.nameSpan.isKnown() ? mb.nameSpan : mb.span, "machine names no top module", "add `top MODULE`");
        } else {
            top = decls.modules.get(mb.top);
            if (top == null && !decls.rejected("module", mb.top)) {
                diags.error(mb.topSpan, "unknown module '" + mb.top + "'",
                        Declarations.hintFor(mb.top, new ArrayList<>(decls.modules.keySet()), "declare it with `module " + mb.top + " { ... }`"));
            }
        }
        if (top == null) {
            return null;
        }
        ModuleExpansion ex = ModuleExpansion.of(top, decls, parts, diags, mb.phases);
        parts.readUnusedStages();
        Map<String, Signal> scope = ex.topScope;
        NetBuilder nb = ex.nb;
        topOutputs = new java.util.HashSet<>();
        for (Signal s : ex.tree.ports.get(0)) {
            if (s.kind() == Signal.Kind.OUT) {
                topOutputs.add(s.name());
            }
        }

        List<Port> inputs = new ArrayList<>();
        List<Port> outputs = new ArrayList<>();
        for (Value v : mb.inputs) {
            Signal s = topPort(scope, v, Signal.Kind.IN, "input");
            if (s != null) {
                addPorts(inputs, s);
            }
        }
        for (Value v : mb.outputs) {
            Signal s = topPort(scope, v, Signal.Kind.OUT, "output");
            if (s != null) {
                addPorts(outputs, s);
                for (int n : s.nets()) {
                    nb.read(n);
                }
            }
        }
        NotBuilt notBuilt = NotBuilt.resolve(mb.notBuilt, mb.notBuiltHeld, ex.tree.modules, diags);
        if (notBuilt.any() && !asDescribed) {
            notBuilt.apply(nb, inputs, outputs);
        }
        Rom rom = null;
        ProgramCounter pc = null;
        if (mb.romData != null) {
            Signal s = topSignal(scope, mb.romData, mb.romDataSpan, Signal.Kind.IN, "ROM data");
            if (s != null) {
                if (mb.romWidth != 0 && mb.romWidth != s.width()) {
                    diags.error(mb.romDataSpan, "bus width mismatch: the ROM is " + mb.romWidth + " bits wide, port '"
                            + s.name() + "' " + s.width(), null);
                }
                rom = new Rom(mb.romWords, s.width(), s.nets(), mb.romOffBoard);
            }
        }
        if (mb.pcJump != null || mb.pcTarget != null) {
            Signal j = mb.pcJump == null ? null : topSignal(scope, mb.pcJump, mb.pcJumpSpan, Signal.Kind.OUT, "jump");
            Signal t = mb.pcTarget == null ? null : topSignal(scope, mb.pcTarget, mb.pcTargetSpan, Signal.Kind.OUT, "jump target");
            if (j != null && t != null) {
                int width = mb.pcWidth == 0 ? t.width() : mb.pcWidth;
                if (t.width() != width) {
                    diags.error(mb.pcTargetSpan, "bus width mismatch: the program counter is " + width + " bits, '"
                            + t.name() + "' " + t.width(), null);
                }
                int phase = mb.pcPhase == 0 ? mb.phases : mb.pcPhase;
                if (phase > mb.phases) {
                    diags.error(mb.pcJumpSpan, "the program counter loads on phase " + phase + " but the clock has "
                            + mb.phases, null);
                }
                nb.read(j.nets()[0]);
                for (int n : t.nets()) {
                    nb.read(n);
                }
                pc = new ProgramCounter(width, phase, j.nets()[0], t.nets(), true);
                if (rom != null && rom.words() > (1 << width)) {
                    diags.warning(mb.pcTargetSpan, "the ROM has " + rom.words() + " words but the program counter reaches "
                            + (1 << width), null);
                }
            }
        }
        // Nets driven from outside: a set, not a search of the input and ROM lists per port bit.
        java.util.Set<Integer> outsideDriven = new java.util.HashSet<>();
        for (Port p : inputs) {
            outsideDriven.add(p.net());
        }
        if (rom != null) {
            for (int x : rom.dataNets()) {
                outsideDriven.add(x);
            }
        }
        for (Signal s : scope.values()) {
            if (s.kind() == Signal.Kind.IN) {
                for (int n : s.nets()) {
                    if (nb.driver.get(n) == NetBuilder.EXTERNAL && !outsideDriven.contains(n)) {
                        diags.error(s.decl(), "input port '" + s.name() + "' of the top module is driven by nothing",
                                "list it under `inputs` in the machine block, or name it as the ROM's `data`");
                        break;
                    }
                }
            }
        }

        Isa isa = null;
        if (!decls.isas.isEmpty() && !diags.full()) {
            isa = new IsaBuilder(diags, scope, nb, inputs, outputs).build(decls.isas.get(0));
            if (isa != null) {
                for (var sb : isa.state()) {
                    nb.read(sb.net());
                }
                IsaBuilder.checkWordSource(isa, rom, pc, decls.isas.get(0), diags);
                if (rom != null && rom.width() != isa.wordBits()) {
                    diags.error(decls.isas.get(0).name().span(), "the isa word is " + isa.wordBits() + " bits but the ROM is "
                            + rom.width(), "make `word` and the ROM width agree");
                }
            }
        }

        Packer packer = new Packer(parts, diags);
        List<ModuleInstance> modules = new ArrayList<>(ex.tree.modules);
        modules.replaceAll(mi -> notBuilt.modules.contains(mi.id()) ? mi.notBuilt() : mi);
        List<SoftStart> softStarts = new ArrayList<>();
        for (Prop pk : decls.packing) {
            packer.readPacking(pk);
        }
        StagePlacement placed = StagePlacement.place(nb, parts, packer, modules, diags);
        int[] gateEnvelope = placed.gateEnvelope;
        int[] latchEnvelope = placed.latchEnvelope;
        SoftStartReader softStartReader = new SoftStartReader(parts, packer, diags);
        List<Span> softStartSpans = new ArrayList<>();
        for (Prop p : decls.softStarts.values()) {
            SoftStart ss = softStartReader.read(p, modules);
            if (ss != null) {
                softStarts.add(ss);
                softStartSpans.add(p.block().stream().filter(q -> q.key().text().equals("bypass")).map(Prop::span)
                        .findFirst().orElse(p.span()));
            }
        }
        // A null stands for a covers line already reported: elaboration stops at the error check below.
        softStarts.replaceAll(ss -> softStartReader.withCovers(ss, modules));
        List<BuiltBlock> built = new BuiltBlocks(parts, packer, diags).build(mb, pc != null ? pc.width() : 0,
                rom != null ? rom.words() : 0, rom != null ? rom.width() : 0, modules);
        for (Prop h : decls.heaters) {
            packer.readRules(h);
        }
        if (!diags.hasErrors()) {
            packer.wire(mb.span);
            softStartReader.checkCovers(softStarts, packer.strings, packer.envelopes,
                    parts.tubes.stream().map(t -> t.name()).toList());
        }
        if (diags.hasErrors()) {
            return null;
        }
        Levelizer lev = new Levelizer(nb, diags);
        int[] order = lev.order();
        if (order == null) {
            return null;
        }
        new Linter(nb, notBuilt.any() && !asDescribed ? notBuilt.builtPart(ex.tree) : ex.tree, ex.mapper.driverOutputs, diags, inputs).run();
        if (diags.hasErrors()) {
            return null;
        }

        List<Gate> gates = new ArrayList<>(order.length);
        List<Span> gateSpans = new ArrayList<>(order.length);
        int[] gateEnvOrdered = new int[order.length];
        for (int k = 0; k < order.length; k++) {
            NetBuilder.GateB g = nb.gates.get(order[k]);
            gates.add(new Gate(k, g.fn, g.in, g.out, g.stage, g.module));
            gateSpans.add(g.span == null ? Span.none() : g.span);
            gateEnvOrdered[k] = gateEnvelope[order[k]];
        }
        List<Latch> latches = new ArrayList<>(nb.latches.size());
        List<Span> latchSpans = new ArrayList<>(nb.latches.size());
        for (int i = 0; i < nb.latches.size(); i++) {
            NetBuilder.LatchB l = nb.latches.get(i);
            latches.add(new Latch(i, l.data(), l.enable(), l.out(), l.phase(), l.stage(), l.module()));
            latchSpans.add(l.span() == null ? Span.none() : l.span());
        }
        org.thermion.model.MarginRules marginRules = MarginsReader.read(decls.margins, diags);
        if (diags.hasErrors()) {
            return null;
        }
        sourceMap = new SourceMap(gateSpans, latchSpans, packer.ruleSpans(), softStartSpans, parts.railSpans, marginRules);
        String[] places = new String[nb.names.size()];
        for (int n = 0; n < places.length; n++) {
            org.thermion.lang.Span s = nb.driverSpan.get(n);
            if (s != null && s.isKnown()) {
                places[n] = s.file().getFileName() + ":" + s.line();
            }
        }
        Netlist netlist = new Netlist(nb.names.toArray(new String[0]), nb.netModule.toArray(), List.copyOf(gates),
                List.copyOf(latches), places);
        return new Machine(mb.name, new Clock(mb.phases, mb.period), List.copyOf(parts.tubes), List.copyOf(parts.stages),
                List.copyOf(parts.rails), List.copyOf(packer.rules), List.copyOf(softStarts), List.copyOf(modules), netlist,
                rom, pc, List.copyOf(inputs), List.copyOf(outputs), packer.levelized(order),
                List.copyOf(packer.strings), isa, gateEnvOrdered, latchEnvelope, built,
                Radixes.of(mb, inputs, outputs, diags));
    }

    /** A bus port becomes one machine bit per line: {@code code[0]}, {@code code[1]}, ... */
    private static void addPorts(List<Port> into, Signal s) {
        if (!s.bus()) {
            into.add(new Port(s.name(), s.nets()[0]));
            return;
        }
        for (int i = 0; i < s.width(); i++) {
            into.add(new Port(s.name() + "[" + i + "]", s.nets()[i]));
        }
    }

    private java.util.Set<String> topOutputs = java.util.Set.of();

    private Signal topPort(Map<String, Signal> scope, Value v, Signal.Kind kind, String what) {
        return topSignal(scope, v.text(), v.span(), kind, what);
    }

    private Signal topSignal(Map<String, Signal> scope, String name, Span at, Signal.Kind kind, String what) {
        Signal s = scope.get(name);
        if (s != null && s.kind() == Signal.Kind.LATCH && topOutputs.contains(name)) {
            s = new Signal(s.name(), s.nets(), s.decl(), Signal.Kind.OUT, s.bus());
        }
        if (s == null || (s.kind() != Signal.Kind.IN && s.kind() != Signal.Kind.OUT)) {
            List<String> ports = scope.values().stream()
                    .filter(x -> x.kind() == kind || (kind == Signal.Kind.OUT && topOutputs.contains(x.name())))
                    .map(Signal::name).toList();
            diags.error(at, "unknown " + what + " '" + name + "': the top module has no such " + (kind == Signal.Kind.IN ? "input" : "output") + " port",
                    Declarations.hintFor(name, ports, "its " + (kind == Signal.Kind.IN ? "inputs" : "outputs") + " are: " + String.join(", ", ports)));
            return null;
        }
        if (s.kind() != kind) {
            diags.error(at, "'" + name + "' is an " + (s.kind() == Signal.Kind.IN ? "input" : "output") + " of the top module, not an "
                    + (kind == Signal.Kind.IN ? "input" : "output"), null);
            return null;
        }
        return s;
    }
}
