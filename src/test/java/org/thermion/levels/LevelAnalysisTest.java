package org.thermion.levels;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.MarginAnalysis;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.Tolerances;
import org.thermion.circuit.WorstCase;
import org.thermion.circuit.WorstMargin;
import org.thermion.elab.Elaborator;
import org.thermion.elab.SourceMap;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.model.MarginRules;

/** Levels, margins and fan-out of every net of small machines, read as a builder would. */
class LevelAnalysisTest {
    /** Rails the library's logic stages were drawn for: 48 V B+, -12 V bias (parts library). */
    static final String RAILS = """
            rail bplus { voltage 48 V }
            rail bias { voltage -24 V }
            rail heat { voltage 12.6 V }
            heaters on heat { parallel 6AU6 12AU7 6AL5 }
            realize { not pentode_inverter; nor triode_nor2; and diode_and }
            """;

    /** An inverter whose output feeds another inverter and two NORs. */
    static final String CHAIN = RAILS + """
            module top {
              in a, b
              out y, z, w
              net mid
              mid = !a
              y = !mid
              z = !(mid | a)
              w = !(mid | b)
            }
            machine chain { top top; inputs a b; outputs y z w }
            """;

    record Loaded(Machine machine, SourceMap where, Diagnostics diags) {
    }

    static Loaded load(String text) {
        Diagnostics d = new Diagnostics();
        Elaborator e = new Elaborator(new SourceSet(), d);
        Machine m = e.elaborateText(Path.of("test.machine"), text);
        assertThat(d.hasErrors()).as("%s", d.all()).isFalse();
        return new Loaded(m, e.sourceMap(), d);
    }

    /** The machine's stage circuits by stage name. */
    static Map<String, StageCircuit> circuits(Machine m, MachineCircuits mc) {
        Map<String, StageCircuit> out = new java.util.HashMap<>();
        m.stages().forEach(st -> mc.circuit(st).ifPresent(c -> out.put(st.name(), c)));
        return out;
    }

    static NetLevel net(LevelAnalysis a, String name) {
        return a.nets().stream().filter(n -> n.name().equals(name)).findFirst().orElseThrow();
    }

    /**
     * A cathode follower's grid feeds a cathode that rides just below it, not one held at its
     * return rail: it draws no grid current, so a cut-off inverter's plate driving it stays at
     * B+ (before, the grid was taken to conduct into -24 V and the plate read -22.7 V).
     */
    @Test
    void aCathodeFollowerOnANetDrawsNoGridCurrentFromIt() {
        String text = RAILS + """
                module top {
                  in a
                  out y
                  net m
                  m = !a
                  y = cathode_follower(m)
                }
                machine cf { top top; inputs a; outputs y }
                """;
        NetLevel m = net(LevelAnalysis.of(load(text).machine(), MarginRules.DEFAULT), "m");
        assertThat(m.voh()).isCloseTo(48.0, within(0.05));
    }

    @Test
    void aNetFeedingThreeInputsIsLoadedByAllOfThemAndNamedAsWritten() {
        Loaded l = load(CHAIN);
        LevelAnalysis a = LevelAnalysis.of(l.machine(), MarginRules.DEFAULT);
        NetLevel mid = net(a, "mid");
        assertThat(mid.stage()).isEqualTo("pentode_inverter");
        assertThat(mid.loads()).isEqualTo(3);
        assertThat(mid.receivers()).isEqualTo("pentode_inverter triode_nor2x2");
        // a conducting 6AU6 pulls its plate far below the cut-off level (22 k load from 48 V)
        assertThat(mid.voh()).isGreaterThan(mid.vol() + 10);
        assertThat(mid.vih()).isGreaterThan(mid.vil());
        // worst case never beats nominal, and the corner is named
        assertThat(mid.high().worst()).isLessThanOrEqualTo(mid.high().nominal() + 1e-9);
        assertThat(mid.low().worst()).isLessThanOrEqualTo(mid.low().nominal() + 1e-9);
        assertThat(mid.worse().corner().describe()).isNotEqualTo("nominal");
        // worst first
        List<NetLevel> nets = a.nets();
        for (int i = 1; i < nets.size(); i++) {
            double before = nets.get(i - 1).worstMargin();
            double here = nets.get(i).worstMargin();
            if (!Double.isNaN(here)) {
                assertThat(before).isLessThanOrEqualTo(here);
            }
        }
    }

    @Test
    void theSameLoadOnAnUnloadedNetLeavesItsHighLevelHigher() {
        Loaded l = load(CHAIN);
        LevelAnalysis a = LevelAnalysis.of(l.machine(), MarginRules.DEFAULT);
        // y feeds nothing (an output): no grid divider pulls its plate down
        assertThat(net(a, "y").voh()).isGreaterThan(net(a, "mid").voh());
        assertThat(net(a, "y").note()).contains("output");
    }

