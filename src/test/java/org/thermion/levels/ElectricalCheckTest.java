package org.thermion.levels;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.thermion.model.MarginRules;

/** What check says about a machine's circuits, on machines small enough to work out by hand. */
class ElectricalCheckTest {

    /** A library inverter whose output feeds another inverter and one NOR: two loads. */
    private static final String TWO_LOADS = """
            module top {
              in a, b
              out y, w
              net mid
              mid = !a
              y = !mid
              w = !(mid | b)
            }
            """;

    static List<Finding> findings(String text) {
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(text);
        return ElectricalCheck.findings(l.machine(), LevelAnalysis.of(l.machine(), l.where().margins()));
    }

    @Test
    void upToEightLoadsOnALibraryInverterPassAndTwelveAreAnErrorNamingTheLimit() {
        String two = LevelAnalysisTest.RAILS + TWO_LOADS + "machine two { top top; inputs a b; outputs y w }\n";
        assertThat(findings(two)).isEmpty();
        assertThat(findings(LevelAnalysisTest.CHAIN)).isEmpty();
        assertThat(findings(nors(8))).isEmpty();
        // The same inverter feeding twelve NOR inputs: at its worst corner its high level falls below V_IH
        assertThat(findings(nors(12))).singleElement().satisfies(x -> {
            assertThat(x.error()).isTrue();
            assertThat(x.kind()).isEqualTo("margin");
            assertThat(x.message()).contains("net 'mid'", "12 loads", "worst-case high noise margin of -");
            assertThat(x.fix()).contains("feed at most 8");
        });
    }

    /** An inverter whose output feeds {@code n} NORs (1 M / 1.2 M grid dividers each). */
    private static String nors(int n) {
        StringBuilder ins = new StringBuilder();
        StringBuilder outs = new StringBuilder();
        StringBuilder body = new StringBuilder();
        for (int i = 0; i < n; i++) {
            ins.append(", i").append(i);
            outs.append(i == 0 ? "" : ", ").append('o').append(i);
            body.append("  o").append(i).append(" = !(mid | i").append(i).append(")\n");
        }
        return LevelAnalysisTest.RAILS + "module top {\n  in a" + ins + "\n  out " + outs + "\n  net mid\n  mid = !a\n"
                + body + "}\nmachine fan { top top; inputs a" + ins.toString().replace(",", "") + "; outputs "
                + outs.toString().replace(",", "") + " }\n";
    }

