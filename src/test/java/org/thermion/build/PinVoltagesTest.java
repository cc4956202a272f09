package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.faults.Step;
import org.thermion.model.Machine;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The voltage chart against Ohm's law, a heater data sheet and Koren's published triode equation. */
class PinVoltagesTest {
    /** Three inverters on 12AU7 sections (two envelopes), heaters two in series on 25.2 V; our own demo values. */
    static final String MACHINE = """
            rail heat { voltage 25.2 V }
            rail bplus { voltage 150 V }
            rail bias { voltage -24 V }
            heaters on heat { series 2 of 12AU7 }
            stage inv : not { tube 12AU7; sections 1; fanin 1; circuit parallel; load 47 k from bplus; grid divider 100 k 100 k to bias; cathode ground }
            realize { not inv }
            module top {
              in a, b, c
              out x, y, z
              x = !a
              y = !b
              z = !c
            }
            machine probe { top top; inputs a, b, c; outputs x, y, z }
            """;

    private final Machine m = BuildMachines.text(MACHINE);
    private final BuildDocuments docs = BuildDocuments.of(m);
    private final PinVoltages chart = new PinVoltages(docs);

    private double at(PinVoltages.Chart c, String socket, int pin) {
        Wiring.Socket s = docs.wiring().sockets().stream().filter(x -> x.ref().equals(socket)).findFirst().orElseThrow();
        return c.volts(s.node(pin));
    }

    /**
     * Plate current of one 12AU7 section by Koren's 1996 equation written out here, with the library's 12AU7
     * parameters (fitted to a measured ECC82 table, TubeLibraryTest).
     */
    private double koren(double vp, double vg) {
        org.thermion.circuit.KorenTriode t = (org.thermion.circuit.KorenTriode)
                org.thermion.circuit.TubeLibrary.of(m.tubes()).require("12AU7");
        double e1 = vp / t.kp() * Math.log1p(Math.exp(t.kp() * (1 / t.mu() + vg / Math.sqrt(t.kvb() + vp * vp))));
        return Math.pow(e1, t.ex()) / t.kg1() * 2;
    }

    @Test
    void atRestAGridSitsAtItsDividerAndThePlateCarriesOnlyKorensTailCurrent() {
        PinVoltages.Chart rest = chart.at(ChartStates.atRest(m, null));
        // switch off: 0 V into 100 k / 100 k to -24 V gives -12 V by Ohm's law (no grid current below the cathode)
        assertThat(at(rest, "XV1", 7)).isCloseTo(-12.0, within(0.01));
        assertThat(at(rest, "XV1", 8)).isEqualTo(0.0);
        // beyond cut-off (about -Vp/mu = -7 V) Koren's law keeps a small tail: the 47 k load drops it
        double vp = at(rest, "XV1", 6);
        assertThat((150 - vp) / 47e3).isCloseTo(koren(vp, -12.0), within(koren(vp, -12.0) * 0.001));
        assertThat(vp).isBetween(140.0, 150.0);
        assertThat(rest.warnings()).isEmpty();
    }

    @Test
    void heaterPinsStepDownTheStringByTwelvePointSixVolts() {
        // 12AU7 heater: 12.6 V across pins 4-5 (hb9aik.ch/notes/serparfil.htm, tubeofile.com/tubes/12BH7,
        // REFERENCES.md): two in series on 25.2 V, the first from the rail, the second to ground.
        PinVoltages.Chart rest = chart.at(ChartStates.atRest(m, null));
        assertThat(at(rest, "XV1", 4)).isCloseTo(25.2, within(1e-9));
        assertThat(at(rest, "XV1", 5)).isCloseTo(12.6, within(0.01));
        assertThat(at(rest, "XV2", 4)).isCloseTo(12.6, within(0.01));
        assertThat(at(rest, "XV2", 5)).isEqualTo(0.0);
    }

    @Test
    void aConductingSectionsPlateSatisfiesKorensEquationThroughItsLoad() {
        List<PinVoltages.State> states = ChartStates.afterSteps(m, null, List.of(new Step(new boolean[] {true, false, false}, 1)));
        PinVoltages.Chart on = chart.at(states.get(0));
        double vp = at(on, "XV1", 6);
        double vg = at(on, "XV1", 7);
        // the grid is driven from 150 V through 100 k: it draws grid current and stands a little above the cathode
        assertThat(vg).isBetween(0.0, 2.0);
        double ip = koren(vp, vg);
        assertThat((150 - vp) / 47e3).isCloseTo(ip, within(ip * 0.001));
        assertThat(vp).isLessThan(100);
        // the other two sections stay as at rest
        assertThat(at(on, "XV1", 1)).isEqualTo(at(chart.at(ChartStates.atRest(m, null)), "XV1", 1));
    }

