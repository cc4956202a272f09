package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Envelope;
import org.thermion.model.Machine;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/** The bundled examples check clean, and the small one has the counts a hand count gives. */
class ExamplesTest {

    static Machine load(Path file, Diagnostics diags) {
        return new Elaborator(new SourceSet(), diags).elaborate(file);
    }

    @Test
    void everyExampleElaboratesWithoutErrorsOrWarnings() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.walk(Path.of("examples"))) {
            files = s.filter(p -> p.toString().endsWith(".machine")).toList();
        }
        assertThat(files).isNotEmpty();
        for (Path f : files) {
            String text = Files.readString(f);
            if (!text.contains("machine ") || !text.matches("(?s).*\\nmachine \\w+ \\{.*")) {
                continue;
            }
            Diagnostics d = new Diagnostics();
            Machine m = load(f, d);
            assertThat(d.all()).as(f.toString()).isEmpty();
            assertThat(m).as(f.toString()).isNotNull();
        }
    }

    @Test
    void decoderBoardMatchesAHandCount() {
        Machine m = load(Path.of("examples/decoder-board/decoder-board.machine"), new Diagnostics());
        // Hand count: 3 code flip-flops, 8 three-input diode ANDs, 8 lamp drivers.
        assertThat(m.stageInstanceCount()).isEqualTo(3 + 8 + 8);
        assertThat(m.netlist().latches()).hasSize(3);
        Map<String, Integer> tubes = new TreeMap<>();
        for (Envelope e : m.envelopes()) {
            tubes.merge(m.tubes().get(e.tube()).name(), 1, Integer::sum);
        }
        // 12AU7: one per flip-flop (2 sections) and one per lamp driver (both sections) = 3 + 8,
        // and the clock generator: a multivibrator pair (2 sections) and one phase driver (1 section),
        // each in its own envelope of the clock module = 2.
        // 6AL5: 8 gates x 3 inputs = 24 diode sections, two to an envelope = 12.
        assertThat(tubes).containsEntry("12AU7", 11 + 2).containsEntry("6AL5", 12).hasSize(2);
        // Heaters: 13 x 12AU7 each across 12.6 V, 12 x 6AL5 in pairs = 6 strings.
        assertThat(m.heaterStrings()).hasSize(13 + 6);
        assertThat(m.inputs()).extracting(p -> p.name()).containsExactly("code[0]", "code[1]", "code[2]", "load");
    }

    @Test
    void demoMachineIsOfTheIntendedSizeAndBindsItsIsa() {
        Machine m = load(Path.of("examples/pumpstation/pumpstation.machine"), new Diagnostics());
        // the logic's 135 envelopes, the program counter's and the clock generator's (the ROM is a diode board)
        assertThat(m.envelopes().size()).isBetween(150, 250);
        assertThat(m.built()).extracting(b -> b.block() + ":" + b.counted())
                .containsExactly("pc:true", "rom:false", "clock:true");
        assertThat(m.isa().instructions()).hasSize(16);
        assertThat(m.isa().state()).extracting(s -> s.name())
                .containsExactly("acc", "carry", "pump", "alarm", "sum", "ready", "s0", "s1", "s2", "s3");
        assertThat(m.isa().state().get(2).output()).isEqualTo("pump");
        assertThat(m.pc().width()).isEqualTo(8);
        assertThat(m.rom().words()).isEqualTo(256);
        assertThat(m.softStarts()).hasSize(1);
    }
}
