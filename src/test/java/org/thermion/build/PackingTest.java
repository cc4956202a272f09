package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.model.Envelope;
import org.thermion.model.Machine;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Packing: three one-section cathode followers, two in the board p (modules p.c0, p.c1) and one
 * in the board q, on twin triodes. Per module they take three envelopes; shared per board two
 * (p's pair in one); per machine two (three sections need two twin triodes, no fewer).
 */
class PackingTest {
    private static final Path SHARING = Path.of("src/test/resources/org/thermion/build/sharing.machine");

    private static Machine with(String packing) throws IOException {
        return BuildMachines.text(Files.readString(SHARING) + packing);
    }

    @Test
    void perModuleByDefault() throws IOException {
        Machine m = with("");
        assertThat(m.envelopes()).hasSize(3);
        assertThat(m.envelopes()).allMatch(e -> e.sectionsUsed() == 1);
    }

    @Test
    void sharedPerBoardPairsTheBoardsSections() throws IOException {
        Machine m = with("packing { share per board 12AU7 }");
        assertThat(m.envelopes()).hasSize(2);
        assertThat(m.envelopes().stream().mapToInt(Envelope::sectionsUsed).sorted().toArray()).containsExactly(1, 2);
    }

    @Test
    void sharedPerMachineTakesTheFewestEnvelopes() throws IOException {
        Machine m = with("packing { share per machine 12AU7 }");
        int sections = m.envelopes().stream().mapToInt(Envelope::sectionsUsed).sum();
        assertThat(m.envelopes()).hasSize((sections + 1) / 2);
    }

    @Test
    void aNamedEnvelopeKeepsItsDesignatorAndItsStages() throws IOException {
        Machine m = with("packing { envelope V9 \"w\" }");
        Envelope v9 = m.envelopes().stream().filter(e -> e.designator().equals("V9")).findFirst().orElseThrow();
        assertThat(v9.pinned()).isTrue();
        assertThat(v9.slots()).hasSize(1);
        int gate = v9.slots().get(0).index();
        assertThat(m.netlist().netName(m.netlist().gates().get(gate).output())).isEqualTo("w");
        assertThat(m.envelopes()).extracting(Envelope::designator).doesNotHaveDuplicates();
        // The named envelope is not filled with other stages: its second section stays spare.
        assertThat(BuildDocuments.of(m).wiring().parts()).anyMatch(p -> p.ref().endsWith("V9"));
    }
}
