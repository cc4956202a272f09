package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.faults.RandomMachines;
import org.thermion.model.Latch;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every part of a stage's circuit is in the wire list with its designator and both leads; a
 * flip-flop's steering divider (the load its data input is modelled with) included.
 */
class StageWiringTest {

    @Test
    void aFlipFlopsDataFeedsItsSteeringDividerNotABareTerminal() {
        Machine m = BuildMachines.file(BuildMachines.DECODER);
        Wiring w = BuildDocuments.of(m).wiring();
        Map<String, List<String>> leadsOf = leads(w);
        int checked = 0;
        for (Latch l : m.netlist().latches()) {
            if (l.stage() < 0) {
                continue;
            }
            String name = m.netlist().netName(l.output());
            Part series = part(w, "steering series D of " + name);
            Part toBias = part(w, "steering to bias D of " + name);
            // the library's triode_flipflop: grid divider 1 M 1.2 M to bias, the same for the data input
            assertThat(series.ohms()).isEqualTo(1e6);
            assertThat(toBias.ohms()).isEqualTo(1.2e6);
            assertThat(series.owner()).isEqualTo(StageKey.latch(m.netlist(), l.id()));
            String data = m.netlist().netName(l.data());
            assertThat(leadsOf.get(series.ref())).containsExactly(data, name + "/tapD");
            assertThat(leadsOf.get(toBias.ref())).containsExactly(name + "/tapD", "bias");
            Part tb = part(w, "steering of " + name);
            assertThat(nodeOf(w, tb.ref(), "steering tap")).isEqualTo(name + "/tapD");
            assertThat(nodeOf(w, tb.ref(), "data")).isNull();
            checked++;
        }
        assertThat(checked).isEqualTo(3);
    }

    @Test
    void everyPassivePartOfEveryStageCircuitIsInTheWireListOnceWithBothLeads() {
        for (java.nio.file.Path p : BuildMachines.EXAMPLES) {
            Machine m = BuildMachines.file(p);
            BuildDocuments docs = BuildDocuments.of(m);
            org.thermion.circuit.MachineCircuits circuits = docs.circuits();
            Map<String, List<String>> leadsOf = leads(docs.wiring());
            Map<Integer, Integer> wired = new HashMap<>();
            for (Part part : docs.wiring().parts()) {
                boolean passive = Set.of(PartClass.RESISTOR, PartClass.RELAY, PartClass.LAMP).contains(part.cls());
                if (passive && part.owner() >= 0 && !part.role().startsWith("steering ")) {
                    // a soft start's bypass relay has its contacts besides its coil
                    assertThat(leadsOf.get(part.ref())).as(part.role())
                            .hasSize(part.role().startsWith("bypass of soft start") ? 4 : 2);
                    wired.merge(part.owner(), 1, Integer::sum);
                }
            }
            int stages = 0;
            for (org.thermion.model.Gate g : m.netlist().gates()) {
                if (g.stage() >= 0) {
                    stages += assertSameCount(circuits, m.stages().get(g.stage()), g.arity(), wired.getOrDefault(g.id(), 0));
                }
            }
            for (Latch l : m.netlist().latches()) {
                if (l.stage() >= 0) {
                    stages += assertSameCount(circuits, m.stages().get(l.stage()), 0,
                            wired.getOrDefault(StageKey.latch(m.netlist(), l.id()), 0));
                }
            }
            assertThat(stages).as(p.toString()).isGreaterThan(10);
            for (int i = 0; i < m.softStarts().size(); i++) {
                var driver = circuits.softStartDriver(m.softStarts().get(i));
                int key = StageKey.softStart(m, i);
                if (driver.isPresent()) {
                    // the thyratron stage's circuit, its coil the bypass relay's, and the soft start's power resistor
                    assertThat(wired.get(key) - 1).as(p + " soft start " + i)
                            .isEqualTo(passiveParts(circuits, driver.get(), 1));
                } else {
                    assertThat(wired.get(key)).as(p + " soft start " + i).isEqualTo(2);
                }
            }
        }
    }

    /** The circuit's resistors, coils and lamps (its own, not the driving sources') against the parts wired for it. */
    private static int assertSameCount(org.thermion.circuit.MachineCircuits circuits, org.thermion.model.StageType st,
                                       int inputs, int wiredParts) {
        java.util.Optional<org.thermion.circuit.StageCircuit> c = circuits.circuit(st);
        if (c.isEmpty()) {
            return 0;
        }
        assertThat(wiredParts).as(st.name()).isEqualTo(passiveParts(circuits, c.get(), inputs));
        return 1;
    }

    /** The resistors, coils and lamps of circuit {@code c} solved with {@code inputs} inputs at 0 V. */
    private static int passiveParts(org.thermion.circuit.MachineCircuits circuits, org.thermion.circuit.StageCircuit c,
                                    int inputs) {
        org.thermion.circuit.DcResult r = circuits.solver().solve(c, new double[Math.max(inputs, c.inputs())],
                false, List.of(), org.thermion.circuit.Corner.NOMINAL);
        assertThat(r).as(c.name()).isInstanceOf(org.thermion.circuit.OperatingPoint.class);
        return (int) ((org.thermion.circuit.OperatingPoint) r).parts().stream().map(org.thermion.circuit.PartCurrent::label)
                .map(s -> s.startsWith(org.thermion.circuit.StageSolver.DRIVER + ".")
                        ? s.substring(org.thermion.circuit.StageSolver.DRIVER.length() + 1) : s)
                .filter(s -> !s.startsWith("diode") && !s.equals("tube")).count();
    }

