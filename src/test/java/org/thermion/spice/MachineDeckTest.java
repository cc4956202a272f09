package org.thermion.spice;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.MachineCircuits;
import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The example machine as one deck: read back, every stage instance set against its model, every node anchored. */
class MachineDeckTest {
    private static Machine load(String file) {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborate(Path.of(file));
        assertThat(d.hasErrors()).isFalse();
        return m;
    }

    @Test
    void wholeMachineDeckMatchesEveryStageInstance() {
        Machine m = load("examples/pumpstation/pumpstation.machine");
        MachineDeck.Written w = new MachineDeck(m, MachineCircuits.of(m)).write(null);
        SpiceDeck back = SpiceReader.read(w.deck().text());
        assertThat(back.cards()).isEqualTo(w.deck().cards());
        assertThat(w.instances()).isNotEmpty();
        Random r = new Random(8);
        Map<String, Double> volts = new HashMap<>();
        for (MachineDeck.Instance inst : w.instances()) {
            for (String n : inst.spiceNodes()) {
                volts.computeIfAbsent(n, k -> k.equals("0") ? 0 : -20 + 70 * r.nextDouble());
            }
        }
        for (MachineDeck.Instance inst : w.instances()) {
            List<SpiceCard> own = back.cards().stream()
                    .filter(c -> c.name().substring(1).startsWith(inst.tag() + "_")).toList();
            Map<String, Double> deck = DeckCurrents.outOfNodes(
                    new SpiceDeck("t", own.stream().map(SpiceDeck.Line::of).toList()), volts);
            double[] v = new double[inst.spiceNodes().size()];
            for (int i = 0; i < v.length; i++) {
                v[i] = volts.get(inst.spiceNodes().get(i));
            }
            double[] model = inst.netlist().nodeCurrents(v);
            Map<String, Double> byName = new HashMap<>();
            for (int i = 0; i < v.length; i++) {
                byName.merge(inst.spiceNodes().get(i), model[i], Double::sum);
            }
            byName.forEach((node, amps) -> assertThat(deck.getOrDefault(node, 0.0)).as(inst.tag() + " " + node)
                    .isCloseTo(amps, within(1e-12 + 1e-9 * Math.abs(amps))));
        }
    }

    @Test
    void everyNodeHasTwoConnectionsAndADcPathToGround() {
        Machine m = load("examples/pumpstation/pumpstation.machine");
        SpiceDeck deck = new MachineDeck(m, MachineCircuits.of(m)).write("").deck();
        Map<String, Integer> touches = new HashMap<>();
        Map<String, String> parent = new HashMap<>();
        for (SpiceCard c : deck.cards()) {
            String[] ends = ends(c);
            for (String e : ends) {
                touches.merge(e, 1, Integer::sum);
                parent.putIfAbsent(e, e);
            }
            if (!(c instanceof SpiceCard.Capacitor) && !(c instanceof SpiceCard.CurrentExpression)) {
                parent.put(root(parent, ends[0]), root(parent, ends[1]));
            }
        }
        Set<String> floating = new HashSet<>();
        for (String n : touches.keySet()) {
            if (!root(parent, n).equals(root(parent, "0"))) {
                floating.add(n);
            }
        }
        assertThat(floating).as("nodes without a DC path to ground (a simulator refuses them)").isEmpty();
        assertThat(touches).allSatisfy((n, k) -> assertThat(k).as(n).isGreaterThanOrEqualTo(2));
    }

    @Test
    void wholeMachineDeckHoldsTheSoftStartsThyratronAndNamesWhatItLeavesOut() {
        Machine m = load("examples/pumpstation/pumpstation.machine");
        MachineDeck.Written w = new MachineDeck(m, MachineCircuits.of(m)).write(null);
        // examples/pumpstation: soft start heater_soft, bypass by thyratron_relay (2D21) with the soft start's
        // 160 ohm coil, its grid divider 100 k / 100 k from bplus (the highest rail) to bias, as the wire list wires it
        assertThat(w.instances()).filteredOn(i -> i.tag().equals("s0")).singleElement()
                .satisfies(i -> assertThat(i.what()).contains("heater_soft"));
        assertThat(w.deck().cards()).anySatisfy(c -> {
            assertThat(c).isInstanceOf(SpiceCard.Resistor.class);
            assertThat(c.name()).isEqualTo("Rs0_grid_series");
            assertThat(c.nodes()).containsExactly("bplus", "s0_tap0");
        });
        assertThat(w.deck().text()).contains("Rs0_load s0_feed s0_plate 160")
                .contains("program counter (pc): a built block known by its stated stages");
        // a module's deck has no soft start: it belongs to the machine's supply
        String path = m.modules().stream().map(x -> x.path()).filter(p -> !p.isEmpty()).findFirst().orElseThrow();
        assertThat(new MachineDeck(m, MachineCircuits.of(m)).write(path).instances()).noneMatch(i -> i.tag().equals("s0"));
    }

    @Test
    void moduleSelectionKeepsOnlyItsStages() {
        Machine m = load("examples/pumpstation/pumpstation.machine");
        MachineDeck md = new MachineDeck(m, MachineCircuits.of(m));
        int all = md.write(null).instances().size();
        String path = m.modules().stream().map(x -> x.path()).filter(p -> !p.isEmpty()).findFirst().orElseThrow();
        MachineDeck.Written part = new MachineDeck(m, MachineCircuits.of(m)).write(path);
        assertThat(part.instances().size()).isLessThan(all);
        assertThat(part.deck().title()).contains(path);
    }

    private static String[] ends(SpiceCard c) {
        if (c instanceof SpiceCard.Resistor r) {
            return new String[] {r.a(), r.b()};
        }
        if (c instanceof SpiceCard.Capacitor x) {
            return new String[] {x.a(), x.b()};
        }
        if (c instanceof SpiceCard.VoltageSource v) {
            return new String[] {v.plus(), v.minus()};
        }
        SpiceCard.CurrentExpression b = (SpiceCard.CurrentExpression) c;
        return new String[] {b.from(), b.to()};
    }

    private static String root(Map<String, String> parent, String n) {
        parent.putIfAbsent(n, n);
        while (!parent.get(n).equals(n)) {
            n = parent.get(n);
        }
        return n;
    }
}
