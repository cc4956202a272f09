package org.thermion.circuit;

import java.util.List;

/**
 * A stage's circuit as parts between named nodes, as {@link StageSolver} would solve it: node
 * names (rails are "rail NAME", input sources "ROLE.inN"), each node's fixed volts (NaN for a
 * free node), the parts, and the output node's index.
 */
public record StageNetlist(List<String> nodes, List<Double> fixedVolts, List<Element> parts, int output) {
    public StageNetlist {
        nodes = List.copyOf(nodes);
        fixedVolts = List.copyOf(fixedVolts);
        parts = List.copyOf(parts);
    }

    /** True when node {@code i} is held at a fixed voltage (a rail or an input source). */
    public boolean isFixed(int i) {
        return !Double.isNaN(fixedVolts.get(i));
    }

    /** Current out of every node into the parts at node voltages {@code v} (indexed like {@link #nodes}). */
    public double[] nodeCurrents(double[] v) {
        double[] out = new double[v.length];
        for (Element e : parts) {
            e.addCurrents(v, out);
        }
        return out;
    }
}
