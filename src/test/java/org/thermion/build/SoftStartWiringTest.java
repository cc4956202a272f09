package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * A soft start on the wire list: its resistor in the rail, the bypass contacts across it, and the
 * relay coil in the plate of the thyratron the description names, every electrode on its pin.
 */
class SoftStartWiringTest {
    private static final Machine PUMP = BuildMachines.file(BuildMachines.PUMPSTATION);
    private static final BuildDocuments DOCS = BuildDocuments.of(PUMP);
    private static final String S = "soft start heater_soft";

    @Test
    void thePumpStationsResistorAndContactsSitBetweenTheSupplyAndWhatTheyCover() {
        Wiring w = DOCS.wiring();
        Part r = part(w, S);
        // examples/pumpstation: resistor 0.2 ohm rated 200 W; ordered as declared, not from a dissipation
        assertThat(r.ohms()).isEqualTo(0.2);
        assertThat(r.declaredWatts()).isEqualTo(200.0);
        assertThat(pins(w, r.ref())).containsExactly(entry("1", "heat"), entry("2", "heat behind heater_soft"));
        Part k = part(w, "bypass of " + S);
        assertThat(k.ohms()).isEqualTo(160.0);
        assertThat(pins(w, k.ref())).containsExactly(entry("1", S + "/feed"), entry("2", S + "/plate"),
                entry("C", "heat"), entry("NO", "heat behind heater_soft"));
        // no covers line: the supply feeds only the resistor and the contacts, every heater hangs behind them
        assertThat(w.nodes().get(nodeIndex(w, "heat")).leads()).extracting(Lead::label)
                .containsExactlyInAnyOrder(r.ref() + "-1", k.ref() + "-C");
        assertThat(w.nodes().get(nodeIndex(w, "heat behind heater_soft")).leads()).hasSizeGreaterThan(100);
    }

    @Test
    void theThyratronIsWiredAsItsRelayStageWithEveryElectrodeOnItsPin() {
        Wiring w = DOCS.wiring();
        // library thyratron_relay: series 53 ohm from the relay rail, grid divider 100 k 100 k to bias
        Part plate = part(w, "plate resistor of " + S);
        assertThat(plate.ohms()).isEqualTo(53.0);
        assertThat(pins(w, plate.ref())).containsExactly(entry("1", "relay"), entry("2", S + "/feed"));
        Part series = part(w, "grid series 0 of " + S);
        Part toBias = part(w, "grid to bias 0 of " + S);
        assertThat(series.ohms()).isEqualTo(100e3);
        assertThat(toBias.ohms()).isEqualTo(100e3);
        // the divider's input on the highest rail (bplus, 48 V): the grid stands above critical, so it fires once warm
        assertThat(pins(w, series.ref())).containsExactly(entry("1", "bplus"), entry("2", S + "/tap0"));
        assertThat(pins(w, toBias.ref())).containsExactly(entry("1", S + "/tap0"), entry("2", "bias"));
        // fired, the coil carries (24 V - 8 V arc drop) / (53 + 160) ohm = 75 mA (library 2D21 arcdrop, from
        // memory): 0.30 W in the plate resistor by Ohm's law
        double amps = (24 - 8.0) / (53 + 160);
        assertThat(plate.watts()).isCloseTo(amps * amps * 53, within(0.02));
        // r-type.org EN91 page (the library's first 2D21 basing): 1 grid, 2 cathode, 5 and 7 shield grid, 6 anode
        Wiring.Socket s = w.sockets().stream().filter(x -> x.tube().equals("2D21")).findFirst().orElseThrow();
        Map<Integer, String> expected = Map.of(1, S + "/tap0", 2, "ground", 5, "ground", 6, S + "/plate", 7, "ground");
        expected.forEach((pin, node) -> assertThat(w.nodes().get(s.node(pin)).name()).as("pin " + pin).isEqualTo(node));
        // the second source (vacuumtubes.io) disagrees on every pin but 4: each of these is flagged
        expected.keySet().forEach(pin -> assertThat(s.doubtful(pin)).as("pin " + pin).isTrue());
        assertThat(s.doubtful(4)).isFalse();
    }