    @Test
    void theFanOutLimitIsTheLastCountThatKeepsTheMinimumMarginAtTheNetsWorstCorner() {
        Loaded l = load(CHAIN);
        MachineCircuits mc = MachineCircuits.of(l.machine());
        LevelAnalysis a = LevelAnalysis.of(l.machine(), mc, new Tolerances(0.05, 0.05, 0.7), 1.0);
        NetLevel mid = net(a, "mid");
        Map<String, StageCircuit> lib = circuits(l.machine(), mc);
        MarginAnalysis m = new MarginAnalysis(mc.solver());
        StageCircuit kind = lib.get(mid.limitKind());
        int limit = mid.fanOutLimit();
        assertThat(limit).isBetween(1, MarginAnalysis.MAX_FAN_OUT - 1);
        assertThat(m.margins(lib.get("pentode_inverter"), mid.inputs(), kind, limit, mid.worse().corner()).worst())
                .isGreaterThanOrEqualTo(1.0);
        assertThat(m.margins(lib.get("pentode_inverter"), mid.inputs(), kind, limit + 1, mid.worse().corner()).worst())
                .isLessThan(1.0);
    }

    @Test
    void onTheMachinePathTheSensitivityCornerMatchesExhaustiveEnumeration() {
        Loaded l = load(CHAIN);
        MachineCircuits mc = MachineCircuits.of(l.machine());
        Tolerances t = new Tolerances(0.05, 0.05, 0.7);
        LevelAnalysis a = LevelAnalysis.of(l.machine(), mc, t, 1.0);
        Map<String, StageCircuit> lib = circuits(l.machine(), mc);
        // 'mid' with its real receivers, at the input levels the machine gave its driver
        NetLevel mid = net(a, "mid");
        List<StageCircuit> receivers = List.of(lib.get("pentode_inverter"), lib.get("triode_nor2"),
                lib.get("triode_nor2"));
        WorstCase wc = new WorstCase(new MarginAnalysis(mc.solver()), t);
        assertThat(wc.parameters(lib.get("pentode_inverter"), receivers)).hasSizeLessThanOrEqualTo(16);
        for (WorstMargin side : List.of(mid.high(), mid.low())) {
            WorstMargin all = wc.exhaustive(side.side(), lib.get("pentode_inverter"), mid.inputs(), receivers);
            // the corner by sensitivity signs is the worst of all 2^k corners, or within 2 % of its drop
            assertThat(side.worst()).isCloseTo(all.worst(),
                    within(0.02 * Math.abs(side.nominal() - all.worst()) + 1e-6));
        }
    }

    /** Four inverters of our own in a row (12AU7 section, 47 k from 48 V, 100 k / 100 k to -24 V). */
    static final String ROW = """
            rail bplus { voltage 48 V }
            rail bias { voltage -24 V }
            rail heat { voltage 6.3 V }
            heaters on heat { parallel 12AU7 }
            stage bench_inverter : not {
              tube 12AU7
              load 47 k from bplus
              grid divider 100 k 100 k to bias
            }
            realize { not bench_inverter }
            module top {
              in a
              out y
              net m1, m2, m3
              m1 = !a
              m2 = !m1
              m3 = !m2
              y = !m3
            }
            machine row { top top; inputs a; outputs y }
            """;

    @Test
    void aWorstCaseMarginTakesItsDriversInputAtTheDrivingNetsWorstCornerLevel() {
        Loaded l = load(ROW);
        MachineCircuits mc = MachineCircuits.of(l.machine());
        Tolerances t = Tolerances.DEFAULT;
        LevelAnalysis a = LevelAnalysis.of(l.machine(), mc, t, 1.0);
        StageCircuit inv = circuits(l.machine(), mc).get("bench_inverter");
        List<StageCircuit> receivers = List.of(inv);
        WorstCase wc = new WorstCase(new MarginAnalysis(mc.solver()), t);
        NetLevel m1 = net(a, "m1");
        NetLevel m2 = net(a, "m2");
        // m1's driver is fed from outside: its worst-case inputs are its nominal ones
        assertThat(m1.worstInputs()).isEqualTo(m1.inputs());
        // m2's driver sees m1, whose high level at its worst corner is below its nominal one
        assertThat(m1.worstVoh()).isLessThan(m1.voh() - 1);
        assertThat(m2.worstInputs().high()).isLessThan(m2.inputs().high() - 1);
        // with its input that much lower m2's driver conducts less, so its low level rises: the
        // worst-case low margin is lower than with the input at m1's nominal level
        WorstMargin atNominalInput = wc.margins(inv, m2.inputs(), receivers).get(1);
        WorstMargin atWorstInput = wc.margins(inv, m2.worstInputs(), receivers).get(1);
        assertThat(m2.low().worst()).isLessThan(atNominalInput.worst() - 0.1);
        assertThat(m2.low().worst()).isCloseTo(atWorstInput.worst(), within(1e-9));
        assertThat(m2.low().nominal()).isCloseTo(atNominalInput.nominal(), within(1e-9));
        // and the sensitivity corner still matches exhaustive enumeration at those input levels
        WorstMargin all = wc.exhaustive(WorstMargin.Side.LOW, inv, m2.worstInputs(), receivers);
        assertThat(m2.low().worst()).isCloseTo(all.worst(), within(0.02 * Math.abs(m2.low().nominal() - all.worst()) + 1e-6));
    }
}
