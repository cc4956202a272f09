package org.thermion.circuit;

import org.thermion.text.Quantities;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Turns a solved circuit's node voltages into an {@link OperatingPoint}. */
final class PointReader {
    private PointReader() {
    }

    static DcResult read(String stage, Circuit c, DcSolver.Solution s, RailSet rails, String ownPrefix) {
        double[] v = s.volts();
        double[] out = c.nodeCurrents(v);
        Map<String, Double> nodes = new LinkedHashMap<>();
        Map<String, Double> railAmps = new LinkedHashMap<>();
        Map<String, Double> inputAmps = new LinkedHashMap<>();
        double residual = 0;
        for (int i = 0; i < c.size(); i++) {
            String n = c.names.get(i);
            nodes.put(n, v[i]);
            if (!c.isFixed(i)) {
                residual = Math.max(residual, Math.abs(out[i]));
            } else if (n.startsWith("rail ")) {
                railAmps.put(n.substring(5), out[i]);
            } else {
                inputAmps.put(n, out[i]);
            }
        }
        for (Map.Entry<String, Double> e : railAmps.entrySet()) {
            var r = rails.rail(e.getKey());
            if (r != null && Double.isFinite(r.limitAmps()) && Math.abs(e.getValue()) > r.limitAmps()) {
                return new NoDcSolution(stage, "rail " + e.getKey() + " cannot supply the load: "
                        + Quantities.amps(Math.abs(e.getValue())) + " drawn, limit " + Quantities.amps(r.limitAmps()), "raise rail " + e.getKey()
                        + "'s current limit, or use a larger plate load so that the stage draws less");
            }
        }
        List<PartCurrent> parts = new ArrayList<>();
        List<TubeDissipation> tubes = new ArrayList<>();
        double grid = 0;
        for (Element e : c.elements) {
            if (e instanceof Element.Resistor r) {
                parts.add(new PartCurrent(r.label(), (v[r.a()] - v[r.b()]) / r.ohms(), v[r.a()] - v[r.b()]));
            } else if (e instanceof Element.Lamp l) {
                double volts = v[l.a()] - v[l.b()];
                parts.add(new PartCurrent(l.label(), l.current(volts), volts));
            } else if (e instanceof Element.Diode d) {
                double volts = v[d.a()] - v[d.k()];
                parts.add(new PartCurrent(d.label(), d.emission() * d.model().current(volts), volts));
            } else if (e instanceof Element.Triode t) {
                double vpk = v[t.p()] - v[t.k()];
                double ip = t.emission() * t.model().plateCurrent(vpk, v[t.g()] - v[t.k()]);
                double ig = t.count() * t.emission() * t.model().grid().current(v[t.g()] - v[t.k()]);
                tubes.add(new TubeDissipation(t.label(), t.model().name(), t.count(), ip * vpk, 0,
                        t.model().plateWatts(), Double.NaN, ig));
                grid += own(t.label(), ownPrefix) ? ig : 0;
            } else if (e instanceof Element.Pentode p) {
                double vpk = v[p.p()] - v[p.k()];
                double vg1 = v[p.g1()] - v[p.k()];
                double vg2 = v[p.g2()] - v[p.k()];
                double ip = p.emission() * p.model().plateCurrent(vpk, vg1, vg2);
                double is = p.emission() * p.model().screenCurrent(vg1, vg2);
                double ig = p.count() * p.emission() * p.model().grid().current(vg1);
                tubes.add(new TubeDissipation(p.label(), p.model().name(), p.count(), ip * vpk, is * vg2,
                        p.model().plateWatts(), p.model().screenWatts(), ig));
                grid += own(p.label(), ownPrefix) ? ig : 0;
            } else if (e instanceof Element.Arc a) {
                double vak = v[a.a()] - v[a.k()];
                double i = a.conducting() && vak > a.model().arcDrop() ? (vak - a.model().arcDrop()) / Element.Arc.ARC_OHMS : 0;
                parts.add(new PartCurrent(a.label(), i, vak));
            }
        }
        return new OperatingPoint(stage, v[c.output], nodes, railAmps, inputAmps, parts, tubes, grid, residual,
                s.iterations());
    }

    private static boolean own(String label, String prefix) {
        return label.startsWith(prefix);
    }
}
