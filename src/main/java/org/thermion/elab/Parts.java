package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.model.HeaterRating;
import org.thermion.model.Rail;
import org.thermion.model.RailDraw;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;
import org.thermion.model.TubeKind;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Turns tube, stage and rail declarations into model values. Rails are built up front;
 * tubes and stages when first used, so an unused library part costs nothing.
 */
final class Parts {
    final List<TubeType> tubes = new ArrayList<>();
    final List<StageType> stages = new ArrayList<>();
    final List<Rail> rails = new ArrayList<>();
    final Map<String, Integer> railIndex = new LinkedHashMap<>();
    final Map<String, Integer> realize = new HashMap<>();
    final Map<String, Span> realizeSpan = new HashMap<>();
    private final Map<String, Integer> tubeIndex = new HashMap<>();
    private final Map<String, Integer> stageIndex = new HashMap<>();
    private final Declarations decls;
    private final Diagnostics diags;

    static final List<String> REALIZABLE = List.of("not", "nand", "nor", "and", "or", "xor", "buffer", "latch");

    Parts(Declarations decls, Diagnostics diags) {
        this.decls = decls;
        this.diags = diags;
        for (Prop p : decls.rails.values()) {
            rail(p);
        }
        for (Prop r : decls.realize) {
            readRealize(r);
        }
    }

    private void rail(Prop p) {
        String name = p.values().get(0).text();
        double volts = Double.NaN;
        double source = 0;
        double limit = Double.POSITIVE_INFINITY;
        for (Prop q : p.block()) {
            PropReader r = new PropReader(q, diags);
            switch (q.key().text()) {
                case "voltage" -> volts = r.quantity(Unit.VOLT, "rail voltage");
                case "source" -> source = r.positive(Unit.OHM, "source resistance", true);
                case "limit" -> limit = r.positive(Unit.AMPERE, "current limit", false);
                default -> unknownKey(q, "rail", List.of("voltage", "source", "limit"));
            }
            r.end();
        }
        if (Double.isNaN(volts)) {
            if (!diags.hasErrors()) {
                diags.error(p.values().get(0).span(), "rail '" + name + "' has no voltage", "add `voltage 48 V` to its block");
            }
            volts = 0;
        }
        railIndex.put(name, rails.size());
        rails.add(new Rail(name, volts, Double.isNaN(source) ? 0 : source, Double.isNaN(limit) ? Double.POSITIVE_INFINITY : limit));
    }

    void unknownKey(Prop q, String where, List<String> known) {
        diags.error(q.key().span(), "unknown property '" + q.key().text() + "' in " + where,
                Declarations.hintFor(q.key().text(), known, "expected one of: " + String.join(", ", known)));
    }

    private void readRealize(Prop r) {
        for (Prop q : r.block()) {
            String op = q.key().text();
            if (!REALIZABLE.contains(op)) {
                unknownKey(q, "realize", REALIZABLE);
                continue;
            }
            PropReader pr = new PropReader(q, diags);
            String stageName = pr.word("a stage name");
            Span at = pr.lastSpan();
            pr.end();
            if (stageName == null) {
                continue;
            }
            int s = stage(stageName, at);
            if (s < 0) {
                continue;
            }
            StageFunction want = StageFunction.valueOf(op.toUpperCase(Locale.ROOT));
            if (stages.get(s).function() != want) {
                diags.error(at, "stage '" + stageName + "' realizes " + stages.get(s).function().name().toLowerCase()
                        + ", not " + op, "pick a stage whose function is " + op);
                continue;
            }
            realize.put(op, s);
            realizeSpan.put(op, at);
        }
    }

    int rail(String name, Span at) {
        Integer i = railIndex.get(name);
        if (i == null) {
            diags.error(at, "unknown rail '" + name + "'",
                    Declarations.hintFor(name, new ArrayList<>(railIndex.keySet()),
                            "declare it with `rail " + name + " { voltage ... }`"));
            return -1;
        }
        return i;
    }

    /**
     * A rail a stage draws from. A library stage naming a rail the machine lacks is reported
     * where the machine uses the stage, since that is the line the user can change.
     */
    private final java.util.Set<String> missingRails = new java.util.HashSet<>();

    private int stageRail(String rail, Span at, String stage, Prop decl, Span use) {
        if (railIndex.containsKey(rail) || !decl.span().file().equals(SourceLoader.LIBRARY) || use == null
                || !use.isKnown()) {
            return rail(rail, at);
        }
        if (!missingRails.add(stage + " " + rail)) {
            return -1;
        }
        diags.error(use, "library stage '" + stage + "' draws from rail '" + rail + "', which this machine does not declare",
                "declare `rail " + rail + " { voltage ... }` (library stages expect rails bplus, bias and relay), "
                        + "or declare a stage of your own");
        return -1;
    }

