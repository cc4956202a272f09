package org.thermion.sim;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.io.StringWriter;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.thermion.sim.SimMachines.word;

/** The VCD of a short demo run, read back for structure and for the values it records. */
class VcdWriterTest {

    private static String dump(Machine m, long[] rom, List<Integer> nets, int cycles, boolean highSw) {
        Simulator sim = new Simulator(m);
        sim.loadRom(rom);
        sim.setInput("low_sw", true);
        sim.setInput("high_sw", highSw);
        sim.settle();
        StringWriter w = new StringWriter();
        VcdWriter vcd = new VcdWriter(m, nets, 0, w);
        vcd.begin(sim, "test date", "thermion test");
        for (int c = 0; c < cycles; c++) {
            for (int p = 1; p <= sim.phases(); p++) {
                sim.stepPhase();
                vcd.afterPhase(sim, c, p);
            }
        }
        vcd.finish(cycles);
        return w.toString();
    }

    @Test
    void aStoreShowsAtTheEndOfItsExecutePhaseAndTheDecodeLineAtItsStart() {
        Machine m = SimMachines.demo();
        // 0: LD low_sw   1: ST pump   2: JMP 2
        long[] rom = {word(0x1, 0), word(0x3, 8), word(0xD, 2)};
        VcdReader r = new VcdReader(dump(m, rom, VcdWriter.allNamedNets(m), 4, false));
        assertThat(r.header.get("$timescale")).isEqualTo("1 us");
        assertThat(r.header.get("$date")).isEqualTo("test date");
        assertThat(r.header.get("$version")).isEqualTo("thermion test");
        assertThat(r.scopes).contains("pumpstation", "pumpstation.osel", "pumpstation.lu");
        // The clock is 300 us in 2 phases (the demo's clock block): a phase is 150 us.
        // ST runs in cycle 1; its execute phase (2) spans 450..600 us and pump loads at 600 us.
        assertThat(r.at("pumpstation.pump", 599)).isEqualTo("0");
        assertThat(r.at("pumpstation.pump", 600)).isEqualTo("1");
        // The decode bus is one 16-bit vector (IEEE 1364 $var wire 16 ... line [15:0]); line[3] (ST decoded)
        // is up during that phase: from 450 us until the next IR load settles at 750 us.
        String line = "pumpstation.line[15:0]";
        assertThat(r.widths.get(r.vars.get(line))).isEqualTo(16);
        assertThat(bit(r.at(line, 449), 3)).isEqualTo('0');
        assertThat(r.at(line, 450)).isEqualTo("0000000000001000");
        assertThat(bit(r.at(line, 750), 3)).isEqualTo('0');
        // The PC: 1 after cycle 0 (300 us), 2 after cycle 1, stays 2 (JMP 2).
        assertThat(r.at("pumpstation.pc[7:0]", 300)).isEqualTo("00000001");
        assertThat(r.at("pumpstation.pc[7:0]", 1199)).isEqualTo("00000010");
        // Nets of a module instance sit in its scope with the local name.
        String inner = innerBusBit(m);
        String innerBus = inner.substring(0, inner.lastIndexOf('['));
        assertThat(r.vars).containsKey("pumpstation.lu.s_n");
        assertThat(r.vars.keySet()).anyMatch(k -> k.startsWith("pumpstation." + innerBus + "[") && k.endsWith(":0]"));
        // No bus bit is left declared alone when its whole bus is dumped.
        assertThat(r.vars.keySet()).noneMatch(k -> k.matches(".*\\[\\d+]"));
        assertThat(r.vars.keySet()).noneMatch(k -> k.contains("$"));
        assertThat(r.lastTime).isEqualTo(1200);
    }

    /** Some bus bit inside a module instance (e.g. osel.pick[5]), found rather than named, as the demo evolves. */
    static String innerBusBit(Machine m) {
        for (String n : m.netlist().netNames()) {
            if (n.contains(".") && n.endsWith("]") && !NetLookup.temporary(n)) {
                return n;
            }
        }
        throw new AssertionError("the demo has no bus inside a module instance");
    }

