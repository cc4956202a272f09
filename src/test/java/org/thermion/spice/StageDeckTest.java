package org.thermion.spice;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.RailSet;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.StageNetlist;
import org.thermion.circuit.StageSolver;
import org.thermion.circuit.TubeLibrary;
import org.thermion.model.TubeType;
import org.thermion.testing.Golden;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Every library stage written as a deck, read back by the small reader, and set against the
 * model it came from: the same fixed nodes at the same volts, and at random node voltages the
 * same current out of every node (so every part joins the same nodes with the same value).
 */
class StageDeckTest {
    private static final RailSet RAILS = RailSet.volts("bplus", 48.0, "bias", -24.0, "relay", 24.0);
    /** The library's stages and tubes, as the demo machine (which includes the library) has them. */
    private static final MachineCircuits LIBRARY = demo();
    private final TubeLibrary tubes = LIBRARY.tubes();

    private static MachineCircuits demo() {
        org.thermion.lang.Diagnostics d = new org.thermion.lang.Diagnostics();
        return MachineCircuits.of(new org.thermion.elab.Elaborator(new org.thermion.lang.SourceSet(), d)
                .elaborate(java.nio.file.Path.of("examples/pumpstation/pumpstation.machine")));
    }
    private final StageSolver solver = new StageSolver(RAILS);

    private StageDeck write(StageCircuit s) {
        double[] in = new double[s.inputs()];
        java.util.Arrays.fill(in, 40.0);
        return StageDeck.of(s, solver, in, false, List.of(s.inputLoad(), s.inputLoad()), name -> null);
    }

    @Test
    void everyLibraryStageReadsBackToItsModel() {
        for (StageCircuit s : LIBRARY.circuitsByName().values()) {
            StageDeck d = write(s);
            SpiceDeck back = SpiceReader.read(d.deck().text());
            assertThat(back.cards()).as(s.name()).isEqualTo(d.deck().cards());
            StageNetlist nl = d.netlist();
            // Fixed nodes: one V card each at the model's volts.
            for (int i = 0; i < nl.nodes().size(); i++) {
                if (nl.isFixed(i) && !d.spiceNodes().get(i).equals("0")) {
                    String node = d.spiceNodes().get(i);
                    SpiceCard.VoltageSource v = back.cards().stream()
                            .filter(c -> c instanceof SpiceCard.VoltageSource vs && vs.plus().equals(node))
                            .map(c -> (SpiceCard.VoltageSource) c).findFirst().orElseThrow();
                    assertThat(v.volts()).as(s.name() + " " + node).isEqualTo(nl.fixedVolts().get(i));
                }
            }
            Random r = new Random(s.name().hashCode());
            for (int trial = 0; trial < 50; trial++) {
                double[] v = new double[nl.nodes().size()];
                Map<String, Double> byName = new HashMap<>();
                for (int i = 0; i < v.length; i++) {
                    v[i] = d.spiceNodes().get(i).equals("0") ? 0 : -30 + 80 * r.nextDouble();
                    byName.put(d.spiceNodes().get(i), v[i]);
                }
                double[] model = nl.nodeCurrents(v);
                Map<String, Double> deck = DeckCurrents.outOfNodes(back, byName);
                for (int i = 0; i < v.length; i++) {
                    String node = d.spiceNodes().get(i);
                    assertThat(deck.getOrDefault(node, 0.0)).as(s.name() + " node " + node)
                            .isCloseTo(model[i], within(1e-12 + 1e-9 * Math.abs(model[i])));
                }
            }
        }
    }

    @Test
    void capacitancesComeFromTheTubeData() {
        StageCircuit nor = LIBRARY.circuitsByName().get("triode_nor2");
        // 12AU7 per section: Cgk 1.6 pF, Cgp 1.5 pF, Cpk 0.5 pF (data sheet values, from memory).
        TubeType u7 = new TubeType("12AU7", org.thermion.model.TubeKind.TRIODE, 2, List.of(), 10, 10, 1.6e-12,
                1.5e-12, 0.5e-12, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, "from memory", List.of(), null);
        StageDeck d = StageDeck.of(nor, solver, new double[] {0, 40}, false, List.of(), n -> n.equals("12AU7") ? u7 : null);
        List<SpiceCard.Capacitor> caps = d.deck().cards().stream().filter(c -> c instanceof SpiceCard.Capacitor)
                .map(c -> (SpiceCard.Capacitor) c).toList();
        // Two sections, three interelectrode capacitances each.
        assertThat(caps).hasSize(6);
        assertThat(caps).filteredOn(c -> c.name().endsWith("_cgp")).allSatisfy(c -> {
            assertThat(c.farads()).isEqualTo(1.5e-12);
            assertThat(c.b()).isEqualTo("plate");
        });
    }

    @Test
    void pentodeInverterDeckIsStable() {
        StageDeck d = write(LIBRARY.circuitsByName().get("pentode_inverter"));
        Golden.assertMatches(Path.of("src/test/resources/org/thermion/spice/pentode_inverter.cir"), d.deck().text());
        assertThat(d.deck().text().lines()).allSatisfy(l -> assertThat(l.length()).isLessThanOrEqualTo(SpiceDeck.WIDTH));
    }

    @Test
    void readerNamesTheLineOutsideTheSet() {
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> SpiceReader.read("title\nD1 a 0 dmod\n.end\n"))
                .hasMessageContaining("line 2").hasMessageContaining("not an R, C, V or B card");
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> SpiceReader.read("title\nB1 a 0 I=if(v(a),1,0)\n.end\n"))
                .hasMessageContaining("line 2");
        assertThat(SpiceReader.read("t\nR1 a 0 4.7k\n.end\n").cards().get(0))
                .isEqualTo(new SpiceCard.Resistor("R1", "a", "0", 4700));
    }
}
