package org.thermion.circuit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.thermion.model.Rail;

/**
 * Builds a {@link Circuit} from parts, applying a tolerance {@link Corner}: every resistor and
 * tube is labelled (prefixed by the role of the stage it belongs to, e.g. "driver."), every
 * rail by "rail.NAME", and each label's factor scales it. The labels met are kept, so a caller
 * learns which parameters a margin depends on.
 */
public final class CircuitBuilder {
    private final RailSet rails;
    private final Corner corner;
    private String prefix = "";
    private final List<String> names = new ArrayList<>();
    private final List<Double> fixed = new ArrayList<>();
    private final Map<Integer, Double> guesses = new HashMap<>();
    private final Map<String, Integer> byName = new HashMap<>();
    private final List<Element> elements = new ArrayList<>();
    private final Set<Parameter> parameters = new LinkedHashSet<>();
    private String missingRail;
    private int output = -1;
    private final boolean joinIdentical;
    private int copies = 1;

    CircuitBuilder(RailSet rails, Corner corner) {
        this(rails, corner, false);
    }

    /**
     * With {@code joinIdentical}, equal loads on one node are built once as that many copies in
     * parallel ({@link #attachAll}): by symmetry their nodes sit at one voltage, and a net with
     * eight identical receivers (each with its chain) solves as one.
     */
    CircuitBuilder(RailSet rails, Corner corner, boolean joinIdentical) {
        this.rails = rails;
        this.corner = corner;
        this.joinIdentical = joinIdentical;
    }

    /**
     * Attaches {@code loads} on node {@code out}, each tagged {@code tag} and its index (equal
     * loads once, as copies in parallel, when this builder joins identical loads).
     */
    void attachAll(List<Load> loads, int out, String tag) {
        if (!joinIdentical) {
            for (int i = 0; i < loads.size(); i++) {
                loads.get(i).attach(this, out, tag + i);
            }
            return;
        }
        Map<Load, Integer> count = new java.util.LinkedHashMap<>();
        for (Load l : loads) {
            count.merge(l, 1, Integer::sum);
        }
        int i = 0;
        int outer = copies;
        for (Map.Entry<Load, Integer> e : count.entrySet()) {
            copies = outer * e.getValue();
            e.getKey().attach(this, out, tag + i++);
        }
        copies = outer;
    }

    /** Labels of the parts added from now on start with {@code role} + ".". */
    void role(String role) {
        prefix = role.isEmpty() ? "" : role + ".";
    }

    String prefix() {
        return prefix;
    }

    /**
     * Labels parts from now on under {@code sub} within the current role ("receiver." becomes
     * "receiver.next."), so a load's own loads get tolerances apart from it; returns the prefix
     * to give back to {@link #restorePrefix}.
     */
    String nest(String sub) {
        String old = prefix;
        prefix = prefix + sub + ".";
        return old;
    }

    void restorePrefix(String old) {
        prefix = old;
    }

    /** The node of rail {@code name} (at its corner voltage); ground is never toleranced. */
    int rail(String name) {
        Integer n = byName.get("rail " + name);
        if (n != null) {
            return n;
        }
        Rail r = rails.rail(name);
        double volts = 0;
        if (r == null) {
            missingRail = missingRail == null ? name : missingRail;
        } else if (!name.equals(RailSet.GROUND)) {
            parameters.add(new Parameter("rail." + name, Parameter.Kind.RAIL));
            volts = r.volts() * corner.factor("rail." + name);
        }
        return add("rail " + name, volts);
    }

    /** A fixed source node (a driving stage's output taken as ideal). */
    int source(String name, double volts) {
        Checks.finite("volts of " + name, volts);
        return add(prefix + name, volts);
    }

    /** A free node, named within the current role; the same name gives the same node. */
    int node(String name) {
        Integer n = byName.get(prefix + name);
        return n != null ? n : add(prefix + name, Double.NaN);
    }

    /** A starting guess for a free node (decides which state a bistable circuit settles in). */
    void guess(int node, double volts) {
        guesses.put(node, volts);
    }

    /** A resistor of {@code ohms} (> 0) at its corner value. */
    void resistor(String label, int a, int b, double ohms) {
        Checks.positive("ohms of " + prefix + label, ohms);
        elements.add(new Element.Resistor(prefix + label, a, b, ohms * factor(label, Parameter.Kind.RESISTOR) / copies));
    }

    void lamp(String label, int a, int b, Lamp lamp) {
        elements.add(new Element.Lamp(prefix + label, a, b, lamp.ratedVolts(), lamp.ratedAmps() * copies,
                lamp.coldRatio()));
    }

    void triode(String label, KorenTriode m, int count, int p, int g, int k) {
        elements.add(new Element.Triode(prefix + label, m, count, p, g, k, emission()));
    }

    void pentode(String label, KorenPentode m, int count, int p, int g1, int g2, int k) {
        elements.add(new Element.Pentode(prefix + label, m, count, p, g1, g2, k, emission()));
    }

    void diode(String label, ChildDiode m, int a, int k) {
        elements.add(new Element.Diode(prefix + label, m, a, k, emission()));
    }

    void grid(String label, GridCurrentLaw law, int g, int k) {
        elements.add(new Element.Grid(prefix + label, law, g, k, emission()));
    }

    void arc(String label, GasThyratron m, boolean conducting, int a, int k) {
        if (copies != 1) {
            throw new IllegalStateException("a thyratron cannot stand for copies of itself: " + prefix + label);
        }
        elements.add(new Element.Arc(prefix + label, m, conducting, a, k));
    }

    /** A resistor's value at this corner (recorded as a parameter like {@link #resistor}). */
    double ohms(String label, double nominal) {
        return nominal * factor(label, Parameter.Kind.RESISTOR);
    }

    /** A rail's volts at this corner. */
    double railVolts(String name) {
        return fixedVolts(rail(name));
    }

    double fixedVolts(int node) {
        return fixed.get(node);
    }

    /** The parameters met while building. */
    public Set<Parameter> parameters() {
        return Set.copyOf(parameters);
    }

    /** The first rail asked for that the rail set lacks, or null. */
    String missingRail() {
        return missingRail;
    }

    /** Marks the output node. */
    void output(int node) {
        output = node;
    }

    Circuit build() {
        double[] f = new double[fixed.size()];
        double[] g = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            f[i] = fixed.get(i);
            g[i] = Double.isNaN(f[i]) ? guesses.getOrDefault(i, 0.0) : f[i];
        }
        return new Circuit(names, f, g, elements, output);
    }

    /** The tube's emission factor at this corner, times the copies it stands for. */
    private double emission() {
        return factor("emission", Parameter.Kind.EMISSION) * copies;
    }

    private double factor(String label, Parameter.Kind kind) {
        parameters.add(new Parameter(prefix + label, kind));
        return corner.factor(prefix + label);
    }

    private int add(String name, double volts) {
        int n = names.size();
        names.add(name);
        fixed.add(volts);
        byName.put(name, n);
        return n;
    }
}
