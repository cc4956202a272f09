package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Envelope;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.sim.compiled.Engine;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The netlist does not depend on the order of a module's statements: shuffled descriptions
 * (the bundled examples and generated ones) give the same stage count, the same tubes and the
 * same simulated outputs and latch values, cycle by cycle, on 64 random input lanes.
 */
class DeclarationOrderPropertyTest {
    private static final long SEED = Long.getLong("order.seed", 20261203L);

    @Test
    void bundledExamplesDoNotDependOnStatementOrder(@TempDir Path tmp) throws IOException {
        Random seeds = new Random(SEED);
        for (Path dir : List.of(Path.of("examples/decoder-board"), Path.of("examples/pumpstation"))) {
            Path main = dir.resolve(dir.getFileName() + ".machine");
            Machine original = load(main);
            for (int round = 0; round < 4; round++) {
                long seed = seeds.nextLong();
                Random r = new Random(seed);
                Path copy = Files.createDirectories(tmp.resolve(dir.getFileName() + "-" + round));
                try (Stream<Path> files = Files.list(dir)) {
                    for (Path f : files.filter(p -> p.toString().endsWith(".machine")).toList()) {
                        Files.writeString(copy.resolve(f.getFileName()), StatementShuffler.shuffle(f, Files.readString(f), r));
                    }
                }
                String what = main + " shuffled with seed " + seed;
                assertSame(original, load(copy.resolve(main.getFileName())), what, seed);
            }
        }
    }

    @Test
    void generatedModulesDoNotDependOnStatementOrder() {
        Random seeds = new Random(SEED);
        for (int i = 0; i < 60; i++) {
            long seed = seeds.nextLong();
            Random r = new Random(seed);
            String text = RandomModules.machine(r);
            Machine original = elaborate(text, "generated machine of seed " + seed + ":\n" + text);
            String shuffled = StatementShuffler.shuffle(Path.of("g.machine"), text, r);
            String what = "generated machine and shuffle of seed " + seed + ":\n" + shuffled;
            assertSame(original, elaborate(shuffled, what), what, seed);
        }
    }

    @Test
    void aComplementReadBeforeItsLatchIsWrittenCostsNoTube() {
        // !q and !r are read before the latch lines (r's latch is inside the child): the
        // flip-flops' second outputs serve, as they do when the latches come first.
        Machine m = elaborate("""
                module hold {
                  in d
                  out r
                  latch r on phase 1 = d
                }
                module top {
                  in a, b
                  out y, z
                  net r
                  y = !q & b
                  z = !r | a
                  latch q on phase 1 = a
                  use hold as h (d: b, r: r)
                }
                machine t { clock { phases 1; period 1 ms }; top top; inputs a b; outputs y z }
                """.replace("module hold", ElaborationTest.PARTS + "module hold"), "complements read early");
        assertThat(ElaborationTest.count(m, org.thermion.model.GateFn.NOT)).isZero();
    }

    @Test
    void anInverterNamedOutrightStaysATubeWhateverTheOrder() {
        // z names the inverter stage on purpose (to drive a lamp line, say); !q beside it is the
        // flip-flop's free output. Before, whichever of the two came first decided whether z's
        // tube was folded into the free output when q's latch came last.
        String before = """
                module top {
                  in a
                  out y, z
                  y = !q
                  z = pentode_inverter(q)
                  latch q on phase 1 = a
                }
                machine t { clock { phases 1; period 1 ms }; top top; inputs a; outputs y z }
                """;
        String swapped = before.replace("  y = !q\n  z = pentode_inverter(q)\n", "  z = pentode_inverter(q)\n  y = !q\n");
        String latchFirst = before.replace("  latch q on phase 1 = a\n", "").replace("  y = !q\n", "  latch q on phase 1 = a\n  y = !q\n");
        for (String text : List.of(before, swapped, latchFirst)) {
            Machine m = elaborate(ElaborationTest.PARTS + text, text);
            assertThat(ElaborationTest.count(m, org.thermion.model.GateFn.NOT)).as(text).isEqualTo(1);
        }
    }

    @Test
    void aRepeatedInputSeenOnlyThroughNamesDrivenLaterGoes() {
        // !n reads n before n is driven; n's own inverter is named outright. Both are one net in
        // the end, so the AND has two inputs whichever statement comes first.
        String late = """
                module top {
                  in a, b
                  out y
                  net n
                  y = !n & (pentode_inverter(n) & b)
                  n = a
                }
                machine t { top top; inputs a b; outputs y }
                """;
        String early = late.replace("  y = !n & (pentode_inverter(n) & b)\n  n = a\n", "  n = a\n  y = !n & (pentode_inverter(n) & b)\n");
        for (String text : List.of(late, early)) {
            Machine m = elaborate(ElaborationTest.PARTS + text, text);
            assertThat(m.netlist().gates()).as(text)
                    .filteredOn(g -> g.fn() == org.thermion.model.GateFn.AND)
                    .singleElement().satisfies(g -> assertThat(g.inputs()).hasSize(2));
            assertThat(ElaborationTest.count(m, org.thermion.model.GateFn.NOT)).as(text).isEqualTo(1);
        }
    }

    private static Machine load(Path file) {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborate(file);
        assertThat(d.hasErrors()).as(file + ": " + d.all()).isFalse();
        return m;
    }

    private static Machine elaborate(String text, String what) {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborateText(Path.of("g.machine"), text);
        assertThat(d.hasErrors()).as(what + "\n" + d.all()).isFalse();
        return m;
    }

    private static void assertSame(Machine a, Machine b, String what, long seed) {
        assertThat(b.stageInstanceCount()).as("stages, " + what).isEqualTo(a.stageInstanceCount());
        assertThat(tubes(b)).as("tubes, " + what).isEqualTo(tubes(a));
        assertThat(trace(b, seed)).as("simulated behaviour, " + what).isEqualTo(trace(a, seed));
    }

    private static Map<String, Integer> tubes(Machine m) {
        Map<String, Integer> count = new TreeMap<>();
        for (Envelope e : m.envelopes()) {
            count.merge(m.tubes().get(e.tube()).name(), 1, Integer::sum);
        }
        return count;
    }

    /** Outputs and named latches after every phase of 24 cycles; the same random inputs and ROM for both. */
    private static List<String> trace(Machine m, long seed) {
        Random r = new Random(seed);
        Simulator sim = Engine.DEFAULT.simulator(m);
        if (m.rom() != null) {
            long[] words = new long[m.rom().words()];
            for (int i = 0; i < words.length; i++) {
                words[i] = r.nextLong() & ((1L << m.rom().width()) - 1);
            }
            sim.loadRom(words);
        }
        sim.reset(new InitMode.Zero());
        Map<String, Integer> latchNets = new TreeMap<>();
        for (Latch l : m.netlist().latches()) {
            latchNets.put(m.netlist().netNames()[l.output()], l.output());
        }
        List<String> trace = new ArrayList<>();
        for (int cycle = 0; cycle < 24; cycle++) {
            for (Port p : m.inputs()) {
                sim.setInput(sim.inputIndex(p.name()), r.nextLong());
            }
            for (int phase = 0; phase < m.clock().phases(); phase++) {
                sim.stepPhase();
                StringBuilder sb = new StringBuilder();
                for (Port p : m.outputs()) {
                    sb.append(p.name()).append('=').append(Long.toHexString(sim.value(p.net()))).append(' ');
                }
                latchNets.forEach((name, net) -> sb.append(name).append('=').append(Long.toHexString(sim.value(net))).append(' '));
                trace.add(sb.toString());
            }
        }
        return trace;
    }
}
