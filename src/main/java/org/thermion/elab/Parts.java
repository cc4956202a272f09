package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.model.HeaterRating;
import org.thermion.model.Rail;
import org.thermion.model.RailDraw;
import org.thermion.model.StageCircuitSpec;
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
    /** Each rail's name where it is declared, in {@link #rails}' order ({@link Span#none()} for an assumed one). */
    final List<Span> railSpans = new ArrayList<>();
    final Map<String, Integer> railIndex = new LinkedHashMap<>();
    final Map<String, Integer> realize = new HashMap<>();
    /** The rails the parts library's stages are designed for, as its header says (for hints only). */
    static final Map<String, String> LIBRARY_RAILS = Map.of("bplus", "48 V", "bias", "-24 V", "relay", "24 V");
    private final Map<String, Integer> tubeIndex = new HashMap<>();
    private final Map<String, Integer> stageIndex = new HashMap<>();
    /** Library stages already reported for a rail the machine lacks: one error each. */
    private final java.util.Set<String> missingRails = new java.util.HashSet<>();
    /** User tubes replacing a library tube already reported for a library stage on them ("basing T", "model T"). */
    private final java.util.Set<String> userTubeReports = new java.util.HashSet<>();
    private final Declarations decls;
    private final Diagnostics diags;
    private final TubeModelCheck modelCheck;
    /** Tubes whose model line was written but is in error (reported at the tube). */
    private final java.util.Set<String> modelInError = new java.util.HashSet<>();
    /** Operators whose realize line named a stage that was reported (unknown, broken or of another function). */
    private final java.util.Set<String> realizeInError = new java.util.HashSet<>();
    /** For a file of modules alone: each operator the file does not map, with the library stage that stands in. */
    private final Map<String, String> libraryDefaults = new LinkedHashMap<>();
    private final java.util.Set<String> defaultsTaken = new java.util.HashSet<>();
    /** For a file of modules alone: rails its stages draw from that the including machine must declare. */
    private final List<String> assumedRails = new ArrayList<>();
    private boolean modulesAlone;

    Parts(Declarations decls, Diagnostics diags) {
        this(decls, diags, TubeModelCheck.NONE);
    }

    Parts(Declarations decls, Diagnostics diags, TubeModelCheck modelCheck) {
        this.decls = decls;
        this.diags = diags;
        this.modelCheck = modelCheck;
        for (Prop p : decls.rails.values()) {
            rail(p);
        }
        for (Prop r : decls.realize) {
            readRealize(r);
        }
    }

    private void rail(Prop p) {
        String name = p.values().get(0).text();
        PropBlock b = PropBlock.read(PropertyTable.RAIL, p, "rail '" + name + "'", p.values().get(0).span(), diags);
        double volts = b.num("voltage");
        double limit = b.num("limit");
        railIndex.put(name, rails.size());
        rails.add(new Rail(name, Double.isNaN(volts) ? 0 : volts, b.num("source"),
                Double.isNaN(limit) ? Double.POSITIVE_INFINITY : limit));
        railSpans.add(p.values().get(0).span());
    }

    private void readRealize(Prop r) {
        PropBlock b = PropBlock.read(PropertyTable.REALIZE, r, "realize", r.key().span(), diags);
        for (String op : StageFunction.realizableWords()) {
            PropLine line = b.line(op);
            if (line == null) {
                continue;
            }
            String stageName = line.word("stage");
            Span at = line.span("stage");
            int s = stage(stageName, at);
            if (s < 0) {
                realizeInError.add(op);
                continue;
            }
            StageFunction want = StageFunction.byWord(op);
            if (stages.get(s).function() != want) {
                diags.error(at, "stage '" + stageName + "' realizes " + stages.get(s).function().word()
                        + ", not " + op, "pick a stage whose function is " + op);
                realizeInError.add(op);
                continue;
            }
            realize.put(op, s);
        }
    }

    /**
     * Checks a file of modules meant for {@code include}, which has no machine to supply its
     * realize lines and rails: each operator the file leaves unmapped is realized by the parts
     * library's first stage of that function, and a rail no file declares is taken as the
     * including machine's (both listed by {@link #libraryDefaults()} and {@link #assumedRails()}).
     */
    void forModulesAlone() {
        modulesAlone = true;
        for (String op : StageFunction.realizableWords()) {
            if (realize.containsKey(op) || realizeInError.contains(op)) {
                continue;
            }
            for (Prop p : decls.stages.values()) {
                List<org.thermion.lang.ast.Value> head = p.values();
                if (p.span().file().equals(SourceLoader.LIBRARY) && head.size() == 3 && head.get(1).text().equals(":")
                        && head.get(2).text().equals(op)) {
                    libraryDefaults.put(op, head.get(0).text());
                    break;
                }
            }
        }
    }

    /** The library stages that stood in for realize lines a file of modules alone leaves out, by operator (language order). */
    Map<String, String> libraryDefaults() {
        Map<String, String> out = new LinkedHashMap<>(libraryDefaults);
        out.keySet().retainAll(defaultsTaken);
        return out;
    }

    /** The rails a file of modules alone draws from without declaring them. */
    List<String> assumedRails() {
        return assumedRails;
    }

    int rail(String name, Span at) {
        Integer i = railIndex.get(name);
        if (i == null && decls.rejected("rail", name)) {
            return -1;
        }
        if (i == null && modulesAlone) {
            // Its voltage is the including machine's; expanding modules does not need it.
            assumedRails.add(name);
            railIndex.put(name, rails.size());
            rails.add(new Rail(name, Double.NaN, Double.NaN, Double.POSITIVE_INFINITY));
            railSpans.add(Span.none());
            return rails.size() - 1;
        }
        if (i == null) {
            diags.error(at, "unknown rail '" + name + "'",
                    Declarations.hintFor(name, new ArrayList<>(railIndex.keySet()),
                            "declare it with `" + (LIBRARY_RAILS.containsKey(name)
                                    ? "rail " + name + " { voltage " + LIBRARY_RAILS.get(name) + " }"
                                    : PropertyTable.RAIL.skeleton(name)) + "`"));
            return -1;
        }
        return i;
    }

    /**
     * A rail a stage draws from. A library stage naming a rail the machine lacks is reported
     * where the machine uses the stage, since that is the line the user can change.
     */
    private int stageRail(String rail, Span at, String stage, Prop decl, Span use) {
        if (railIndex.containsKey(rail) || modulesAlone || !decl.span().file().equals(SourceLoader.LIBRARY) || use == null
                || !use.isKnown()) {
            return rail(rail, at);
        }
        if (!missingRails.add(stage + " " + rail)) {
            return -1;
        }
        String volts = LIBRARY_RAILS.getOrDefault(rail, "... V");
        diags.error(use, "library stage '" + stage + "' draws from rail '" + rail + "', which this machine does not declare",
                "declare `rail " + rail + " { voltage " + volts + " }` (the library's stages are designed for "
                        + "bplus " + LIBRARY_RAILS.get("bplus") + ", bias " + LIBRARY_RAILS.get("bias") + " and relay "
                        + LIBRARY_RAILS.get("relay") + "), or declare a stage of your own");
        return -1;
    }

    /**
     * Where a user's block for tube {@code tube} names it, when {@code stage} is a library stage and that block
     * replaces the library's tube: what the library stage lacks is the user's block's to give, so it is reported
     * there (once per tube), not in the library's text. Null otherwise.
     */
    private Span userTubeUnderLibraryStage(Prop stage, String tube) {
        Prop t = decls.tubes.get(tube);
        if (t == null || !stage.span().file().equals(SourceLoader.LIBRARY) || t.span().file().equals(SourceLoader.LIBRARY)) {
            return null;
        }
        return t.values().get(0).span();
    }

    /** Whether a tube type of that name is declared (here or in the library). */
    boolean hasTube(String name) {
        return tubeIndex.containsKey(name) || decls.tubes.containsKey(name);
    }

    /** The index of a tube type some stage already uses, or -1. */
    int usedTube(String name) {
        Integer i = tubeIndex.get(name);
        return i == null ? -1 : i;
    }

    int tube(String name, Span at) {
        Integer i = tubeIndex.get(name);
        if (i != null) {
            return i;
        }
        Prop p = decls.tubes.get(name);
        if (p == null && decls.rejected("tube", name)) {
            return -1;
        }
        if (p == null) {
            diags.error(at, "unknown tube type '" + name + "'",
                    Declarations.hintFor(name, new ArrayList<>(decls.tubes.keySet()), "declare it with `" + PropertyTable.TUBE.skeleton(name) + "`"));
            return -1;
        }
        TubeType t = buildTube(name, p);
        tubeIndex.put(name, tubes.size());
        tubes.add(t);
        return tubes.size() - 1;
    }

    private TubeType buildTube(String name, Prop p) {
        PropBlock b = PropBlock.read(PropertyTable.TUBE, p, "tube '" + name + "'", p.values().get(0).span(), diags);
        PropLine kindLine = b.line("kind");
        TubeKind kind = kindLine == null ? TubeKind.TRIODE : TubeKind.valueOf(kindLine.word("kind").toUpperCase(Locale.ROOT));
        List<HeaterRating> heaters = new ArrayList<>();
        for (PropLine h : b.lines("heater")) {
            heaters.add(new HeaterRating(h.num(), h.num("current")));
        }
        if (heaters.isEmpty()) {
            heaters.add(new HeaterRating(6.3, 0.3)); // reported missing; a stand-in keeps later checks quiet
        }
        double cgk = b.num("cgk"), cgp = b.num("cgp"), cpk = b.num("cpk");
        double cin = b.has("cin") ? b.num("cin") : cgk + cgp;
        double cout = b.has("cout") ? b.num("cout") : cpk + cgp;
        PropLine source = b.line("source");
        TubeCurvesReader curvesReader = new TubeCurvesReader(diags);
        TubeType t = new TubeType(name, kind, (int) b.num("sections"), List.copyOf(heaters), b.num("warmup"),
                b.num("coldratio"), cgk, cgp, cpk, cin, cout, b.num("avgcurrent"), b.num("peakcurrent"), b.num("arcdrop"),
                source == null ? "" : source.word("value"),
                new BasingReader(diags).read(b.lines("basing"), kind, (int) b.num("sections")),
                curvesReader.read(name, kind, b));
        if (t.curves() != null && !curvesReader.buildable(t, b, modelCheck)) {
            t = t.withCurves(null);
        }
        if (t.curves() == null && (b.has("model") || b.rejected("model"))) {
            modelInError.add(name);
        }
        return t;
    }

    /** The stage named, built on first use; -1 (reported) when unknown. */
    int stage(String name, Span at) {
        Integer i = stageIndex.get(name);
        if (i != null) {
            return i;
        }
        Prop p = decls.stages.get(name);
        if (p == null && decls.rejected("stage", name)) {
            return -1;
        }
        if (p == null) {
            diags.error(at, "unknown stage '" + name + "'",
                    Declarations.hintFor(name, new ArrayList<>(decls.stages.keySet()), "declare it with `" + PropertyTable.STAGE.skeleton(name) + "`"));
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

    /**
     * Reads the description's own stages that nothing used, for their errors only: a mistyped
     * key or unit in a stage waiting to be used should not wait with it. Library stages are
     * left alone (they are checked by the library's tests), and nothing read here is kept.
     */
    void readUnusedStages() {
        for (Map.Entry<String, Prop> e : decls.stages.entrySet()) {
            Prop p = e.getValue();
            if (stageIndex.containsKey(e.getKey()) || p.span().file().equals(SourceLoader.LIBRARY)) {
                continue;
            }
            function(p);
            PropBlock b = PropBlock.read(PropertyTable.STAGE, p, "stage '" + e.getKey() + "'", p.values().get(0).span(), diags);
            for (String key : List.of("draw", "load", "grid", "cathode", "screen")) {
                for (PropLine line : b.lines(key)) {
                    String rail = line.has("rail") ? line.word("rail") : null;
                    if (rail != null && !railIndex.containsKey(rail)) {
                        diags.error(line.span("rail"), "unknown rail '" + rail + "'",
                                Declarations.hintFor(rail, new ArrayList<>(railIndex.keySet()), "declare it with `rail " + rail + " { voltage ... }`"));
                    }
                }
            }
        }
    }

    /** Whether a stage of that name is declared (a declaration that did not parse counts: it is reported). */
    boolean isStage(String name) {
        return decls.stages.containsKey(name) || decls.rejected("stage", name);
    }

    /** The function a stage's head names ({@code stage NAME : FUNCTION}), or null (reported). */
    private StageFunction function(Prop p) {
        PropReader head = new PropReader(p, diags);
        head.word("stage name");
        head.expectSym(":");
        String fn = head.word("the stage's function");
        Span fnSpan = head.lastSpan();
        head.end();
        if (head.failed()) {
            return null;
        }
        StageFunction function = StageFunction.byWord(fn);
        if (function == null) {
            diags.error(fnSpan, "unknown stage function '" + fn + "'", Declarations.hintFor(fn, StageFunction.words(),
                    "expected one of: " + String.join(", ", StageFunction.words())));
        }
        return function;
    }

    private StageType buildStage(String name, Prop p, Span use) {
        StageFunction function = function(p);
        if (function == null) {
            return null;
        }
        int errorsBefore = diags.errorCount();
        PropBlock b = PropBlock.read(PropertyTable.STAGE, p, "stage '" + name + "'", p.values().get(0).span(), diags);
        boolean blockOk = diags.errorCount() == errorsBefore;
        PropLine tubeLine = b.line("tube");
        int tube = tubeLine == null ? -1 : tube(tubeLine.word("tube"), tubeLine.span("tube"));
        Span userTube = tubeLine == null ? null : userTubeUnderLibraryStage(p, tubeLine.word("tube"));
        if (tube >= 0 && tubes.get(tube).basings().isEmpty()) {
            String t = tubes.get(tube).name();
            String hint = "add `basing BASE \"PIN electrode.section, ...\" from \"SOURCE\"` to tube " + t;
            if (userTube == null) {
                diags.warning(tubeLine.span("tube"), "stage '" + name + "' is built on " + t
                        + ", which has no basing data: the wire list cannot name its pins", hint);
            } else if (userTubeReports.add("basing " + t)) {
                diags.warning(userTube, "tube '" + t + "' replaces the library's and has no basing data: the wire "
                        + "list cannot name the pins of library stage '" + name + "' or any other stage built on it",
                        hint + " (the library's own block has one), or take this block out to use the library's");
            }
        }
        PropLine sections = b.line("sections");
        PropLine loadLine = b.line("load");
        double load = loadLine != null && loadLine.has("lampvolts")
                ? loadLine.num("lampvolts") / loadLine.num("lampamps") : b.num("load");
        int loadRail = loadLine == null ? -1 : stageRail(loadLine.word("rail"), loadLine.span("rail"), name, p, use);
        List<RailDraw> low = new ArrayList<>(), high = new ArrayList<>(), always = new ArrayList<>();
        for (PropLine d : b.lines("draw")) {
            String state = d.word("state");
            if (state.equals("conducting")) {
                state = conductingState(function, d.span("state"));
            }
            int ri = stageRail(d.word("rail"), d.span("rail"), name, p, use);
            if (ri >= 0 && state != null) {
                List<RailDraw> into = state.equals("low") ? low : state.equals("high") ? high : always;
                into.add(new RailDraw(ri, d.num("amps")));
            }
        }
        double rise = b.num("rise"), fall = b.num("fall");
        PropLine delay = b.line("delay");
        if (delay != null && !delay.has("mode")) {
            rise = delay.num();
            fall = rise;
        }
        if (tube < 0) {
            return null;
        }
        double ron = b.has("ron") ? b.num("ron") : Double.isNaN(load) ? PropertyTable.RON_WITHOUT_LOAD : load / PropertyTable.RON_LOAD_RATIO;
        PropLine note = b.line("note");
        int fanIn = b.has("fanin") ? (int) b.num("fanin") : function.defaultFanIn;
        boolean perInput = sections != null && sections.has("per");
        StageCircuitSpec circuit = !blockOk ? null : new StageCircuitReader(diags,
                (r, at) -> r.equals("ground") || stageRail(r, at, name, p, use) >= 0, modelInError::contains)
                .userTube(userTube, userTubeReports)
                .read(name, function, tubes.get(tube), b, (int) b.num("sections"), fanIn, perInput, p.values().get(0).span());
        if (circuit != null && circuit.outputAtCathode() && circuit.load() == null) {
            // A follower's load, as delays and dissipation see it, is its cathode resistor.
            load = circuit.cathodeOhms();
            loadRail = railIndex.getOrDefault(circuit.cathodeRail(), -1);
        } else if (circuit != null && circuit.arrangement() == StageCircuitSpec.Arrangement.THYRATRON) {
            // A thyratron's plate resistor, as soft starts and budgets take it (0 without one): its load line is
            // the relay coil, which a soft start's relay block states again, so it must not count twice.
            load = circuit.seriesOhms();
        }
        return new StageType(name, function, tube, (int) b.num("sections"), perInput, fanIn, Double.isNaN(load) ? 0 : load, loadRail,
                List.copyOf(low), List.copyOf(high), List.copyOf(always), rise, fall, b.num("setup"), ron, b.num("wiring"),
                b.num("gain"), note == null ? "" : note.word("value"), circuit,
                new StageType.Declared(b.has("ron"), b.has("gain")));
    }

    /** The output state ({@code low}, {@code high}, {@code always}) in which a stage of {@code f} conducts; null when reported. */
    private String conductingState(StageFunction f, Span at) {
        return switch (f.conducts()) {
            case OUTPUT_LOW -> "low";
            case OUTPUT_HIGH -> "high";
            case ALWAYS -> "always";
            case DEPENDS -> {
                diags.error(at, "a stage of function '" + f.word() + "' conducts in either output state, depending on its circuit",
                        "write `draw low ...` or `draw high ...`");
                yield null;
            }
        };
    }

    /** The stage realizing an operator, or -1 when none is mapped. */
    int realizer(String op) {
        Integer s = realize.get(op);
        if (s == null && libraryDefaults.containsKey(op)) {
            s = stage(libraryDefaults.get(op), Span.none());
            realize.put(op, s);
            defaultsTaken.add(op);
        }
        return s == null ? -1 : s;
    }

    /**
     * Whether an operator's missing stage is already explained: its realize line was reported,
     * or a realize block did not parse. A use of the operator is then no new error.
     */
    boolean realizeReported(String op) {
        return realizeInError.contains(op) || decls.rejected("realize", null);
    }

    List<String> stageNames() {
        return new ArrayList<>(decls.stages.keySet());
    }

}
