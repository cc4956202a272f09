package org.thermion.power;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Heater ratings from the parts library: 6AU6 6.3 V 0.3 A (hb9aik.ch/notes/serparfil.htm),
 * 6J6 6.3 V 0.45 A (from memory). Expected values computed by hand from those ratings.
 */
class HeaterAnalysisTest {
    /** The demo's heater rules with its single soft-start thyratron. */
    static final String LONE_THYRATRON = """
            rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
            rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
            rail heat  { voltage 12.6 V; source 0.02 ohm; limit 40 A }
            rail relay { voltage 24 V; source 1 ohm; limit 500 mA }
            heaters on heat {
              series 2 of 6AU6 across machine
              series 2 of 2D21 across machine
            }
            softstart heater_soft on heat {
              resistor 0.4 ohm rated 100 W
              relay { coil 160 ohm; rated 12 V; pickup 8 V; dropout 1.2 V; operate 10 ms }
              bypass when thyratron_relay warm
            }
            realize {
              not pentode_inverter
            }
            module top {
              in a
              out y
              net n
              n = !a
              y = !n
            }
            machine lone {
              clock { phases 2; period 100 us }
              top top
              inputs a
              outputs y
            }
            """;

    /** {@code n} 6AU6 inverters in a chain, heaters strung {@code perString} in series on a rail of {@code volts}. */
    static String inverters(int n, int perString, String volts, String extra) {
        return """
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage %s; source 0.01 ohm; limit 10 A }
                heaters on heat {
                  series %d of 6AU6 across machine %s
                }
                realize {
                  not pentode_inverter
                }
                module top {
                  in a
                  out y
                  net x[%d]
                  x[0] = a
                  for k in 0..%d {
                    x[k + 1] = !x[k]
                  }
                  y = x[%d]
                }
                machine chain {
                  clock { phases 2; period 100 us }
                  top top
                  inputs a
                  outputs y
                }
                """.formatted(volts, perString, extra, n + 1, n - 1, n);
    }

    static String mixed(String extra) {
        return """
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage 12.6 V; source 0.01 ohm; limit 10 A }
                stage j6_nor : nor {
                  tube 6J6
                  sections 2
                  fanin 2
                  load 15 k from bplus
                  draw low bplus 2.8 mA
                  draw high bplus 0.0 mA
                  ron 2.1 k
                  gain 8
                }
                heaters on heat {
                  series 2 of 6AU6 6J6 across machine %s
                }
                realize {
                  not pentode_inverter
                  nor j6_nor
                }
                module top {
                  in a, b
                  out y
                  y = !(!a | b)
                }
                machine mixed {
                  clock { phases 2; period 100 us }
                  top top
                  inputs a b
                  outputs y
                }
                """.formatted(extra);
    }

    @Test
    void fourSixVoltHeatersOnTwentyFourVoltsGetSixVoltsEach() {
        // 24 V / 4 = 6.0 V; 6.0 / 6.3 - 1 = -4.76 %, inside the +-10 % band
        HeaterAnalysis h = new HeaterAnalysis(PowerMachines.of(inverters(4, 4, "24 V", "")));
        assertThat(h.strings()).hasSize(1);
        HeaterAnalysis.StringResult s = h.strings().get(0);
        assertThat(s.heaters()).hasSize(4).allSatisfy(x -> {
            assertThat(x.volts()).isCloseTo(6.0, within(1e-9));
            assertThat(x.deviation()).isCloseTo(-0.0476, within(1e-4));
        });
        // 24 V across 4 x 21 ohm = 0.2857 A
        assertThat(s.amps()).isCloseTo(24.0 / 84.0, within(1e-9));
        assertThat(s.suggestion()).isNull();
        assertThat(s.findings()).isEmpty();
    }

    @Test
    void threeSixVoltHeatersOnTwentyFourVoltsNeedSeventeenOhms() {
        // (24 - 3 x 6.3) / 0.3 = 17 ohm; (24 - 18.9) x 0.3 = 1.53 W
        HeaterAnalysis h = new HeaterAnalysis(PowerMachines.of(inverters(3, 3, "24 V", "")));
        HeaterAnalysis.StringResult s = h.strings().get(0);
        assertThat(s.heaters()).allSatisfy(x -> assertThat(x.volts()).isCloseTo(8.0, within(1e-9)));
        assertThat(s.suggestion().ohms()).isCloseTo(17.0, within(1e-9));
        assertThat(s.suggestion().watts()).isCloseTo(1.53, within(1e-9));
        assertThat(s.findings()).hasSize(3).allSatisfy(f -> {
            assertThat(f.severity()).isEqualTo(Finding.Severity.ERROR);
            assertThat(f.advice()).contains("17.0 ohm").contains("1.53 W");
        });
    }

