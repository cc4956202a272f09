package org.thermion.spice;

import org.thermion.text.Nouns;
import org.thermion.circuit.Load;
import org.thermion.circuit.RailSet;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageNetlist;
import org.thermion.circuit.StageSolver;
import org.thermion.circuit.Corner;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Function;

/**
 * One stage as a SPICE3 deck: the circuit {@link StageSolver} solves (its loads included), its
 * rails and inputs as DC sources. {@code spiceNodes} gives the deck's name of every node of
 * {@code netlist}, so a reader can set the deck against the model.
 */
public record StageDeck(SpiceDeck deck, StageNetlist netlist, List<String> spiceNodes) {
    /** The prefix of the stage's own labels, left out of the deck's names. */
    static final String ROLE = StageSolver.DRIVER + ".";

    public StageDeck {
        spiceNodes = List.copyOf(spiceNodes);
    }

    /**
     * The deck of {@code stage} with its inputs at {@code inputVolts}, its stored state and
     * {@code loads} on its output, at nominal values.
     */
    public static StageDeck of(StageCircuit stage, StageSolver solver, double[] inputVolts, boolean stored,
                               List<Load> loads, Function<String, TubeType> tubes) {
        StageNetlist nl = solver.netlist(StageSolver.DRIVER, stage, inputVolts, stored, loads, Corner.NOMINAL);
        List<String> names = nodeNames(nl);
        List<SpiceDeck.Line> lines = new ArrayList<>();
        SpiceWriter w = new SpiceWriter(tubes, lines);
        StringBuilder in = new StringBuilder();
        for (double v : inputVolts) {
            in.append(in.length() == 0 ? "" : ", ").append(SpiceNumber.format(v)).append(" V");
        }
        w.note("stage " + stage.name() + ", written by Thermion from the circuit its operating points are solved with");
        w.note("inputs " + (in.length() == 0 ? "none" : in) + (stored ? ", stored state 1" : "")
                + ", " + Nouns.count(loads.size(), "load") + " on the output (node "
                + names.get(nl.output()) + ")");
        w.note("B sources: the published tube equations; R ..._leak: the model's 1 TOhm leakage per tube path");
        w.note("");
        w.note("rails and inputs");
        for (int i = 0; i < nl.nodes().size(); i++) {
            if (nl.isFixed(i) && !names.get(i).equals("0")) {
                w.add(new SpiceCard.VoltageSource(w.name('V', "", names.get(i)), names.get(i), "0",
                        nl.fixedVolts().get(i)));
            }
        }
        w.note("parts");
        w.parts(nl, names::get, "", ROLE);
        return new StageDeck(new SpiceDeck("* Thermion stage " + stage.name(), lines), nl, names);
    }

    /** Deck node names for a stage netlist: rails by their name (ground "0"), the rest without the role. */
    static List<String> nodeNames(StageNetlist nl) {
        List<String> names = new ArrayList<>();
        Set<String> taken = new HashSet<>();
        for (String n : nl.nodes()) {
            if (n.startsWith("rail ")) {
                String r = n.substring(5);
                names.add(r.equals(RailSet.GROUND) ? "0" : SpiceNames.clean(r));
                taken.add(names.get(names.size() - 1).toLowerCase(Locale.ROOT));
            } else {
                names.add(null);
            }
        }
        for (int i = 0; i < names.size(); i++) {
            if (names.get(i) == null) {
                String n = nl.nodes().get(i);
                String base = SpiceNames.clean(n.startsWith(ROLE) ? n.substring(ROLE.length()) : n);
                String name = base;
                for (int k = 2; !taken.add(name.toLowerCase(Locale.ROOT)); k++) {
                    name = base + "_" + k;
                }
                names.set(i, name);
            }
        }
        return names;
    }
}
