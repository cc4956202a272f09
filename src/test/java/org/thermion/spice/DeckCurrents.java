package org.thermion.spice;

import java.util.HashMap;
import java.util.Map;

/** The DC current out of every node of a deck into its R and B cards (capacitors and sources carry none of it). */
final class DeckCurrents {
    private DeckCurrents() {
    }

    static Map<String, Double> outOfNodes(SpiceDeck deck, Map<String, Double> volts) {
        Map<String, Double> out = new HashMap<>();
        for (SpiceCard c : deck.cards()) {
            if (c instanceof SpiceCard.Resistor r) {
                double i = (v(volts, r.a()) - v(volts, r.b())) / r.ohms();
                out.merge(r.a(), i, Double::sum);
                out.merge(r.b(), -i, Double::sum);
            } else if (c instanceof SpiceCard.CurrentExpression b) {
                double i = SpiceExpression.parse(b.expression()).evaluate(volts);
                out.merge(b.from(), i, Double::sum);
                out.merge(b.to(), -i, Double::sum);
            }
        }
        return out;
    }

    private static double v(Map<String, Double> volts, String node) {
        return node.equals("0") ? 0 : volts.get(node);
    }
}
