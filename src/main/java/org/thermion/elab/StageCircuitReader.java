package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.model.StageCircuitSpec;
import org.thermion.model.StageCircuitSpec.Arrangement;
import org.thermion.model.StageFunction;
import org.thermion.model.TubeKind;
import org.thermion.model.TubeType;

import java.util.Locale;
import java.util.function.BiPredicate;

/**
 * Reads a stage block's circuit ({@code circuit}, {@code load}, {@code cathode}, {@code grid},
 * {@code screen}, {@code series}, {@code output}) into a {@link StageCircuitSpec}, checking that
 * the parts suit the tube and the arrangement. A stage with draw lines and no circuit lines
 * ({@code circuit}, {@code grid}, {@code cathode}, {@code screen}, {@code output}, {@code series})
 * is known by its draws alone, as is one whose tube has no model; with neither a model nor
 * draws it is an error naming what to add.
 */
final class StageCircuitReader {
    /** Lines that only a circuit has: any of them makes a stage with draw lines a circuit too. */
    private static final java.util.List<String> CIRCUIT_ONLY = java.util.List.of("grid", "cathode", "screen", "output",
            "series");

    private final Diagnostics diags;
    /** Checks a rail name (reporting it when unknown): name, span. */
    private final BiPredicate<String, Span> rail;
    /** Tubes whose model line is written but in error (reported there): their stages say no more. */
    private final java.util.function.Predicate<String> modelInError;

    /** A user's block replacing the library's tube of a library stage (null otherwise), and what was said there. */
    private Span userTube;
    private java.util.Set<String> userTubeReports = new java.util.HashSet<>();

    StageCircuitReader(Diagnostics diags, BiPredicate<String, Span> rail, java.util.function.Predicate<String> modelInError) {
        this.diags = diags;
        this.rail = rail;
        this.modelInError = modelInError;
    }

    /**
     * For a library stage on a tube a user's block replaces: a missing model is reported at that block ({@code at}),
     * once per tube ({@code reported} holds "model TUBE" once said), since the library's text is not the user's.
     */
    StageCircuitReader userTube(Span at, java.util.Set<String> reported) {
        this.userTube = at;
        this.userTubeReports = reported;
        return this;
    }