    @Test
    void theChartShowsTheBypassClosedAndTheThyratronFired() {
        PinVoltages.Chart rest = new PinVoltages(DOCS).at(ChartStates.atRest(PUMP, null));
        Wiring w = DOCS.wiring();
        Wiring.Socket s = w.sockets().stream().filter(x -> x.tube().equals("2D21")).findFirst().orElseThrow();
        // grid: B+ through 100 k to the tap, 100 k to the bias rail: (V_B+ + V_bias) / 2 by Ohm's law, at the
        // rails as this state loads them (the model draws no grid current after firing, so this is the
        // divider's open value, not a meter's reading); at the declared 48 V and -24 V it would be +12 V
        double bplus = rest.rails().get("bplus");
        double bias = rest.rails().get("bias");
        assertThat(bplus).isBetween(46.0, 48.0);
        assertThat(bias).isBetween(-24.0, -22.0);
        assertThat(rest.volts(s.node(1))).isCloseTo((bplus + bias) / 2, within(0.05));
        // anode: the arc drop above the cathode (8 V, library) while it conducts
        assertThat(rest.volts(s.node(6))).isBetween(8.0, 9.0);
        // behind the closed bypass: the heat rail itself, 12.6 V less 0.02 ohm x about 35 A of heaters (0.7 V)
        int behind = nodeIndex(w, "heat behind heater_soft");
        assertThat(rest.volts(behind)).isEqualTo(rest.rails().get("heat")).isBetween(11.8, 12.0);
    }

    @Test
    void aDelayBypassPutsTheCoilOnTheTimersTerminalsAndOrdersTheDeclaredRating() {
        Machine m = BuildMachines.file(BuildMachines.DECODER);
        Wiring w = BuildDocuments.of(m).wiring();
        // examples/decoder-board: resistor 1 ohm rated 5 W, bypass after 4 s, the default relay (100 ohm)
        Part r = part(w, S);
        assertThat(pins(w, r.ref())).containsExactly(entry("1", "heat"), entry("2", "heat behind heater_soft"));
        Part k = part(w, "bypass of " + S);
        assertThat(pins(w, k.ref())).containsExactly(entry("1", S + "/coil 1"), entry("2", S + "/coil 2"),
                entry("C", "heat"), entry("NO", "heat behind heater_soft"));
        Part timer = part(w, "bypass timer of " + S);
        assertThat(pins(w, timer.ref())).containsExactly(entry("coil 1", S + "/coil 1"), entry("coil 2", S + "/coil 2"));
        PartsList list = PartsList.of(w, 0, 10, 0.5);
        assertThat(list.rows()).filteredOn(row -> row.ohms() == 1.0 && row.type().equals("power resistor"))
                .singleElement().satisfies(row -> assertThat(row.ratedWatts()).isEqualTo(5.0));
    }

    private static Map.Entry<String, String> entry(String pin, String node) {
        return Map.entry(pin, node);
    }

    private static Part part(Wiring w, String role) {
        return w.parts().stream().filter(p -> p.role().equals(role)).findFirst()
                .orElseThrow(() -> new AssertionError("no part " + role));
    }

    /** Pin -> node name of part {@code ref}'s leads, in pin order. */
    private static Map<String, String> pins(Wiring w, String ref) {
        Map<String, String> out = new TreeMap<>();
        for (Node n : w.nodes()) {
            for (Lead l : n.leads()) {
                if (l.ref().equals(ref)) {
                    out.put(l.pin(), n.name());
                }
            }
        }
        return out;
    }

    private static int nodeIndex(Wiring w, String name) {
        Map<String, Integer> at = new HashMap<>();
        List<Node> nodes = w.nodes();
        for (int i = 0; i < nodes.size(); i++) {
            at.put(nodes.get(i).name(), i);
        }
        return at.get(name);
    }
}