    int tube(String name, Span at) {
        Integer i = tubeIndex.get(name);
        if (i != null) {
            return i;
        }
        Prop p = decls.tubes.get(name);
        if (p == null) {
            diags.error(at, "unknown tube type '" + name + "'",
                    Declarations.hintFor(name, new ArrayList<>(decls.tubes.keySet()), "declare it with `tube " + name + " { ... }`"));
            return -1;
        }
        TubeType t = buildTube(name, p);
        tubeIndex.put(name, tubes.size());
        tubes.add(t);
        return tubes.size() - 1;
    }

    private TubeType buildTube(String name, Prop p) {
        TubeKind kind = TubeKind.TRIODE;
        int sections = 1;
        List<HeaterRating> heaters = new ArrayList<>();
        double warmup = Double.NaN, ratio = Double.NaN, cgk = 0, cgp = 0, cpk = 0, cin = Double.NaN, cout = Double.NaN;
        double avg = Double.NaN, peak = Double.NaN, drop = Double.NaN;
        String source = "";
        for (Prop q : p.block()) {
            PropReader r = new PropReader(q, diags);
            switch (q.key().text()) {
                case "kind" -> {
                    String k = r.word("a tube kind");
                    if (k != null) {
                        try {
                            kind = TubeKind.valueOf(k.toUpperCase(Locale.ROOT));
                        } catch (IllegalArgumentException e) {
                            diags.error(r.lastSpan(), "unknown tube kind '" + k + "'", "expected triode, pentode, diode or thyratron");
                        }
                    }
                }
                case "sections" -> sections = (int) r.whole("number of sections", 1, 4);
                case "heater" -> {
                    double v = r.positive(Unit.VOLT, "heater voltage", false);
                    double a = r.positive(Unit.AMPERE, "heater current", false);
                    if (!Double.isNaN(v) && !Double.isNaN(a)) {
                        heaters.add(new HeaterRating(v, a));
                    }
                }
                case "warmup" -> warmup = r.positive(Unit.SECOND, "warm-up time", false);
                case "coldratio" -> ratio = r.number("cold-to-hot resistance ratio");
                case "cgk" -> cgk = r.positive(Unit.FARAD, "grid-cathode capacitance", true);
                case "cgp" -> cgp = r.positive(Unit.FARAD, "grid-plate capacitance", true);
                case "cpk" -> cpk = r.positive(Unit.FARAD, "plate-cathode capacitance", true);
                case "cin" -> cin = r.positive(Unit.FARAD, "input capacitance", true);
                case "cout" -> cout = r.positive(Unit.FARAD, "output capacitance", true);
                case "avgcurrent" -> avg = r.positive(Unit.AMPERE, "average cathode current", false);
                case "peakcurrent" -> peak = r.positive(Unit.AMPERE, "peak cathode current", false);
                case "arcdrop" -> drop = r.positive(Unit.VOLT, "tube drop", false);
                case "source" -> source = r.string("the source of the data");
                default -> unknownKey(q, "tube", List.of("kind", "sections", "heater", "warmup", "coldratio", "cgk",
                        "cgp", "cpk", "cin", "cout", "avgcurrent", "peakcurrent", "arcdrop", "source"));
            }
            r.end();
        }
        if (heaters.isEmpty()) {
            diags.error(p.values().get(0).span(), "tube '" + name + "' has no heater rating",
                    "add `heater 6.3 V 300 mA` (volts and amps from its data sheet)");
            heaters.add(new HeaterRating(6.3, 0.3));
        }
        if (Double.isNaN(cin)) {
            cin = cgk + cgp;
        }
        if (Double.isNaN(cout)) {
            cout = cpk + cgp;
        }
        if (sections < 1) {
            sections = 1;
        }
        return new TubeType(name, kind, sections, List.copyOf(heaters), warmup, ratio, nz(cgk), nz(cgp), nz(cpk),
                nz(cin), nz(cout), avg, peak, drop, source == null ? "" : source);
    }

    private static double nz(double v) {
        return Double.isNaN(v) ? 0 : v;
    }

    /** The stage named, built on first use; -1 (reported) when unknown. */
    int stage(String name, Span at) {
        Integer i = stageIndex.get(name);
        if (i != null) {
            return i;
        }
        Prop p = decls.stages.get(name);
        if (p == null) {
            diags.error(at, "unknown stage '" + name + "'",
                    Declarations.hintFor(name, new ArrayList<>(decls.stages.keySet()), "declare it with `stage " + name + " : FUNCTION { ... }`"));
            return -1;
        }
        StageType s = buildStage(name, p, at);
        if (s == null) {
            stageIndex.put(name, -1);
            return -1;
        }
        stageIndex.put(name, stages.size());
        stages.add(s);
        return stages.size() - 1;
    }