    @Test
    void theSuggestedDropperBringsTheStringToItsRating() {
        HeaterAnalysis h = new HeaterAnalysis(PowerMachines.of(inverters(3, 3, "24 V", "drop 17 ohm")));
        HeaterAnalysis.StringResult s = h.strings().get(0);
        assertThat(s.amps()).isCloseTo(0.3, within(1e-9));
        assertThat(s.heaters()).allSatisfy(x -> assertThat(x.volts()).isCloseTo(6.3, within(1e-9)));
        assertThat(s.dropWatts()).isCloseTo(1.53, within(1e-9));
        assertThat(s.findings()).isEmpty();
    }

    @Test
    void aLongStringIsUnderRunAndWarned() {
        // five on 24 V: 4.8 V each, -23.8 %
        HeaterAnalysis h = new HeaterAnalysis(PowerMachines.of(inverters(5, 5, "24 V", "")));
        HeaterAnalysis.StringResult s = h.strings().get(0);
        assertThat(s.heaters().get(0).volts()).isCloseTo(4.8, within(1e-9));
        assertThat(s.findings()).hasSize(5).allSatisfy(f -> assertThat(f.severity()).isEqualTo(Finding.Severity.WARNING));
        assertThat(s.suggestion()).isNull();
    }

    @Test
    void aPointThreeAmpHeaterInAPointFourFiveAmpStringNeedsFortyTwoOhms() {
        // 6.3 V / (0.45 - 0.3) A = 42 ohm; with it the 6AU6 looks like 14 ohm, as the 6J6
        Machine m = PowerMachines.of(mixed("shunt"));
        HeaterAnalysis.StringResult s = new HeaterAnalysis(m).strings().get(0);
        assertThat(s.mixed()).isTrue();
        assertThat(s.amps()).isCloseTo(0.45, within(1e-9));
        HeaterAnalysis.Heater au6 = s.heaters().stream().filter(x -> x.rating().amps() == 0.3).findFirst().orElseThrow();
        HeaterAnalysis.Heater j6 = s.heaters().stream().filter(x -> x.rating().amps() == 0.45).findFirst().orElseThrow();
        assertThat(au6.shuntOhms()).isCloseTo(42.0, within(1e-9));
        // the shunt carries 0.15 A at 6.3 V: 0.945 W
        assertThat(au6.shuntWatts()).isCloseTo(0.945, within(1e-9));
        assertThat(au6.volts()).isCloseTo(6.3, within(1e-9));
        assertThat(au6.amps()).isCloseTo(0.3, within(1e-9));
        assertThat(j6.shunted()).isFalse();
        assertThat(s.findings()).singleElement().satisfies(f -> {
            assertThat(f.severity()).isEqualTo(Finding.Severity.NOTE);
            assertThat(f.advice()).contains("42.0 ohm");
        });
    }

    @Test
    void mixedCurrentsWithoutShuntAreAnErrorAndTheSmallHeaterIsOverdriven() {
        // 12.6 V across 21 + 14 ohm = 0.36 A: the 6AU6 gets 7.56 V (+20 %), the 6J6 5.04 V (-20 %)
        HeaterAnalysis.StringResult s = new HeaterAnalysis(PowerMachines.of(mixed(""))).strings().get(0);
        assertThat(s.amps()).isCloseTo(0.36, within(1e-9));
        assertThat(s.heaters().stream().mapToDouble(HeaterAnalysis.Heater::volts).max().orElseThrow())
                .isCloseTo(7.56, within(1e-9));
        assertThat(s.ok()).isFalse();
        assertThat(s.findings().get(0).message()).contains("mixes heater currents");
        assertThat(s.findings().get(0).advice()).contains("42.0 ohm across it");
    }

    @Test
    void ninetyTwoTubesInStringsOfFourDrawSixPointNineAmps() {
        // 92 / 4 = 23 strings, each 0.3 A at rated voltage (4 x 6.3 = 25.2 V): 23 x 0.3 = 6.9 A
        Machine m = PowerMachines.of(inverters(92, 4, "25.2 V", ""));
        HeaterAnalysis h = new HeaterAnalysis(m);
        int heat = m.railIndex("heat");
        assertThat(h.strings()).hasSize(23);
        assertThat(h.railAmps(heat)).isCloseTo(6.9, within(1e-9));
        assertThat(h.railWatts(heat)).isCloseTo(6.9 * 25.2, within(1e-9));
        assertThat(h.moduleAmps(0, heat)).isCloseTo(6.9, within(1e-9));
        assertThat(h.findings()).isEmpty();
    }