    @Test
    void unknownValuesAreDumpedAsX() {
        Machine m = SimMachines.demo();
        Simulator sim = new Simulator(m);
        sim.loadRom(new long[] {word(0x0, 0)});
        sim.reset(new InitMode.Unknown());
        sim.settle();
        StringWriter w = new StringWriter();
        VcdWriter vcd = new VcdWriter(m, List.of(SimMachines.net(m, "acc"), SimMachines.net(m, "ir[0]")), 0, w);
        vcd.begin(sim, "d", "v");
        sim.stepPhase();
        vcd.afterPhase(sim, 0, 1);
        vcd.finish(1);
        VcdReader r = new VcdReader(w.toString());
        assertThat(r.at("pumpstation.acc", 0)).isEqualTo("x");
        assertThat(r.at("pumpstation.ir[0]", 0)).isEqualTo("x");
        // NOP's word loads at the end of phase 1.
        assertThat(r.at("pumpstation.ir[0]", 150)).isEqualTo("0");
    }

    @Test
    void aBusIsOneVectorWhoseBitsAreTheNetsValues() {
        Machine m = SimMachines.demo();
        // 0: LDN 6   1: ST pump   2: JMP 2; ir is the instruction register, loaded in phase 1.
        long[] rom = {word(0x2, 6), word(0x3, 8), word(0xD, 2)};
        List<Integer> ir = new NetLookup(m).resolve("ir");
        String text = dump(m, rom, ir, 3, false);
        assertThat(text).containsPattern("\\$var wire " + ir.size() + " \\S+ ir \\[" + (ir.size() - 1) + ":0] \\$end");
        VcdReader r = new VcdReader(text);
        String path = "pumpstation.ir[" + (ir.size() - 1) + ":0]";
        // After phase 1 of cycle c (150 us + 300 us c) ir holds word c; MSB first in the dump.
        for (int c = 0; c < 3; c++) {
            String expected = Long.toBinaryString((1L << ir.size()) | rom[c]).substring(1);
            assertThat(r.at(path, 150 + 300L * c)).as("cycle %d", c).isEqualTo(expected);
        }
    }

    private static char bit(String msbFirst, int k) {
        return msbFirst.charAt(msbFirst.length() - 1 - k);
    }

    @Test
    void identifiersAreShortAndDistinct() {
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (int i = 0; i < 20000; i++) {
            String id = VcdWriter.identifier(i);
            assertThat(seen.add(id)).isTrue();
            assertThat(id.chars()).allMatch(c -> c >= 33 && c <= 126);
        }
        assertThat(VcdWriter.identifier(0)).isEqualTo("!");
        assertThat(VcdWriter.identifier(93)).isEqualTo("~");
        assertThat(VcdWriter.identifier(94)).hasSize(2);
    }

    @Test
    void referencesAreIdentifiersBitSelectsOrEscaped() {
        assertThat(VcdWriter.reference("acc")).isEqualTo("acc");
        assertThat(VcdWriter.reference("line[3]")).isEqualTo("line [3]");
        assertThat(VcdWriter.reference("ir[8]_n")).isEqualTo("\\ir[8]_n");
    }

    @Test
    void timebaseKeepsEveryPhaseBoundaryExact() {
        assertThat(VcdTimebase.of(new org.thermion.model.Clock(2, 100e-6))).isEqualTo(new VcdTimebase("us", 50, 2));
        assertThat(VcdTimebase.of(new org.thermion.model.Clock(3, 1e-6))).extracting(VcdTimebase::unit)
                .isIn("ps", "fs");
        assertThat(VcdTimebase.of(new org.thermion.model.Clock(4, 2.0)).unit()).isEqualTo("ms");
    }
}
