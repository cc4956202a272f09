package org.thermion.levels;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.DiodeLoad;
import org.thermion.circuit.GridLoad;
import org.thermion.circuit.Load;
import org.thermion.circuit.MachineCircuits;
import org.thermion.model.MarginRules;

/** What a net drives through diode gates: the loads at the end of the chain come back to its driver. */
class ReceiversTest {
    /** The library's rails, NOT, AND and OR by the library's stages (no NOR: an OR stays an OR). */
    static final String RAILS = LevelAnalysisTest.RAILS.replace("nor triode_nor2; and diode_and",
            "and diode_and; or diode_or");

    /** An inverter into a diode AND, into a diode OR, into an inverter's grid divider. */
    static final String INTO_GRID = RAILS + """
            module top {
              in a, b, c
              out y
              net m, p, q
              m = !a
              p = m & b
              q = p | c
              y = !q
            }
            machine chain { top top; inputs a b c; outputs y }
            """;

    /** The same gates with the OR's output going nowhere. */
    static final String INTO_NOTHING = RAILS + """
            module top {
              in a, b, c
              out q
              net m, p
              m = !a
              p = m & b
              q = p | c
            }
            machine chain { top top; inputs a b c; outputs q }
            """;

    @Test
    void anInvertersLoadThroughAnAndAndAnOrEndsAtTheGridTheyFeed() {
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(INTO_GRID);
        NetFanout fanout = NetFanout.of(l.machine());
        Receivers r = new Receivers(l.machine(), MachineCircuits.of(l.machine()), fanout);
        NetFanout.Node m = fanout.nodes().stream().filter(n -> n.name().equals("m")).findFirst().orElseThrow();

        List<Load> loads = r.loadsOn(m);
        assertThat(loads).hasSize(1);
        DiodeLoad and = (DiodeLoad) loads.get(0);
        DiodeLoad or = (DiodeLoad) and.beyond().get(0);
        assertThat(or.beyond()).singleElement().isInstanceOf(GridLoad.class);
    }

    @Test
    void anAndsHighLevelFallsWhenItsOrFeedsAGrid() {
        NetLevel loaded = LevelAnalysisTest.net(LevelAnalysis.of(LevelAnalysisTest.load(INTO_GRID).machine(),
                MarginRules.DEFAULT), "p");
        NetLevel light = LevelAnalysisTest.net(LevelAnalysis.of(LevelAnalysisTest.load(INTO_NOTHING).machine(),
                MarginRules.DEFAULT), "p");
        // the 510 k pull-up lifts a 10 M pull-down to about 46 V, the divider behind it to about 31 V
        assertThat(light.voh()).isGreaterThan(44);
        assertThat(loaded.voh()).isLessThan(light.voh() - 10);
    }
}