    boolean isStage(String name) {
        return decls.stages.containsKey(name);
    }

    private StageType buildStage(String name, Prop p, Span use) {
        PropReader head = new PropReader(p, diags);
        head.word("stage name");
        head.expectSym(":");
        String fn = head.word("the stage's function");
        Span fnSpan = head.lastSpan();
        head.end();
        if (head.failed()) {
            return null;
        }
        StageFunction function;
        try {
            function = StageFunction.valueOf(fn.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            List<String> fns = java.util.Arrays.stream(StageFunction.values()).map(f -> f.name().toLowerCase()).toList();
            diags.error(fnSpan, "unknown stage function '" + fn + "'", Declarations.hintFor(fn, fns, "expected one of: " + String.join(", ", fns)));
            return null;
        }
        int tube = -1, sections = 1, fanIn = function.defaultFanIn, loadRail = -1;
        boolean perInput = false;
        double load = Double.NaN, rise = Double.NaN, fall = Double.NaN, setup = 0, ron = Double.NaN, wiring = 0, gain = 1;
        List<RailDraw> low = new ArrayList<>(), high = new ArrayList<>(), always = new ArrayList<>();
        String note = "";
        for (Prop q : p.block()) {
            PropReader r = new PropReader(q, diags);
            switch (q.key().text()) {
                case "tube" -> {
                    String t = r.word("a tube type");
                    if (t != null) {
                        tube = tube(t, r.lastSpan());
                    }
                }
                case "sections" -> {
                    sections = (int) r.whole("sections used", 1, 8);
                    if (r.acceptWord("per")) {
                        r.expectWord("input");
                        perInput = true;
                    }
                }
                case "fanin" -> fanIn = (int) r.whole("fan-in", 1, 16);
                case "load" -> {
                    load = r.positive(Unit.OHM, "plate load", false);
                    r.expectWord("from");
                    String rail = r.word("a rail name");
                    if (rail != null) {
                        loadRail = stageRail(rail, r.lastSpan(), name, p, use);
                    }
                }
                case "draw" -> {
                    String state = r.word("low, high or always");
                    Span st = r.lastSpan();
                    String rail = r.word("a rail name");
                    Span rs = r.lastSpan();
                    double a = r.positive(Unit.AMPERE, "current drawn", true);
                    if (state == null || rail == null || Double.isNaN(a)) {
                        break;
                    }
                    int ri = stageRail(rail, rs, name, p, use);
                    List<RailDraw> into = switch (state) {
                        case "low" -> low;
                        case "high" -> high;
                        case "always" -> always;
                        default -> null;
                    };
                    if (into == null) {
                        diags.error(st, "unknown output state '" + state + "'", "expected low, high or always");
                    } else if (ri >= 0) {
                        into.add(new RailDraw(ri, a));
                    }
                }
                case "rise" -> rise = r.positive(Unit.SECOND, "rise time", true);
                case "fall" -> fall = r.positive(Unit.SECOND, "fall time", true);
                case "delay" -> {
                    if (!r.acceptWord("auto")) {
                        rise = r.positive(Unit.SECOND, "delay", true);
                        fall = rise;
                    }
                }
                case "setup" -> setup = r.positive(Unit.SECOND, "set-up time", true);
                case "ron" -> ron = r.positive(Unit.OHM, "conducting output resistance", false);
                case "wiring" -> wiring = r.positive(Unit.FARAD, "wiring capacitance", true);
                case "gain" -> gain = r.number("stage gain");
                case "note" -> note = r.string("a note");
                default -> unknownKey(q, "stage", List.of("tube", "sections", "fanin", "load", "draw", "rise", "fall",
                        "delay", "setup", "ron", "wiring", "gain", "note"));
            }
            r.end();
        }
        if (tube < 0) {
            if (!diags.hasErrors()) {
                diags.error(p.values().get(0).span(), "stage '" + name + "' names no tube", "add `tube 12AU7` (or another type)");
            }
            return null;
        }
        if (Double.isNaN(ron)) {
            ron = Double.isNaN(load) ? 1000 : load / 10;
        }
        return new StageType(name, function, tube, sections, perInput, fanIn, Double.isNaN(load) ? 0 : load, loadRail,
                List.copyOf(low), List.copyOf(high), List.copyOf(always), rise, fall, Double.isNaN(setup) ? 0 : setup,
                ron, Double.isNaN(wiring) ? 0 : wiring, Double.isNaN(gain) ? 1 : gain, note == null ? "" : note);
    }

    /** The stage realizing an operator, or -1 when none is mapped. */
    int realizer(String op) {
        return realize.getOrDefault(op, -1);
    }

    List<String> stageNames() {
        return new ArrayList<>(decls.stages.keySet());
    }

}