    @Test
    void aFollowersCathodeCoilIsARelayOnTheWireListNotAResistor() {
        Machine m = BuildMachines.text("""
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail heat { voltage 12.6 V; source 0.01 ohm; limit 10 A }
                heaters on heat { parallel 12AU7 at 12.6 V }
                stage follower_relay : relay {
                  tube 12AU7
                  sections 2
                  load direct from bplus
                  cathode coil 1 k pickup 30 mA to ground
                  output cathode
                }
                module top {
                  in a
                  out pulled
                  pulled = follower_relay(a)
                }
                machine coil {
                  clock { phases 1; period 100 us }
                  top top
                  inputs a
                  outputs pulled
                }
                """);
        Wiring w = BuildDocuments.of(m).wiring();
        Part coil = part(w, "relay in the cathode of pulled");
        assertThat(coil.cls()).isEqualTo(PartClass.RELAY);
        assertThat(coil.ohms()).isEqualTo(1e3);
        assertThat(leads(w).get(coil.ref())).hasSize(2).contains("ground");
        assertThat(w.parts()).noneMatch(p -> p.cls() == PartClass.RESISTOR && p.role().startsWith("cathode resistor"));
    }

    @Test
    void aBuiltBlocksTubesAreWiredFromTheirStagesNotOnlyTheirHeaters() {
        // the pump station's program counter, ROM decoding and clock are stated with `uses` lines
        for (java.nio.file.Path p : new java.nio.file.Path[] {BuildMachines.DECODER, BuildMachines.PUMPSTATION}) {
            Machine m = BuildMachines.file(p);
            Wiring w = BuildDocuments.of(m).wiring();
            assertThat(WireChecks.run(m, w)).as(p.toString()).isEmpty();
            assertThat(w.problems()).as(p.toString()).noneMatch(s -> s.contains("left open"));
            int instances = 0;
            for (org.thermion.model.BuiltBlock b : m.built()) {
                for (org.thermion.model.BuiltBlock.Instances u : b.stages()) {
                    instances += b.counted() ? u.count() : 0;
                }
            }
            long placed = w.placements().stream().filter(pl -> pl.stage().contains(": ")).count();
            assertThat(placed).as(p.toString()).isEqualTo(instances).isPositive();
            Map<String, List<String>> leadsOf = leads(w);
            // the clock's free-running pair: both plate loads and both cross-coupling dividers, both leads each
            for (String role : List.of("plate load A", "plate load B", "grid series A", "grid to bias A", "grid series B",
                    "grid to bias B")) {
                Part r = part(w, role + " of clock generator: triode_flipflop 1");
                assertThat(leadsOf.get(r.ref())).as(role).hasSize(2);
            }
            assertThat(w.placements()).filteredOn(pl -> pl.stage().equals("clock generator: triode_flipflop 1"))
                    .singleElement().satisfies(pl -> assertThat(pl.sections()).hasSize(2));
        }
    }

    @Test
    void everyTwoLeadPartHasBothLeadsOnTheExamplesAndRandomMachines() {
        List<Machine> machines = new ArrayList<>();
        for (java.nio.file.Path p : BuildMachines.EXAMPLES) {
            machines.add(BuildMachines.file(p));
        }
        for (long seed = 1; seed <= 10; seed++) {
            machines.add(BuildMachines.text(WireListTest.withSoftStart(RandomMachines.text(seed), seed)));
        }
        Set<PartClass> twoLead = Set.of(PartClass.RESISTOR, PartClass.RELAY, PartClass.LAMP);
        for (Machine m : machines) {
            Wiring w = BuildDocuments.of(m).wiring();
            Map<String, List<String>> leadsOf = leads(w);
            for (Part p : w.parts()) {
                if (twoLead.contains(p.cls()) && p.owner() >= 0) {
                    assertThat(p.ref()).as(p.role()).matches("(A\\d+)?(R|K|DS)\\d+");
                    // a soft start's bypass relay: its coil and its contacts
                    int leads = p.role().startsWith("bypass of soft start") ? 4 : 2;
                    assertThat(leadsOf.get(p.ref())).as(p.ref() + " " + p.role()).hasSize(leads);
                }
            }
        }
    }

    private static Part part(Wiring w, String role) {
        return w.parts().stream().filter(p -> p.role().equals(role)).findFirst()
                .orElseThrow(() -> new AssertionError("no part " + role));
    }

    /** Part designator -> the names of the nodes its leads are on, lead 1 first. */
    private static Map<String, List<String>> leads(Wiring w) {
        Map<String, Map<String, String>> byPin = new HashMap<>();
        for (Node n : w.nodes()) {
            for (Lead l : n.leads()) {
                byPin.computeIfAbsent(l.ref(), k -> new java.util.TreeMap<>()).put(l.pin(), n.name());
            }
        }
        Map<String, List<String>> out = new HashMap<>();
        byPin.forEach((ref, pins) -> out.put(ref, List.copyOf(pins.values())));
        return out;
    }

    private static String nodeOf(Wiring w, String ref, String pin) {
        for (Node n : w.nodes()) {
            for (Lead l : n.leads()) {
                if (l.ref().equals(ref) && l.pin().equals(pin)) {
                    return n.name();
                }
            }
        }
        return null;
    }
}