    @Test
    void aStringAcrossModulesChargesEachModuleItsShare() {
        // two 6AU6 in series on 12.6 V: 0.3 A through both; each module carries half the rail current
        Machine m = PowerMachines.of("""
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage 12.6 V; source 0.01 ohm; limit 10 A }
                heaters on heat {
                  series 2 of 6AU6 across machine
                }
                realize {
                  not pentode_inverter
                }
                module inv {
                  in a
                  out y
                  y = !a
                }
                module top {
                  in a
                  out y
                  net m
                  m = !a
                  use inv as sub (a: m, y: y)
                }
                machine two {
                  clock { phases 2; period 100 us }
                  top top
                  inputs a
                  outputs y
                }
                """);
        HeaterAnalysis h = new HeaterAnalysis(m);
        int heat = m.railIndex("heat");
        assertThat(h.strings()).hasSize(1);
        assertThat(h.railAmps(heat)).isCloseTo(0.3, within(1e-9));
        assertThat(m.modules()).hasSize(2);
        assertThat(h.moduleAmps(0, heat)).isCloseTo(0.15, within(1e-9));
        assertThat(h.moduleAmps(1, heat)).isCloseTo(0.15, within(1e-9));
        assertThat(h.moduleWatts(0) + h.moduleWatts(1)).isCloseTo(0.3 * 12.6, within(1e-9));
        assertThat(h.moduleStrings(0)).isEqualTo(1);
        assertThat(h.moduleStrings(1)).isEqualTo(1);
    }

    @Test
    void aLoneThyratronOnTheTwelveVoltRailIsFlagged() {
        // the demo's heater rules: 2D21 heaters (6.3 V 0.6 A, vacuumtubes.io 2D21W page) strung in pairs on
        // 12.6 V, but the machine has one 2D21 (its soft-start thyratron), which then gets 12.6 V (+100 %);
        // dropper (12.6 - 6.3) / 0.6 = 10.5 ohm, (12.6 - 6.3) x 0.6 = 3.78 W
        Machine m = PowerMachines.of(LONE_THYRATRON);
        HeaterAnalysis h = new HeaterAnalysis(m);
        HeaterAnalysis.StringResult lone = h.strings().stream()
                .filter(s -> m.tubes().get(s.heaters().get(0).tube()).name().equals("2D21"))
                .findFirst().orElseThrow();
        assertThat(lone.heaters()).hasSize(1);
        assertThat(lone.heaters().get(0).volts()).isCloseTo(12.6, within(1e-9));
        assertThat(lone.heaters().get(0).deviation()).isCloseTo(1.0, within(1e-9));
        assertThat(lone.suggestion().ohms()).isCloseTo(10.5, within(1e-9));
        assertThat(lone.suggestion().watts()).isCloseTo(3.78, within(1e-9));
        assertThat(lone.findings()).singleElement().satisfies(f -> {
            assertThat(f.isError()).isTrue();
            assertThat(f.advice()).contains("only 1 heater was left").contains("10.5 ohm");
        });
        // the soft-start module carries the 2D21's heater: 1.2 A at 12.6 V
        int soft = m.modules().stream().filter(x -> x.type().equals("softstart")).findFirst().orElseThrow().id();
        assertThat(h.moduleAmps(soft, m.railIndex("heat"))).isCloseTo(1.2, within(1e-9));
    }

    @Test
    void followingTheAdviceFixesTheLoneThyratron() {
        // `rest drop 10.5 ohm` gives the shorter last string its own dropper: 12.6 V / (10.5 + 10.5) ohm = 0.6 A
        Machine m = PowerMachines.of(LONE_THYRATRON.replace("series 2 of 2D21 across machine",
                "series 2 of 2D21 across machine rest drop 10.5 ohm"));
        HeaterAnalysis h = new HeaterAnalysis(m);
        HeaterAnalysis.StringResult lone = h.strings().stream()
                .filter(s -> m.tubes().get(s.heaters().get(0).tube()).name().equals("2D21")).findFirst().orElseThrow();
        assertThat(lone.amps()).isCloseTo(0.6, within(1e-9));
        assertThat(lone.heaters().get(0).volts()).isCloseTo(6.3, within(1e-9));
        assertThat(lone.dropWatts()).isCloseTo(3.78, within(1e-9));
        assertThat(h.findings()).isEmpty();
    }
}
