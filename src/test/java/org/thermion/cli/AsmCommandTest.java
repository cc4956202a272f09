package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The asm command end to end: files written, inputs protected, errors reported with exit 2. */
class AsmCommandTest {
    static final String MACHINE = "examples/pumpstation/pumpstation.machine";

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out)).setErr(new PrintWriter(err)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void writesIntelHexToTheNamedFile(@TempDir Path dir) throws IOException {
        Path hex = dir.resolve("pump.hex");
        Run r = run("asm", MACHINE, "programs/pump.asm", "-o", hex.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("10 of 256 ROM words used");
        String text = Files.readString(hex);
        // First record: LDN low_sw = 0x200, OR s0 = 0x90C, ... by hand from the header comment.
        assertThat(text).startsWith(":100000000200090C0801030C0902030801010800");
        assertThat(text).endsWith(":00000001FF\n");
        assertThat(text.lines()).hasSize(33);
        try (var s = Files.list(dir)) {
            assertThat(s).as("no temporary file left behind").hasSize(1);
        }
    }

    @Test
    void withoutOutputPrintsTheHexOrTheListing() {
        Run hex = run("asm", MACHINE, "programs/pump.asm");
        assertThat(hex.code()).isZero();
        assertThat(hex.out().lines().findFirst().orElseThrow()).startsWith(":10000000");
        Run listing = run("asm", MACHINE, "programs/pump.asm", "--listing");
        assertThat(listing.code()).isZero();
        assertThat(listing.out()).contains("0x09  0xD00  1101 0000 0000    30          JMP  loop").doesNotContain(":1000");
    }

    @Test
    void neverWritesOverAnInput(@TempDir Path dir) throws IOException {
        Path prog = dir.resolve("p.asm");
        Files.writeString(prog, "NOP\n");
        Run r = run("asm", MACHINE, prog.toString(), "-o", prog.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("refusing to write");
        assertThat(Files.readString(prog)).isEqualTo("NOP\n");
        Run m = run("asm", MACHINE, prog.toString(), "-o", MACHINE);
        assertThat(m.code()).isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void errorsGiveExitTwoWithPlaceAndCaret(@TempDir Path dir) throws IOException {
        Path prog = dir.resolve("bad.asm");
        Files.writeString(prog, "  LDX 1\n  JMP nowhere\n");
        Path hex = dir.resolve("bad.hex");
        Run r = run("asm", MACHINE, prog.toString(), "-o", hex.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains(prog + ":1:3: error: unknown mnemonic 'LDX'", "  ^~~", prog + ":2:7: error: undefined label",
                "2 errors");
        assertThat(r.err()).doesNotContain("Exception");
        assertThat(hex).doesNotExist();
    }

    @Test
    void missingProgramOrDirectoryIsBadInput(@TempDir Path dir) {
        assertThat(run("asm", MACHINE, dir.resolve("none.asm").toString()).code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run("asm", MACHINE, "programs/pump.asm", "-o", dir.resolve("no/such/x.hex").toString()).code())
                .isEqualTo(ExitCodes.BAD_INPUT);
    }
}