    @Test
    void aDeclaredMinimumMarginTurnsAThinNetIntoAWarning() {
        String text = LevelAnalysisTest.RAILS + "margins { rails 2 percent; minimum 20 V }\n" + TWO_LOADS
                + "machine thin { top top; inputs a b; outputs y w }\n";
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
    void theLibrarysRelayDriverPullsInItsCoilAndAHeavierCoilIsAnError() {
        String rails = """
                rail bplus { voltage 48 V }
                rail bias { voltage -24 V }
                rail heat { voltage 12.6 V }
                heaters on heat { parallel 12AU7 }
                """;
        String text = rails + """
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
        // Both 12AU7 sections, the library's 5 k coil from 48 V: with the grid at cathode potential Koren's
        // triode equations with the library's fitted 12AU7 set give 4.59 mA (solved by hand: per section
        // 2 (Va/20.92)^1.177 / 1080 A, both sections, Va = 48 V - 5 k * I). Here a 48 V input lifts the grid a
        // little positive, where grid current through the divider clamps it: more than that, by under 25 %.
        assertThat(coil.onAmps()).isBetween(0.95 * 4.59e-3, 1.25 * 4.59e-3);
        assertThat(coil.onWorstAmps()).isLessThan(coil.onAmps()).isGreaterThan(2.0e-3);
        assertThat(ElectricalCheck.findings(l.machine(), a)).isEmpty();

        // The same pair with a 4.7 k coil that needs 8 mA cannot pull it in.
        String heavy = rails + """
                stage heavy_relay : relay {
                  tube 12AU7
                  sections 2
                  fanin 1
                  load coil 4.7 k pickup 8 mA from bplus
                  grid divider 470 k 560 k to bias
                }
                module top {
                  in a
                  out pulled
                  pulled = heavy_relay(a)
                }
                machine relay { top top; inputs a; outputs pulled }
                """;
        LevelAnalysisTest.Loaded h = LevelAnalysisTest.load(heavy);
        List<Finding> f = ElectricalCheck.findings(h.machine(), LevelAnalysis.of(h.machine(), MarginRules.DEFAULT));
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.error()).isTrue();
            assertThat(x.kind()).isEqualTo("coil");
            assertThat(x.message()).contains("pick-up current of 8.00 mA", "may never pull in");
            assertThat(h.where().gate(x.use().index()).line()).isEqualTo(15);
        });
    }

    @Test
    void aSeriesHeaterStringOnASoftRailIsJudgedAtTheLoadedVoltage() {
        String text = """
                rail bplus { voltage 48 V }
                rail bias { voltage -24 V }
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

    /** A bench board of our own: an inverter pair on 48 V with a 24 V relay rail; the stages under test added. */
    static String board(String rails, String extra, String module) {
        return rails + """
                rail bias { voltage -24 V }
                rail heat { voltage 6.3 V }
                rail relay { voltage 24 V; source 1 ohm }
                heaters on heat { parallel 12AU7 2D21 }
                stage bench_inverter : not {
                  tube 12AU7
                  load 47 k from bplus
                  grid divider 100 k 100 k to bias
                }
                realize { not bench_inverter }
                """ + extra + """
                module top {
                  in a
                  out y
                  net m
                  m = !a
                  y = !m
                """ + module + """
                }
                machine bench { top top; inputs a; outputs y }
                """;
    }

    @Test
    void aRailThatCannotSupplyTheLoadIsAnErrorAtEachStageUseSayingWhyAndWhatCuresIt() {
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(board("rail bplus { voltage 48 V; limit 0.1 mA }\n", "", ""));
        List<Finding> f = ElectricalCheck.findings(l.machine(), LevelAnalysis.of(l.machine(), l.where().margins()));
        assertThat(f).hasSize(2).allSatisfy(x -> {
            assertThat(x.error()).isTrue();
            assertThat(x.kind()).isEqualTo("nodc");
            assertThat(x.message()).contains("stage bench_inverter has no DC solution", "rail bplus cannot supply the load",
                    "limit 0.10 mA");
            assertThat(x.fix()).contains("raise rail bplus's current limit");
        });
        // m = !a and y = !m: lines 16 and 17 of the text
        assertThat(f).extracting(x -> l.where().gate(x.use().index()).line()).containsExactlyInAnyOrder(16, 17);
        // the same board with a supply that can feed it has none
        assertThat(findings(board("rail bplus { voltage 48 V; limit 400 mA }\n", "", ""))).isEmpty();
    }

    static String softStart(String relay) {
        return board("rail bplus { voltage 48 V }\n", """
                stage bench_bypass : relay {
                  tube 2D21
                  load 160 ohm from relay
                  series 100 ohm
                }
                softstart heater_soft on heat {
                  resistor 0.5 ohm rated 50 W
                  relay { %s }
                  bypass when bench_bypass warm
                }
                """.formatted(relay), "");
    }

    @Test
    void aSoftStartsBypassCoilIsJudgedAgainstItsPickUpAtTheCornerThatStarvesIt() {
        // Ohm's law: (24 V - 8 V arc drop of the 2D21, library) / (1 + 100 + 160 ohm) with the relay
        // rail's own 1 ohm source carrying the coil current (the rail under its load):
        // 16 / 262 = 61.07 mA, 9.77 V across the coil. With the loaded rail (24 - 1 x 61.07 mA
        // = 23.94 V) 5 % low and both resistors 5 % high: (22.74 - 8) / (1 + 105 + 168) = 53.80 mA.
        LevelAnalysisTest.Loaded ok = LevelAnalysisTest.load(softStart("coil 160 ohm; rated 12 V; pickup 8 V"));
        LevelAnalysis a = LevelAnalysis.of(ok.machine(), ok.where().margins());
        LoadDrive bypass = a.drives().stream().filter(d -> d.softStart() == 0).findFirst().orElseThrow();
        assertThat(bypass.onAmps()).isCloseTo(16.0 / 262, within(1e-5));
        assertThat(bypass.onWorstAmps()).isCloseTo(((24 - 16.0 / 262) * 0.95 - 8) / 274, within(1e-5));
        assertThat(bypass.ratedAmps()).isCloseTo(8.0 / 160, within(1e-9));
        assertThat(ElectricalCheck.findings(ok.machine(), a)).isEmpty();

        LevelAnalysisTest.Loaded shortOf = LevelAnalysisTest.load(softStart("coil 160 ohm; rated 12 V; pickup 10 V"));
        List<Finding> f = ElectricalCheck.findings(shortOf.machine(),
                LevelAnalysis.of(shortOf.machine(), shortOf.where().margins()));
        assertThat(f).singleElement().satisfies(x -> {
            assertThat(x.error()).isTrue();
            assertThat(x.kind()).isEqualTo("coil");
            assertThat(x.use()).isNull();
            assertThat(x.message()).contains("soft start 'heater_soft'", "gets 53.80 mA", "8.61 V across it against 10.00 V",
                    "86 % of its pick-up current of 62.50 mA");
            assertThat(x.fix()).contains("`series` plate resistor in stage bench_bypass");
            assertThat(shortOf.where().softStart(x.softStart()).line()).isEqualTo(20); // the bypass line
        });

        // rated 6 V: the coil's 9.77 V is 63 % over its rating (over +10 %, common practice): a warning
        List<Finding> hot = findings(softStart("coil 160 ohm; rated 6 V; pickup 4 V"));
        assertThat(hot).singleElement().satisfies(x -> {
            assertThat(x.error()).isFalse();
            assertThat(x.message()).contains("gets 9.77 V at nominal values against its rated 6.00 V");
        });
    }

    @Test
    void aSoftStartsThyratronWhoseGridCanNeverReachItsCriticalVoltageIsAnError() {
        // The grid network hangs from the highest rail (bplus, 48 V) as the wire list wires it:
        // 100 k to it and 10 k to the -24 V bias put the grid at (48 * 10 k - 24 * 100 k) / 110 k
        // = -17.5 V (voltage divider), far below the 2D21's critical -24 V / 250 = -0.10 V
        // (control ratio 250, the library's source); it never fires, so its coil gets nothing.
        String dead = softStart("coil 160 ohm; rated 12 V; pickup 8 V")
                .replace("  series 100 ohm\n", "  series 100 ohm\n  grid divider 100 k 10 k to bias\n");
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(dead);
        LevelAnalysis a = LevelAnalysis.of(l.machine(), l.where().margins());
        LoadDrive bypass = a.drives().stream().filter(d -> d.softStart() == 0).findFirst().orElseThrow();
        assertThat(bypass.onAmps()).isLessThan(1e-9); // the solver's leakage only
        assertThat(ElectricalCheck.findings(l.machine(), a)).singleElement().satisfies(x -> {
            assertThat(x.error()).isTrue();
            assertThat(x.kind()).isEqualTo("coil");
            assertThat(x.message()).contains("soft start 'heater_soft'", "gets 0.00 uA");
            assertThat(x.fix()).contains("its thyratron never fires", "below its critical voltage");
        });
        // 100 k and 100 k: (48 - 24) / 2 = +12 V on the grid, above critical: it fires, as in the test above
        String live = dead.replace("grid divider 100 k 10 k to bias", "grid divider 100 k 100 k to bias");
        assertThat(findings(live)).isEmpty();
    }

    static String thyratronRelay(String load) {
        return board("rail bplus { voltage 48 V }\n", """
                stage bench_thyratron : relay {
                  tube 2D21
                  %s
                  series 100 ohm
                  grid divider 47 k 100 k to bias
                }
                """.formatted(load), """
                  net pulled
                  pulled = bench_thyratron(a)
                """);
    }

    @Test
    void aThyratronRelayStageInTheLogicIsJudgedByItsCoil() {
        // a high input (48 V, from outside) puts the grid at -24 + 72 x 100/147 = +25 V, above the 2D21's
        // critical grid at its 24 V anode, -24/250 = -0.10 V (control ratio 250, r-type.org EN91 page): it
        // fires, and the coil carries (24 - 8) / (1 + 100 + 160 + 1 ohm of the relay rail's source) = 61.07 mA
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(thyratronRelay("load coil 160 ohm pickup 50 mA from relay"));
        LevelAnalysis a = LevelAnalysis.of(l.machine(), l.where().margins());
        LoadDrive d = a.drives().get(0);
        assertThat(d.stage()).isEqualTo("bench_thyratron");
        assertThat(d.onAmps()).isCloseTo(16.0 / 262, within(1e-5));
        assertThat(d.offAmps()).isCloseTo(0, within(1e-9));
        assertThat(ElectricalCheck.findings(l.machine(), a)).isEmpty();

        assertThat(findings(thyratronRelay("load coil 160 ohm pickup 70 mA from relay"))).singleElement()
                .satisfies(x -> {
                    assertThat(x.error()).isTrue();
                    assertThat(x.message()).contains("relay coil of 'pulled' (bench_thyratron)", "may never pull in");
                });
        // the coil written as a plain resistor: its pick-up is unknown, which check says
        assertThat(findings(thyratronRelay("load 160 ohm from relay"))).singleElement().satisfies(x -> {
            assertThat(x.error()).isFalse();
            assertThat(x.message()).contains("is a plain 160 ohm resistor: its pick-up current is not stated");
            assertThat(x.fix()).contains("load coil 160 ohm pickup <amps>");
        });
    }

    @Test
    void aCathodeFollowerRelayDriverThatGivesItsCoilOnlyPartOfItsPickUpIsAnErrorWithTheNumbersAndAFix() {
        // both 12AU7 sections as a follower, its 1 k coil in the cathode, its grid on a switch at 48 V
        String text = board("rail bplus { voltage 48 V }\n", """
                stage follower_relay : relay {
                  tube 12AU7
                  sections 2
                  load direct from bplus
                  cathode coil 1 k pickup 45 mA to ground
                  output cathode
                }
                """, """
                  net pulled
                  pulled = follower_relay(a)
                """);
        LevelAnalysisTest.Loaded l = LevelAnalysisTest.load(text);
        LevelAnalysis a = LevelAnalysis.of(l.machine(), l.where().margins());
        LoadDrive d = a.drives().get(0);
        assertThat(d.follower()).isTrue();
        // a follower's cathode stays below its grid (48 V here): less than 48 V / 1 k = 48 mA in the coil,
        // and the grid-to-cathode voltage the current needs takes some volts more (Koren's law)
        assertThat(d.onAmps()).isLessThan(48e-3).isGreaterThan(30e-3);
        assertThat(d.onWorstAmps()).isLessThan(d.onAmps());
        assertThat(ElectricalCheck.findings(l.machine(), a)).singleElement().satisfies(x -> {
            assertThat(x.error()).isTrue();
            assertThat(x.kind()).isEqualTo("coil");
            assertThat(x.message()).contains("relay coil of 'pulled' (follower_relay)", "of its pick-up current of 45.00 mA",
                    "V across it against 45.00 V to pick up");
            assertThat(x.fix()).contains("a cathode follower gives its load at most the grid's swing");
        });
    }

    @Test
    void aStageWithNeitherACircuitNorDrawLinesIsAWarningAtItsFirstUse() {
        String text = """
                rail bplus { voltage 48 V }
                rail heat { voltage 6.3 V }
                tube TQ1 { kind triode; sections 1; heater 6.3 V 300 mA }
                heaters on heat { parallel TQ1 at 6.3 V }
                stage t_inv : not { tube TQ1; circuit none; sections 1; load 20 k from bplus; ron 2 k; gain 9 }
                realize { not t_inv }
                module top { in a
                  out y, z
                  y = !a
                  z = !y }
                machine r { top top; inputs a; outputs y z }
                """;
        assertThat(findings(text)).singleElement().satisfies(x -> {
            assertThat(x.error()).isFalse();
            assertThat(x.kind()).isEqualTo("draws");
            assertThat(x.message()).contains("stage t_inv has neither a circuit nor draw lines", "drawing nothing");
            assertThat(x.use()).isNotNull();
        });
        // the same stage with its currents declared says nothing
        assertThat(findings(text.replace("gain 9 }", "gain 9; draw low bplus 1 mA; draw high bplus 0.1 mA }"))).isEmpty();
    }
}
