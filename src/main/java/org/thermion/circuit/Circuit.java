package org.thermion.circuit;

import java.util.List;

/**
 * A DC circuit ready to solve: nodes (fixed ones carry a voltage, free ones NaN), the parts
 * between them, a starting guess, and which node is the stage's output. Built by
 * {@link CircuitBuilder}; immutable.
 */
final class Circuit {
    final List<String> names;
    final double[] fixed;
    final double[] guess;
    final Element[] elements;
    final int output;

    Circuit(List<String> names, double[] fixed, double[] guess, List<Element> elements, int output) {
        this.names = List.copyOf(names);
        this.fixed = fixed.clone();
        this.guess = guess.clone();
        this.elements = elements.toArray(new Element[0]);
        this.output = output;
    }

    /** The same circuit with each free node's guess taken from {@code volts} (by node name) where it has one. */
    Circuit startingFrom(java.util.Map<String, Double> volts) {
        double[] g = guess.clone();
        for (int i = 0; i < g.length; i++) {
            Double v = isFixed(i) ? null : volts.get(names.get(i));
            if (v != null && Double.isFinite(v)) {
                g[i] = v;
            }
        }
        return new Circuit(names, fixed, g, List.of(elements), output);
    }

    int size() {
        return fixed.length;
    }

    boolean isFixed(int node) {
        return !Double.isNaN(fixed[node]);
    }

    /** Current flowing out of every node into the parts, at node voltages {@code v}. */
    double[] nodeCurrents(double[] v) {
        double[] out = new double[v.length];
        for (Element e : elements) {
            e.addCurrents(v, out);
        }
        return out;
    }

    /** The first free node with no DC path to a fixed node, or -1. */
    int floatingNode() {
        int n = size();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) {
            parent[i] = i;
        }
        for (Element e : elements) {
            int[] ends = e.conductiveEnds();
            for (int i = 0; i < ends.length; i += 2) {
                parent[find(parent, ends[i])] = find(parent, ends[i + 1]);
            }
        }
        boolean[] anchored = new boolean[n];
        for (int i = 0; i < n; i++) {
            if (isFixed(i)) {
                anchored[find(parent, i)] = true;
            }
        }
        for (int i = 0; i < n; i++) {
            if (!anchored[find(parent, i)]) {
                return i;
            }
        }
        return -1;
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }
}
