package org.thermion.spice;

import org.thermion.circuit.Element;
import org.thermion.circuit.StageNetlist;
import org.thermion.model.TubeType;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.function.IntFunction;

/**
 * Writes the parts of solved-stage circuits as SPICE3 cards: resistors as R, tube sections,
 * grid current, diodes, lamps and arcs as B current sources (see {@link TubeExpressions}), the
 * model's leakage across every tube path (1/GMIN) as R, and the tube's interelectrode
 * capacitances from the parts library as C. One writer fills one deck; card names are unique in it.
 */
final class SpiceWriter {
    private final Function<String, TubeType> tubes;
    private final List<SpiceDeck.Line> out;
    private final Map<String, Integer> used = new HashMap<>();

    /** {@code tubes}: the parts library's tube by model name (null when it has none). */
    SpiceWriter(Function<String, TubeType> tubes, List<SpiceDeck.Line> out) {
        this.tubes = tubes;
        this.out = out;
    }

    void note(String text) {
        out.add(SpiceDeck.Line.note(text));
    }

    void add(SpiceCard card) {
        out.add(SpiceDeck.Line.of(card));
    }

    /** A name unique in the deck: the kind letter, {@code tag} and the part's label. */
    String name(char kind, String tag, String label) {
        String base = kind + (tag.isEmpty() ? "" : tag + "_") + SpiceNames.clean(label);
        String key = base.toLowerCase(java.util.Locale.ROOT);
        int n = used.merge(key, 1, Integer::sum);
        return n == 1 ? base : base + "_" + n;
    }

    /** Every part of {@code nl} as cards; node i is called {@code node.apply(i)}; labels lose {@code strip}. */
    void parts(StageNetlist nl, IntFunction<String> node, String tag, String strip) {
        for (Element e : nl.parts()) {
            String label = e.label().startsWith(strip) ? e.label().substring(strip.length()) : e.label();
            part(e, node, tag, label);
        }
    }

    private void part(Element e, IntFunction<String> node, String tag, String label) {
        if (e instanceof Element.Resistor r) {
            add(new SpiceCard.Resistor(name('R', tag, label), node.apply(r.a()), node.apply(r.b()), r.ohms()));
        } else if (e instanceof Element.Lamp l) {
            String a = node.apply(l.a());
            String b = node.apply(l.b());
            add(new SpiceCard.CurrentExpression(name('B', tag, label), a, b,
                    TubeExpressions.lamp(l.ratedVolts(), l.ratedAmps(), l.coldRatio(), a, b)));
        } else if (e instanceof Element.Triode t) {
            String p = node.apply(t.p());
            String g = node.apply(t.g());
            String k = node.apply(t.k());
            double scale = t.count() * t.emission();
            add(new SpiceCard.CurrentExpression(name('B', tag, label + "_plate"), p, k,
                    TubeExpressions.triodePlate(t.model(), scale, p, g, k)));
            gridCurrent(t.model().grid(), scale, g, k, tag, label);
            leak(p, k, tag, label);
            TubeType tt = tubes.apply(t.model().name());
            if (tt != null) {
                cap(tag, label + "_cgk", g, k, tt.cgk() * t.count());
                cap(tag, label + "_cgp", g, p, tt.cgp() * t.count());
                cap(tag, label + "_cpk", p, k, tt.cpk() * t.count());
            }
        } else if (e instanceof Element.Pentode t) {
            String p = node.apply(t.p());
            String g1 = node.apply(t.g1());
            String g2 = node.apply(t.g2());
            String k = node.apply(t.k());
            double scale = t.count() * t.emission();
            add(new SpiceCard.CurrentExpression(name('B', tag, label + "_plate"), p, k,
                    TubeExpressions.pentodePlate(t.model(), scale, p, g1, g2, k)));
            add(new SpiceCard.CurrentExpression(name('B', tag, label + "_screen"), g2, k,
                    TubeExpressions.pentodeScreen(t.model(), scale, g1, g2, k)));
            gridCurrent(t.model().grid(), scale, g1, k, tag, label);
            leak(p, k, tag, label);
            leak(g2, k, tag, label + "_screen");
            TubeType tt = tubes.apply(t.model().name());
            if (tt != null) {
                cap(tag, label + "_cin", g1, k, tt.cin() * t.count());
                cap(tag, label + "_cout", p, k, tt.cout() * t.count());
            }
        } else if (e instanceof Element.Diode d) {
            String a = node.apply(d.a());
            String k = node.apply(d.k());
            add(new SpiceCard.CurrentExpression(name('B', tag, label), a, k,
                    TubeExpressions.diode(d.model(), d.emission(), a, k)));
            leak(a, k, tag, label);
        } else if (e instanceof Element.Grid g) {
            gridCurrent(g.law(), g.emission(), node.apply(g.g()), node.apply(g.k()), tag, label);
        } else {
            Element.Arc a = (Element.Arc) e;
            String an = node.apply(a.a());
            String k = node.apply(a.k());
            if (a.conducting()) {
                add(new SpiceCard.CurrentExpression(name('B', tag, label + "_arc"), an, k,
                        TubeExpressions.arc(a.model().arcDrop(), Element.Arc.ARC_OHMS, an, k)));
            } else {
                note(label + ": thyratron not fired (anode path open)");
            }
            leak(an, k, tag, label);
        }
    }

    private void gridCurrent(org.thermion.circuit.GridCurrentLaw law, double scale, String g, String k, String tag,
                             String label) {
        if (law.k() > 0) {
            add(new SpiceCard.CurrentExpression(name('B', tag, label + "_grid"), g, k,
                    TubeExpressions.grid(law, scale, g, k)));
        }
    }

    private void leak(String a, String b, String tag, String label) {
        add(new SpiceCard.Resistor(name('R', tag, label + "_leak"), a, b, 1 / Element.GMIN));
    }

    private void cap(String tag, String label, String a, String b, double farads) {
        if (farads > 0 && !a.equals(b)) {
            add(new SpiceCard.Capacitor(name('C', tag, label), a, b, farads));
        }
    }
}
