package org.thermion.cli;

import org.thermion.testing.Golden;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/** The run command end to end on the demo machine and its programs. */
class RunCommandTest {
    static final String MACHINE = "examples/pumpstation/pumpstation.machine";
    static final Path GOLDEN = Path.of("src", "test", "resources", "org", "thermion", "cli", "run");
    static final String STIM = GOLDEN.resolve("pump-stim.csv").toString();

    record Outcome(int code, String out, String err) {
    }

    static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out)).setErr(new PrintWriter(err)).execute(args);
        return new Outcome(code, out.toString(), err.toString());
    }

    static void golden(String name, String actual) {
        Golden.assertMatches(GOLDEN.resolve(name), actual);
    }

    @Test
    void pumpProgramFollowsTheStimulus() throws IOException {
        Outcome o = run("run", MACHINE, "programs/pump.asm", "--inputs", STIM, "--cycles", "200");
        assertThat(o.code()).as(o.err()).isZero();
        // By hand from pump.asm: the pass starting at cycle 20 (pc 0) reads low_sw dry and
        // reaches ST pump, its sixth instruction, in cycle 25; the store loads on phase 2.
        assertThat(o.out()).containsPattern("\\n  25 +2  pump +1\\n");
        golden("pump.txt", o.out());
    }

    @Test
    void csvAndJsonCarryTheSameRun() throws IOException {
        String[] args = {"run", MACHINE, "programs/pump.asm", "--inputs", STIM, "--cycles", "30", "--watch", "acc,s0"};
        Outcome csv = run(concat(args, "--format", "csv"));
        Outcome json = run(concat(args, "--format", "json"));
        assertThat(csv.code()).isZero();
        assertThat(json.code()).isZero();
        golden("pump-30.csv", csv.out());
        golden("pump-30.json", json.out());
    }

    private static String[] concat(String[] a, String... b) {
        String[] r = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, r, a.length, b.length);
        return r;
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void logicAndIsaLevelsAgreeOnThePrograms() {
        String[][] cases = {
                {"programs/pump.asm", STIM},
                {"programs/serial-add.asm", GOLDEN.resolve("serial-stim.csv").toString()},
                {"programs/every-op.asm", GOLDEN.resolve("every-op-stim.csv").toString()},
        };
        for (String[] c : cases) {
            Outcome logic = run("run", MACHINE, c[0], "--inputs", c[1], "--cycles", "300", "--format", "json");
            Outcome isa = run("run", MACHINE, c[0], "--inputs", c[1], "--cycles", "300", "--format", "json",
                    "--level", "isa");
            assertThat(logic.code()).as(logic.err()).isZero();
            assertThat(isa.code()).as(isa.err()).isZero();
            assertThat(isa.out().replace("\"level\" : \"isa\"", "\"level\" : \"logic\"")).as(c[0]).isEqualTo(logic.out());
        }
    }

    @Test
    void withRandomInitTheIsaLevelStartsFromTheStateTheLogicPowersUpIn() {
        String stim = GOLDEN.resolve("every-op-stim.csv").toString();
        Outcome logic = run("run", MACHINE, "programs/every-op.asm", "--inputs", stim, "--cycles", "120",
                "--init", "random:7", "--format", "json", "--watch", "acc,carry,s3");
        Outcome isa = run("run", MACHINE, "programs/every-op.asm", "--inputs", stim, "--cycles", "120",
                "--init", "random:7", "--format", "json", "--watch", "acc,carry,s3", "--level", "isa");
        assertThat(logic.code()).as(logic.err()).isZero();
        assertThat(isa.out().replace("\"level\" : \"isa\"", "\"level\" : \"logic\"")).isEqualTo(logic.out());
    }

    @Test
    void aProgramThatSettlesStopsAtItsFixedPoint(@TempDir Path dir) throws IOException {
        Path prog = dir.resolve("settle.asm");
        Files.writeString(prog, "        LD low_sw\n        ST pump\nhere:   JMP here\n");
        Outcome o = run("run", MACHINE, prog.toString(), "--format", "csv");
        assertThat(o.code()).as(o.err()).isZero();
        // Cycle 2 loads JMP into the instruction register; cycle 3 repeats it exactly: 4 cycles.
        assertThat(o.out()).contains("report,cycles,4,", "report,stop,fixed point at address 2");
        Outcome isa = run("run", MACHINE, prog.toString(), "--format", "csv", "--level", "isa");
        assertThat(isa.out().replace("report,level,isa,", "report,level,logic,")).isEqualTo(o.out());
    }

    @Test
    void anUnsetAccumulatorStoredToAnOutputIsReportedAndExitsOne(@TempDir Path dir) throws IOException {
        Path prog = dir.resolve("unset.asm");
        Files.writeString(prog, "        ST alarm\n        JMPC 0\n        JMP 0\n");
        Outcome o = run("run", MACHINE, prog.toString(), "--init", "unknown", "--cycles", "6");
        assertThat(o.code()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(o.out()).containsPattern("0 +2 +alarm +output latch loaded with an unknown value");
        assertThat(o.out()).containsPattern("1 +2 +jump +jump decision unknown");
        assertThat(o.out()).contains("stopped: program counter unknown after cycle 1");
    }

    @Test
    void aBoardWithoutRomRunsFromItsStimulusAlone(@TempDir Path dir) throws IOException {
        Path stim = dir.resolve("codes.csv");
        // Code 5 (bits 0 and 2) loaded in cycle 0, code 6 offered in cycle 3, loading stops in cycle 5.
        Files.writeString(stim, "cycle,code[0],code[1],code[2],load\n0,1,0,1,1\n3,0,1,1,\n5,,,,0\n6,1,1,1,\n");
        Outcome o = run("run", "examples/decoder-board/decoder-board.machine", "--inputs", stim.toString(),
                "--format", "csv");
        assertThat(o.code()).as(o.err()).isZero();
        // The code latch loads at the end of phase 1; the decoded lamp follows in that same phase. The eight
        // lamps are one output bus, shown as one number: lamp 5 alone is 0x20, lamp 6 alone 0x40.
        assertThat(o.out()).contains("changes,0,1,lamp,0x20\r\n", "changes,3,1,lamp,0x40\r\n");
        // Code 7 in cycle 6 comes while load is 0: nothing changes, and the board is at a fixed point.
        assertThat(o.out()).doesNotContain("0x80").contains("report,cycles,7,", "report,stop,fixed point:");
        assertThat(run("run", MACHINE).err()).contains("has a ROM: name the PROGRAM to run");
    }

    @Test
    void thePcAndABusAreWatchedAsNumbersOnBothLevels() {
        for (String level : new String[] {"logic", "isa"}) {
            Outcome o = run("run", MACHINE, "programs/pump.asm", "--cycles", "3", "--watch", "pc,acc", "--format", "csv",
                    "--level", level);
            assertThat(o.code()).as(o.err()).isZero();
            // The pump program starts at address 0 and runs straight on for its first cycles: the PC
            // after cycle c is c + 1, written as the demo's 8-bit PC in two hex digits.
            // (the table's own pc column is the instruction each cycle ran: c)
            assertThat(o.out()).as(level).contains("watch,0,0,pc,0x01\r\n", "watch,1,1,pc,0x02\r\n",
                    "watch,2,2,pc,0x03\r\n");
        }
        Outcome bus = run("run", MACHINE, "programs/pump.asm", "--cycles", "3", "--watch", "line", "--format", "csv");
        assertThat(bus.code()).as(bus.err()).isZero();
        // The 16 decode lines as one number, four hex digits, one line up in every cycle.
        assertThat(bus.out()).containsPattern("watch,0,0,line,0x[0-9a-f]{4}\r\n").doesNotContain("line[");
    }

    @Test
    void anUnknownWatchNameSuggestsTheNearest() {
        Outcome o = run("run", MACHINE, "programs/pump.asm", "--watch", "acc,acc_nxt");
        assertThat(o.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(o.err()).contains("error: --watch: no net named 'acc_nxt'; did you mean 'acc_next'?");
        assertThat(o.out()).isEmpty();
    }

    @Test
    void theVcdNeverReplacesAnInput(@TempDir Path dir) throws IOException {
        Path prog = dir.resolve("p.asm");
        Files.writeString(prog, "loop: JMP loop\n");
        Outcome o = run("run", MACHINE, prog.toString(), "--vcd", prog.toString());
        assertThat(o.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(o.err()).contains("refusing to write a value change dump over " + prog);
        assertThat(Files.readString(prog)).isEqualTo("loop: JMP loop\n");
        Path stim = dir.resolve("s.csv");
        Files.writeString(stim, "cycle,manual\n0,1\n");
        Outcome s = run("run", MACHINE, prog.toString(), "--inputs", stim.toString(), "--vcd",
                dir.resolve(".").resolve("s.csv").toString());
        assertThat(s.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readString(stim)).isEqualTo("cycle,manual\n0,1\n");
        // An included part of a machine is not named on the command line, but it is a source all the same.
        Path part = dir.resolve("part.machine");
        Files.writeString(part, "# a part\n");
        assertThat(run("run", MACHINE, prog.toString(), "--vcd", part.toString()).code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readString(part)).isEqualTo("# a part\n");
    }

    @Test
    void theVcdIsWrittenWholeWithNoTemporaryLeft(@TempDir Path dir) throws IOException {
        Path vcd = dir.resolve("run.vcd");
        Files.writeString(vcd, "old");
        // A file that is not an earlier dump is kept unless --replace says otherwise.
        Outcome kept = run("run", MACHINE, "programs/pump.asm", "--cycles", "30", "--vcd", vcd.toString());
        assertThat(kept.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(kept.err()).contains("refusing to replace " + vcd + ": it exists and is not a value change dump written earlier");
        assertThat(Files.readString(vcd)).isEqualTo("old");
        Outcome o = run("run", MACHINE, "programs/pump.asm", "--cycles", "30", "--vcd", vcd.toString(), "--vcd-all", "--replace");
        assertThat(o.code()).as(o.err()).isZero();
        // An earlier dump is replaced without being asked.
        assertThat(run("run", MACHINE, "programs/pump.asm", "--cycles", "30", "--vcd", vcd.toString()).code()).isZero();
        String text = Files.readString(vcd);
        assertThat(text).startsWith("$date").contains("$enddefinitions $end");
        // 30 cycles of 300 us end at 9000 us: the last timestamp.
        assertThat(text.substring(text.lastIndexOf('#'))).startsWith("#9000\n");
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files.map(p -> p.getFileName().toString())).containsExactly("run.vcd");
        }
    }

    @Test
    void badStimulusIsReportedWithItsPlace(@TempDir Path dir) throws IOException {
        Path stim = dir.resolve("bad.csv");
        Files.writeString(stim, "cycle,low_sw\n0,yes\n");
        Outcome o = run("run", MACHINE, "programs/pump.asm", "--inputs", stim.toString());
        assertThat(o.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(o.err()).contains(stim + ":2:3: error: expected 0 or 1 for input 'low_sw', found 'yes'")
                .contains("  0,yes\n    ^~~\n");
    }

    @Test
    void optionMistakesAreUsageErrors() {
        assertThat(run("run", MACHINE, "programs/pump.asm", "--init", "random").err())
                .contains("needs a seed: random:SEED");
        assertThat(run("run", MACHINE, "programs/pump.asm", "--init", "unknown", "--level", "isa").code())
                .isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("run", MACHINE, "programs/pump.asm", "--cycles", "0").code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("run", MACHINE, "programs/pump.asm", "--level", "gates").code()).isEqualTo(ExitCodes.BAD_INPUT);
    }
}