    /** The stage's circuit; null for a stage known by its draws (or after a reported error). */
    StageCircuitSpec read(String stage, StageFunction function, TubeType tube, PropBlock b, int sections, int fanIn,
                          boolean perInput, Span titleSpan) {
        PropLine c = b.line("circuit");
        if (c != null && c.word("arrangement").equals("none")) {
            return null;
        }
        boolean declared = !b.lines("draw").isEmpty();
        if (declared && c == null && CIRCUIT_ONLY.stream().noneMatch(b::has)) {
            return null; // a stage known by its typed-in currents, as stages were before circuits
        }
        if (tube.curves() == null) {
            if (!declared && !modelInError.test(tube.name()) && userTube != null) {
                if (userTubeReports.add("model " + tube.name())) {
                    diags.error(userTube, "tube '" + tube.name() + "' replaces the library's and has no model line ("
                                    + TubeCurvesReader.needs(tube.kind()) + "), so library stage '" + stage
                                    + "' (and any other stage on it that states no currents) cannot be solved",
                            "add `" + TubeCurvesReader.example(tube.kind()) + "` to this block with the figures' "
                                    + "source (the library's own " + tube.name() + " block has one), or take this "
                                    + "block out to use the library's");
                }
            } else if (!declared && !modelInError.test(tube.name())) {
                PropLine t = b.line("tube");
                diags.error(t == null ? titleSpan : t.span("tube"), "stage '" + stage + "': tube '" + tube.name()
                                + "' has no model line (" + TubeCurvesReader.needs(tube.kind())
                                + ") and the stage states no currents, so its circuit cannot be solved",
                        "add `" + TubeCurvesReader.example(tube.kind()) + "` to tube " + tube.name()
                                + "'s block with the figures' source, or `draw <state> <rail> <amps>` lines "
                                + "(or `circuit none`) to the stage");
            }
            return null;
        }
        Arrangement arr = c != null ? Arrangement.valueOf(c.word("arrangement").toUpperCase(Locale.ROOT))
                : byDefault(function, tube.kind());
        Span at = c != null ? c.span("arrangement") : titleSpan;
        if (!suits(stage, arr, function, tube, at)) {
            return null;
        }
        PropLine load = b.line("load");
        StageCircuitSpec.PlateLoadSpec plate = null;
        String loadRail = null;
        if (load != null) {
            loadRail = load.word("rail");
            String kind = load.word("loadkind");
            if ("coil".equals(kind)) {
                double drop = load.has("dropout") ? load.num("dropoutamps") : 0;
                if (drop > load.num("pickup")) {
                    diags.error(load.span("dropoutamps"), "drop-out current above the pick-up current",
                            "a coil releases below the current that pulls it in");
                    return null;
                }
                plate = new StageCircuitSpec.Coil(load.num(), load.num("pickup"), drop);
            } else if ("direct".equals(kind)) {
                plate = null;
            } else if ("lamp".equals(kind)) {
                plate = new StageCircuitSpec.Lamp(load.num("lampvolts"), load.num("lampamps"));
            } else {
                plate = new StageCircuitSpec.Resistor(load.num());
            }
        }
        PropLine out = b.line("output");
        boolean cathodeOut = out != null ? out.word("at").equals("cathode")
                : function == StageFunction.BUFFER && arr == Arrangement.PARALLEL;
        PropLine k = b.line("cathode");
        double kOhms = k == null || "ground".equals(k.word("cathodekind")) ? 0 : k.num();
        boolean cathodeCoil = k != null && "coil".equals(k.word("cathodekind"));
        if (cathodeCoil && function != StageFunction.RELAY) {
            diags.error(k.prop().key().span(), "stage '" + stage + "': a coil in the cathode belongs to a relay stage, not "
                    + function.word(), "write `cathode 10 k to <rail>` for a plain resistor");
            return null;
        }
        String kRail = kOhms > 0 || (k != null && k.has("rail")) ? k.word("rail") : "ground";
        if (plate == null && (load == null || !(arr == Arrangement.PARALLEL && cathodeOut))) {
            diags.error(titleSpan, "stage '" + stage + "' has no load", "add `load 22 k from <rail>` (a coil or a lamp; `direct` only for an output at the cathode)");
            return null;
        }
        if (cathodeOut && kOhms == 0) {
            diags.error(out != null ? out.span("at") : titleSpan, "stage '" + stage
                    + "': an output at the cathode needs a cathode resistor", "add `cathode 10 k to <rail>`");
            return null;
        }
        if ((arr == Arrangement.DIODES || arr == Arrangement.CROSSED) && !(plate instanceof StageCircuitSpec.Resistor)) {
            diags.error(load.prop().key().span(), "stage '" + stage + "': a " + arr.name().toLowerCase(Locale.ROOT)
                    + " circuit's load is a resistor", "write `load 47 k from <rail>`");
            return null;
        }
        if (!sectionsFit(stage, arr, sections, fanIn, perInput, titleSpan)) {
            return null;
        }
        PropLine g = b.line("grid");
        boolean divider = g != null && "divider".equals(g.word("gridkind"));
        PropLine s = b.line("screen");
        if (s != null && tube.kind() != TubeKind.PENTODE) {
            diags.error(s.prop().key().span(), "stage '" + stage + "': a " + tube.kind().name().toLowerCase(Locale.ROOT)
                    + " has no screen", "remove the screen line");
            return null;
        }
        PropLine series = b.line("series");
        if (series != null && arr != Arrangement.THYRATRON) {
            diags.error(series.prop().key().span(), "stage '" + stage + "': a series plate resistor belongs to a "
                    + "thyratron stage", "add it to the load's resistance, or remove the line");
            return null;
        }
        boolean railsOk = (load == null || rail.test(loadRail, load.span("rail")))
                & (kOhms == 0 || rail.test(kRail, k.span("rail")))
                & (!divider || rail.test(g.word("rail"), g.span("rail")))
                & (s == null || rail.test(s.word("rail"), s.span("rail")));
        if (!railsOk) {
            return null;
        }
        double screenOhms = tube.kind() != TubeKind.PENTODE ? Double.NaN : s == null ? 0 : s.num();
        String screenRail = tube.kind() != TubeKind.PENTODE ? null : s == null ? loadRail : s.word("rail");
        return new StageCircuitSpec(arr, plate, loadRail == null ? "ground" : loadRail, kOhms, kRail,
                divider ? g.num("series") : 0, divider ? g.num("tobias") : Double.POSITIVE_INFINITY,
                divider ? g.word("rail") : "ground", g != null && g.has("stopper") ? g.num("stopperohms") : 0,
                screenOhms, screenRail, b.num("series"), cathodeOut, cathodeCoil ? k.num("cathodepickup") : Double.NaN);
    }

