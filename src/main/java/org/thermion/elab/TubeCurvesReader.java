package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Value;
import org.thermion.model.CurvePoint;
import org.thermion.model.TubeCurves;
import org.thermion.model.TubeKind;
import org.thermion.model.TubeLaw;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads a tube block's electrical model ({@code model}, {@code point}, {@code fit},
 * {@code gridcurrent}, {@code maxplate}, {@code maxscreen}) into {@link TubeCurves}, checking
 * that the law suits the tube's kind and that every parameter the law needs is given.
 */
final class TubeCurvesReader {
    /** Koren parameters a triode needs, in the order a hint lists them. */
    static final List<String> TRIODE_PARAMS = List.of("mu", "ex", "kg1", "kp", "kvb");
    /** ... and a pentode. */
    static final List<String> PENTODE_PARAMS = List.of("mu", "ex", "kg1", "kg2", "kp", "kvb");

    private final Diagnostics diags;

    TubeCurvesReader(Diagnostics diags) {
        this.diags = diags;
    }

    /** The tube's curves, or null when it declares no model (or the model line has an error, reported). */
    TubeCurves read(String tube, TubeKind kind, PropBlock b) {
        PropLine m = b.line("model");
        if (m == null) {
            if (!b.rejected("model") && (!b.lines("point").isEmpty() || b.has("fit"))) {
                Span at = b.has("fit") ? b.line("fit").prop().key().span() : b.lines("point").get(0).prop().key().span();
                diags.error(at, "tube '" + tube + "' has points or a fit but no model line",
                        "add `" + example(kind) + "` with starting values for the fit");
            }
            return null;
        }
        TubeLaw law = law(tube, kind, m);
        if (law == null) {
            return null;
        }
        List<CurvePoint> points = new ArrayList<>();
        for (PropLine p : b.lines("point")) {
            CurvePoint c = point(tube, kind, p);
            if (c != null) {
                points.add(c);
            }
        }
        List<String> fitted = new ArrayList<>();
        double residual = Double.NaN;
        PropLine fit = b.line("fit");
        if (fit != null) {
            if (!fitted(tube, kind, fit, points, b.rejected("point"), fitted)) {
                return null;
            }
            residual = fit.has("residual") ? fit.num("rms") / 100 : Double.NaN;
        }
        PropLine g = b.line("gridcurrent");
        double gridK = g == null ? Double.NaN : g.num("amps") / Math.pow(g.num("volts"), 1.5);
        String source = m.has("modelsource") ? m.word("modelsource") : "";
        return new TubeCurves(law, points, fitted, residual, gridK, b.num("maxplate"), b.num("maxscreen"), source);
    }

    /**
     * Whether the tube's model can be built as the circuits will build it (fitted to its points);
     * if not, an error at its {@code fit} line (or its model line) says why.
     */
    boolean buildable(TubeType t, PropBlock b, TubeModelCheck check) {
        String why = check.problem(t);
        if (why == null) {
            return true;
        }
        PropLine at = b.has("fit") ? b.line("fit") : b.line("model");
        diags.error(at.prop().key().span(), "tube '" + t.name() + "': its model cannot be built: " + why,
                b.has("fit") ? "check the point lines against the tube's sheet (a unit, a sign, a decimal point), "
                        + "give more points, or fit fewer parameters" : "check the model line's figures against the tube's sheet (a "
                        + "power of ten, a unit, a decimal point)");
        return false;
    }

    private TubeLaw law(String tube, TubeKind kind, PropLine m) {
        String word = m.word("law");
        Span at = m.span("law");
        String wanted = lawFor(kind);
        if (!word.equals(wanted)) {
            diags.error(at, "tube '" + tube + "' is a " + kind.name().toLowerCase(Locale.ROOT) + ": its model is '"
                    + wanted + "', not '" + word + "'", "write `" + example(kind) + "`");
            return null;
        }
        if (word.equals("diode")) {
            return new TubeLaw.Diode(m.num("amps"), m.num("volts"));
        }
        if (word.equals("gas")) {
            return "ratio".equals(m.word("firing")) ? new TubeLaw.Gas(Double.NaN, m.num("ratio"))
                    : new TubeLaw.Gas(m.num("critical"), Double.NaN);
        }
        List<String> need = kind == TubeKind.PENTODE ? PENTODE_PARAMS : TRIODE_PARAMS;
        List<String> missing = need.stream().filter(p -> !m.has("k_" + p)).toList();
        boolean ok = missing.isEmpty();
        if (!ok) {
            // one error for the line, naming every parameter it lacks
            String which = missing.size() == 1 ? "parameter " + missing.get(0)
                    : "parameters " + String.join(", ", missing.subList(0, missing.size() - 1)) + " and "
                    + missing.get(missing.size() - 1);
            diags.error(m.prop().span(), "tube '" + tube + "': the model has no " + which,
                    "add " + missing.stream().map(p -> "`" + p + " <number>`").collect(java.util.stream.Collectors
                            .joining(", ")) + " to the model line, e.g. `" + example(kind) + "` (Koren 1996, REFERENCES.md)");
        }
        if (kind == TubeKind.TRIODE && m.has("kg2")) {
            diags.error(m.span("kg2"), "tube '" + tube + "' is a triode: kg2 is a pentode's screen parameter",
                    "remove `kg2 ...`");
            ok = false;
        }
        if (!ok) {
            return null;
        }
        double kg2 = kind == TubeKind.PENTODE ? m.num("k_kg2") : Double.NaN;
        return new TubeLaw.Koren(m.num("k_mu"), m.num("k_ex"), m.num("k_kg1"), kg2, m.num("k_kp"), m.num("k_kvb"));
    }

