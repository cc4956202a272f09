package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.circuit.MachineCircuits;
import org.thermion.faults.RandomMachines;
import org.thermion.model.Machine;

import java.nio.file.Path;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The wire list against the netlist it was made from: read back, it gives every stage the nets
 * the netlist gives it and every soft start the rails its description gives it (round trip), and
 * it passes its own pin checks; on the examples and on random machines, some with a soft start.
 */
class WireListTest {

    @Test
    void examplesRoundTrip() {
        for (Path p : BuildMachines.EXAMPLES) {
            assertRoundTrip(BuildMachines.file(p), p.toString());
        }
    }

    @Test
    void randomMachinesRoundTrip() {
        for (long seed = 1; seed <= 20; seed++) {
            String text = withSoftStart(RandomMachines.text(seed), seed);
            assertRoundTrip(BuildMachines.text(text), "random seed " + seed + ":\n" + text);
        }
    }

    @Test
    void everyExampleWithASoftStartHasItsPartsWired() {
        int thyratrons = 0;
        for (Path p : BuildMachines.EXAMPLES) {
            Machine m = BuildMachines.file(p);
            Wiring w = BuildDocuments.of(m).wiring();
            for (int i = 0; i < m.softStarts().size(); i++) {
                int key = StageKey.softStart(m, i);
                long leads = w.nodes().stream().flatMap(n -> n.leads().stream())
                        .filter(l -> w.parts().stream().anyMatch(pt -> pt.owner() == key && pt.ref().equals(l.ref()))).count();
                // resistor 2 + relay coil 2 and contacts 2, and a thyratron's plate resistor 2 and grid divider 4
                boolean thyratron = m.softStarts().get(i).trigger() instanceof org.thermion.model.BypassTrigger.ThyratronWarm;
                thyratrons += thyratron ? 1 : 0;
                assertThat(leads).as(p + " soft start " + i).isEqualTo(thyratron ? 12 : 8);
            }
        }
        assertThat(thyratrons).as("the pump station's thyratron soft start").isEqualTo(1);
    }

    /**
     * Appends a soft start to a random machine: none, a delay bypass or a thyratron bypass (with
     * the relay rail and the thyratron's heater it needs), its values drawn from {@code seed}.
     */
    static String withSoftStart(String text, long seed) {
        Random r = new Random(seed * 7919);
        int kind = (int) (seed % 3);
        if (kind == 0) {
            return text;
        }
        String ohms = String.valueOf(0.1 + r.nextInt(10) / 10.0);
        if (kind == 1) {
            return text + "softstart soft" + seed + " on heat { resistor " + ohms + " ohm rated 50 W; bypass after "
                    + (1 + r.nextInt(9)) + " s }\n";
        }
        int coil = 100 + 20 * r.nextInt(5);
        return text + "rail relay { voltage 24 V; source 1 ohm; limit 1 A }\n"
                + "heaters on relay { series 1 of 2D21 drop 29.5 ohm }\n"
                + "softstart soft" + seed + " on heat {\n  resistor " + ohms + " ohm rated 200 W\n"
                + "  relay { coil " + coil + " ohm; rated 12 V }\n  bypass when thyratron_relay warm\n}\n";
    }

    private static void assertRoundTrip(Machine m, String what) {
        BuildDocuments docs = BuildDocuments.of(m);
        assertThat(Rebuild.fromWiring(m, docs.wiring())).as(what).isEqualTo(Rebuild.expected(m));
        assertThat(Rebuild.softStartsFromWiring(m, docs.wiring())).as(what)
                .isEqualTo(Rebuild.softStartsExpected(m, MachineCircuits.of(m)));
        assertThat(WireChecks.run(m, docs.wiring())).as(what).isEmpty();
    }
}