    private static Arrangement byDefault(StageFunction f, TubeKind kind) {
        if (kind == TubeKind.DIODE) {
            return Arrangement.DIODES;
        }
        if (kind == TubeKind.THYRATRON) {
            return Arrangement.THYRATRON;
        }
        return f == StageFunction.LATCH ? Arrangement.CROSSED : f == StageFunction.NAND ? Arrangement.SERIES
                : Arrangement.PARALLEL;
    }

    private boolean suits(String stage, Arrangement arr, StageFunction f, TubeType tube, Span at) {
        String why = null;
        boolean grid = tube.kind() == TubeKind.TRIODE || tube.kind() == TubeKind.PENTODE;
        if (arr == Arrangement.DIODES && tube.kind() != TubeKind.DIODE
                || arr == Arrangement.THYRATRON && tube.kind() != TubeKind.THYRATRON
                || (arr == Arrangement.PARALLEL || arr == Arrangement.SERIES) && !grid
                || arr == Arrangement.CROSSED && tube.kind() != TubeKind.TRIODE) {
            why = "a " + arr.name().toLowerCase(Locale.ROOT) + " circuit cannot be built of " + tube.kind().name()
                    .toLowerCase(Locale.ROOT) + "s like " + tube.name();
        } else if (arr == Arrangement.DIODES && f != StageFunction.AND && f != StageFunction.OR) {
            why = "diodes make an and or an or, not " + f.word();
        } else if (arr == Arrangement.CROSSED && f != StageFunction.LATCH) {
            why = "cross-coupled halves make a latch, not " + f.word();
        } else if (arr == Arrangement.THYRATRON && f != StageFunction.RELAY && f != StageFunction.LAMP) {
            why = "a thyratron stage drives a relay or a lamp, not " + f.word();
        } else if (f == StageFunction.XOR) {
            why = "no circuit arrangement makes an xor from one stage";
        }
        if (why != null) {
            diags.error(at, "stage '" + stage + "': " + why, "choose another `circuit` (parallel, series, crossed, "
                    + "diodes, thyratron) or `circuit none` with draw lines");
            return false;
        }
        return true;
    }

    private boolean sectionsFit(String stage, Arrangement arr, int sections, int fanIn, boolean perInput, Span at) {
        String why = null;
        if (arr == Arrangement.CROSSED && sections != 2) {
            why = "a cross-coupled pair uses 2 sections, not " + sections;
        } else if (arr == Arrangement.SERIES && !perInput && sections != fanIn) {
            why = "a series stack uses one section per input: " + fanIn + " inputs, " + sections + " sections";
        } else if ((arr == Arrangement.PARALLEL) && !perInput && sections % fanIn != 0) {
            why = sections + " sections cannot be shared equally by " + fanIn + " inputs";
        }
        if (why != null) {
            diags.error(at, "stage '" + stage + "': " + why, "change `sections` or `fanin`");
            return false;
        }
        return true;
    }
}