    private CurvePoint point(String tube, TubeKind kind, PropLine p) {
        if (kind != TubeKind.TRIODE && kind != TubeKind.PENTODE) {
            diags.error(p.prop().key().span(), "tube '" + tube + "': points fit a triode's or pentode's model, not a "
                    + kind.name().toLowerCase(Locale.ROOT) + "'s", "remove the point line");
            return null;
        }
        boolean hasScreen = p.has("screen");
        if (hasScreen != (kind == TubeKind.PENTODE)) {
            diags.error(p.prop().span(), kind == TubeKind.PENTODE ? "a pentode's point needs its screen voltage"
                    : "a triode has no screen", kind == TubeKind.PENTODE ? "write `... at 250 V screen 150 V grid -2 V ...`"
                    : "remove `screen ...`");
            return null;
        }
        String q = p.word("quantity");
        if (q.equals("screen") && kind != TubeKind.PENTODE) {
            diags.error(p.span("quantity"), "a triode has no screen current", "use plate, gm or mu");
            return null;
        }
        CurvePoint.Quantity quantity = CurvePoint.Quantity.valueOf(q.toUpperCase(Locale.ROOT));
        double value = q.equals("mu") ? p.num("factor") : p.num("amps");
        boolean cathode = "cathode".equals(p.word("bias"));
        return new CurvePoint(quantity, value, p.num("plate"), hasScreen ? p.num("screenvolts") : Double.NaN,
                cathode ? Double.NaN : p.num("grid"), cathode ? p.num("cathode") : 0, p.word("pointsource"));
    }

    private boolean fitted(String tube, TubeKind kind, PropLine fit, List<CurvePoint> points, boolean pointRejected,
                           List<String> into) {
        List<String> known = kind == TubeKind.PENTODE ? PENTODE_PARAMS : kind == TubeKind.TRIODE ? TRIODE_PARAMS : List.of();
        for (Value v : fit.tokens("params")) {
            if (!known.contains(v.text())) {
                diags.error(v.span(), "tube '" + tube + "' has no model parameter '" + v.text() + "' to fit",
                        known.isEmpty() ? "only triode and pentode models are fitted"
                                : Declarations.hintFor(v.text(), known, "expected one of: " + String.join(", ", known)));
                return false;
            }
            if (into.contains(v.text())) {
                diags.error(v.span(), "'" + v.text() + "' is named twice", "name each parameter once");
                return false;
            }
            into.add(v.text());
        }
        if (points.size() < into.size()) {
            if (pointRejected) {
                return false; // a point line's own error is reported: counting the rest would only repeat it
            }
            diags.error(fit.prop().key().span(), "tube '" + tube + "': " + org.thermion.text.Nouns.count(into.size(),
                    "parameter") + " to fit but " + org.thermion.text.Nouns.count(points.size(), "point line"),
                    "give at least one point per fitted parameter, or fit fewer");
            return false;
        }
        return true;
    }

    /** The model word for a kind of tube. */
    static String lawFor(TubeKind kind) {
        switch (kind) {
            case DIODE:
                return "diode";
            case THYRATRON:
                return "gas";
            default:
                return "koren";
        }
    }

    /** What a kind of tube's model line must give, in words, for messages about a missing one. */
    static String needs(TubeKind kind) {
        switch (kind) {
            case PENTODE:
                return "Koren's parameters " + String.join(", ", PENTODE_PARAMS);
            case DIODE:
                return "one point of its 3/2-power law (current at a voltage)";
            case THYRATRON:
                return "its critical grid voltage or its control ratio";
            default:
                return "Koren's parameters " + String.join(", ", TRIODE_PARAMS);
        }
    }

    /** A model line to suggest for a kind of tube (the library's 12AU7, 6AU6, 6AL5, 2D21 sets). */
    static String example(TubeKind kind) {
        switch (kind) {
            case PENTODE:
                return "model koren mu 33 ex 1.35 kg1 1200 kg2 1100 kp 250 kvb 20 source \"...\"";
            case DIODE:
                return "model diode 60 mA at 10 V source \"...\"";
            case THYRATRON:
                return "model gas ratio 250 source \"...\"";
            default:
                return "model koren mu 21.5 ex 1.3 kg1 1180 kp 84 kvb 300 source \"...\"";
        }
    }
}
