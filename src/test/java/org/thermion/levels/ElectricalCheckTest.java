package org.thermion.levels;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.thermion.model.MarginRules;

/** What check says about a machine's circuits, on machines small enough to work out by hand. */
class ElectricalCheckTest {

    static List<Finding> findings(String text) {
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(text);
        return ElectricalCheck.findings(l.machine(), LevelAnalysis.of(l.machine(), l.where().margins()));
    }

    @Test
    void twoLoadsOnALibraryInverterPassAndAThirdIsAnErrorNamingTheLimit() {
        String two = LevelAnalysisTest.RAILS + """
                module top {
                  in a, b
                  out y, w
                  net mid
                  mid = !a
                  y = !mid
                  w = !(mid | b)
                }
                machine two { top top; inputs a b; outputs y w }
                """;
        assertThat(findings(two)).isEmpty();
        // CHAIN: the same inverter feeds a third input; at its worst corner its high level falls below V_IH
        assertThat(findings(LevelAnalysisTest.CHAIN)).singleElement().satisfies(x -> {
            assertThat(x.error()).isTrue();
            assertThat(x.kind()).isEqualTo("margin");
            assertThat(x.message()).contains("net 'mid'", "3 loads", "worst-case high noise margin of -");
            assertThat(x.fix()).contains("feed at most 2");
        });
    }

    @Test
    void aDeclaredMinimumMarginTurnsAThinNetIntoAWarning() {
        String text = LevelAnalysisTest.RAILS + """
                margins { rails 2 percent; minimum 20 V }
                module top {
                  in a, b
                  out y, w
                  net mid
                  mid = !a
                  y = !mid
                  w = !(mid | b)
                }
                machine thin { top top; inputs a b; outputs y w }
                """;
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(text);
        assertThat(l.where().margins()).isEqualTo(new MarginRules(0.02, 0.05, 0.70, 20));
        List<Finding> f = ElectricalCheck.findings(l.machine(), LevelAnalysis.of(l.machine(), l.where().margins()));
        // the same net passes with the default 1 V minimum (test above); 20 V is more than it has
        assertThat(f).isNotEmpty().allSatisfy(x -> {
            assertThat(x.error()).isFalse();
            assertThat(x.message()).contains("below the minimum 20.00 V");
        });
    }

    @Test
    void theLibrarysRelayDriverCannotPullInItsCoil() {
        String text = """
                rail bplus { voltage 48 V }
                rail bias { voltage -12 V }
                rail heat { voltage 12.6 V }
                heaters on heat { parallel 12AU7 }
                module top {
                  in a
                  out pulled
                  pulled = triode_relay(a)
                }
                machine relay { top top; inputs a; outputs pulled }
                """;
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(text);
        LevelAnalysis a = LevelAnalysis.of(l.machine(), MarginRules.DEFAULT);
        LoadDrive coil = a.drives().get(0);
        // Issue 16: both 12AU7 sections, a 4.7 k coil from 48 V, grid at cathode potential: the
        // published (Koren) triode equations give about 4.5 mA; +-25 % is their usual accuracy.
        // Here the grid is driven a little positive and clamped by grid current: 5.2 mA, +15 %.
        assertThat(coil.onAmps()).isCloseTo(4.5e-3, within(0.25 * 4.5e-3));
        assertThat(coil.onWorstAmps()).isLessThan(coil.onAmps());
        List<Finding> f = ElectricalCheck.findings(l.machine(), a);
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.error()).isTrue();
            assertThat(x.kind()).isEqualTo("coil");
            assertThat(x.message()).contains("pick-up current of 8.00 mA", "may never pull in");
            assertThat(l.where().gate(x.use().index()).line()).isEqualTo(8);
        });
    }

    @Test
    void aSeriesHeaterStringOnASoftRailIsJudgedAtTheLoadedVoltage() {
        String text = """
                rail bplus { voltage 48 V }
                rail bias { voltage -12 V }
                rail heat { voltage 12.6 V; source 10 ohm }
                heaters on heat {
                  series 2 of 6AU6
                }
                realize { not pentode_inverter }
                module top {
                  in a
                  out y
                  net m
                  m = !a
                  y = !m
                }
                machine heat { top top; inputs a; outputs y }
                """;
        List<Finding> f = findings(text);
        // Ohm's law: two 6.3 V 300 mA heaters (21 ohm hot each) and 10 ohm of source on 12.6 V:
        // 12.6 / 52 = 0.2423 A, 5.088 V a heater, -19.2 % of its rating (outside +-10 %).
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo("heater");
            assertThat(x.heaterRule()).isZero();
            assertThat(x.message()).contains("gets 5.09 V against 6.30 V rated (-19 %)", "rail at 10.18 V");
        });
    }
}