    /** A cross-coupled 12AU7 flip-flop loaded from a switch; our own demo values. */
    static final String FLIP_FLOP = """
            rail heat { voltage 12.6 V }
            rail bplus { voltage 150 V }
            rail bias { voltage -100 V }
            heaters on heat { parallel 12AU7 at 12.6 V }
            stage ff : latch { tube 12AU7; sections 2; fanin 1; circuit crossed; load 22 k from bplus; grid divider 100 k 100 k to bias; cathode ground }
            realize { latch ff }
            module top {
              in a
              out y
              latch q on phase 1 = a
              y = !q
            }
            machine probe { clock { phases 1; period 100 us }; top top; inputs a; outputs y }
            """;

    @Test
    void aFlipFlopsPlatesSwapWithItsStoredBitAndTheCutOffGridSitsOnItsDivider() {
        Machine ff = BuildMachines.text(FLIP_FLOP);
        BuildDocuments d = BuildDocuments.of(ff);
        PinVoltages chart = new PinVoltages(d);
        Wiring.Socket s = d.wiring().sockets().get(0);
        PinVoltages.Chart rest = chart.at(ChartStates.atRest(ff, null));
        PinVoltages.Chart set = chart.at(ChartStates.afterSteps(ff, null, List.of(new Step(new boolean[] {true}, 1))).get(0));
        // 12AU7 noval pins (REFERENCES.md): 6 plate.1 (Q), 7 grid.1, 1 plate.2, 2 grid.2
        double qRest = rest.volts(s.node(6));
        double qbRest = rest.volts(s.node(1));
        assertThat(qRest).as("Q cleared: its section conducts").isLessThan(qbRest - 50);
        assertThat(set.volts(s.node(6))).isCloseTo(qbRest, within(1e-6));
        assertThat(set.volts(s.node(1))).isCloseTo(qRest, within(1e-6));
        // the cut-off side's grid draws no current: 100 k / 100 k between the other plate and -100 V (Ohm's law)
        assertThat(rest.volts(s.node(2))).isCloseTo((qRest - 100) / 2, within(0.01));
        // the conducting side's grid is held near its cathode by grid current, though its divider alone gives (qb - 100) / 2
        assertThat(rest.volts(s.node(7))).isBetween(0.0, 2.0).isLessThan((qbRest - 100) / 2);
        assertThat(rest.warnings()).isEmpty();
        assertThat(set.warnings()).isEmpty();
    }

    @Test
    void onRandomMachinesEveryWiredNodeStandsBetweenTheRailsOrSaysWhyNot() {
        for (long seed = 1; seed <= 12; seed++) {
            String text = org.thermion.faults.RandomMachines.text(seed);
            Machine r = BuildMachines.text(text);
            BuildDocuments d = BuildDocuments.of(r);
            double lowest = r.rails().stream().mapToDouble(org.thermion.model.Rail::volts).min().orElse(0);
            double highest = r.rails().stream().mapToDouble(org.thermion.model.Rail::volts).max().orElse(0);
            List<PinVoltages.State> states = new java.util.ArrayList<>(List.of(ChartStates.atRest(r, null)));
            states.addAll(ChartStates.afterSteps(r, null, Step.random(new java.util.Random(seed), r.inputs().size(), 3, 2)));
            for (PinVoltages.State state : states) {
                PinVoltages.Chart c = new PinVoltages(d).at(state);
                for (int n = 0; n < d.wiring().nodes().size(); n++) {
                    double v = c.volts(n);
                    String what = "seed " + seed + ", " + state.name() + ", node " + d.wiring().nodes().get(n).name();
                    if (Double.isNaN(v)) {
                        assertThat(c.note(n)).as(what).isNotBlank();
                    } else {
                        // a passive circuit between the rails cannot leave them (ground included)
                        assertThat(v).as(what).isBetween(Math.min(0, lowest) - 1e-6, Math.max(0, highest) + 1e-6);
                    }
                }
            }
        }
    }
}
