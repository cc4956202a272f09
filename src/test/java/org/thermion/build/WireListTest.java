package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.faults.RandomMachines;
import org.thermion.model.Machine;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The wire list against the netlist it was made from: read back, it gives every stage the nets
 * the netlist gives it (round trip), and it passes its own pin checks; on the examples and on
 * random machines.
 */
class WireListTest {

    @Test
    void examplesRoundTrip() {
        for (Path p : new Path[] {BuildMachines.DECODER, BuildMachines.PUMPSTATION}) {
            assertRoundTrip(BuildMachines.file(p), p.toString());
        }
    }

    @Test
    void randomMachinesRoundTrip() {
        for (long seed = 1; seed <= 20; seed++) {
            String text = RandomMachines.text(seed);
            assertRoundTrip(BuildMachines.text(text), "random seed " + seed + ":\n" + text);
        }
    }

    private static void assertRoundTrip(Machine m, String what) {
        BuildDocuments docs = BuildDocuments.of(m);
        assertThat(Rebuild.fromWiring(m, docs.wiring())).as(what).isEqualTo(Rebuild.expected(m));
        assertThat(WireChecks.run(m, docs.wiring())).as(what).isEmpty();
    }
}
