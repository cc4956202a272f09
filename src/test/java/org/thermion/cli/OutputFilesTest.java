package org.thermion.cli;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/** Outputs never destroy work: what is replaced, what is refused, and what a stopped run leaves. */
class OutputFilesTest {
    static final String MACHINE = "examples/pumpstation/pumpstation.machine";
    static final String PROGRAM = "programs/pump.asm";

    private static AsmCommandTest.Run run(String... args) {
        return AsmCommandTest.run(args);
    }

    @Test
    void powerupCsvNeverReplacesADescriptionThatIsNotAnInput(@TempDir Path dir) throws IOException {
        Path other = dir.resolve("spare.machine");
        Files.copy(Path.of("examples/pumpstation/decoder.machine"), other);
        String before = Files.readString(other);
        AsmCommandTest.Run r = run("powerup", MACHINE, "--csv", other.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("refusing to replace " + other + ": it exists and is not a power-up time series written earlier"
                + " (it reads as a machine description)").contains("pass --replace");
        assertThat(Files.readString(other)).isEqualTo(before);
    }

    @Test
    void asmNeverWritesOverAnIncludedFileWhateverItsName(@TempDir Path dir) throws IOException {
        Path parts = dir.resolve("parts.txt");
        Files.copy(Path.of("examples/pumpstation/decoder.machine"), parts);
        Path top = dir.resolve("top.machine");
        Files.writeString(top, Files.readString(Path.of(MACHINE)).replace("include \"decoder.machine\"", "include \"parts.txt\""));
        String before = Files.readString(parts);
        // Not even --replace: an input of this run is never an output of it.
        AsmCommandTest.Run r = run("asm", top.toString(), PROGRAM, "-o", parts.toString(), "--replace");
        assertThat(r.code()).as(r.out() + r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("refusing to write an Intel HEX image over " + parts + ", which is an input of this run");
        assertThat(Files.readString(parts)).isEqualTo(before);
    }

    @Test
    void asmKeepsAStimulusAndAProgramThatAreNotInputs(@TempDir Path dir) throws IOException {
        Path stim = dir.resolve("day.csv");
        Files.copy(Path.of("programs/pump-day.csv"), stim);
        AsmCommandTest.Run r = run("asm", MACHINE, PROGRAM, "-o", stim.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("(it reads as a table such as a stimulus)");
        Path prog = dir.resolve("other");
        Files.copy(Path.of("programs/serial-add.asm"), prog);
        assertThat(run("asm", MACHINE, PROGRAM, "-o", prog.toString()).err()).contains("(it reads as a program)");
        assertThat(Files.readString(prog)).isEqualTo(Files.readString(Path.of("programs/serial-add.asm")));
    }

    @Test
    void anEarlierImageIsReplacedAndAnythingElseOnlyWithReplace(@TempDir Path dir) throws IOException {
        Path hex = dir.resolve("pump.hex");
        assertThat(run("asm", MACHINE, PROGRAM, "-o", hex.toString()).code()).isZero();
        assertThat(run("asm", MACHINE, "programs/serial-add.asm", "-o", hex.toString()).code()).isZero();
        Path notes = dir.resolve("notes.hex");
        Files.writeString(notes, "my notes\n");
        assertThat(run("asm", MACHINE, PROGRAM, "-o", notes.toString()).code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readString(notes)).isEqualTo("my notes\n");
        assertThat(run("asm", MACHINE, PROGRAM, "-o", notes.toString(), "--replace").code()).isZero();
        assertThat(Files.readString(notes)).startsWith(":10000000");
    }

    @Test
    void unwritableTargetsAreBadInputNotInternalErrors(@TempDir Path dir) throws IOException {
        AsmCommandTest.Run empty = run("asm", MACHINE, PROGRAM, "-o", "");
        assertThat(empty.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(empty.err()).contains("error: no file name given for an Intel HEX image");
        AsmCommandTest.Run directory = run("asm", MACHINE, PROGRAM, "-o", dir.toString());
        assertThat(directory.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(directory.err()).contains("it is a directory");
        Path file = Files.writeString(dir.resolve("plain.txt"), "x");
        AsmCommandTest.Run under = run("asm", MACHINE, PROGRAM, "-o", file.resolve("x.hex").toString());
        assertThat(under.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(under.err()).contains("no such directory");
    }

    @Test
    void aReadOnlyDirectoryIsBadInput(@TempDir Path dir) throws IOException {
        Path locked = Files.createDirectory(dir.resolve("locked"));
        Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            Assumptions.assumeFalse(Files.isWritable(locked), "the system lets this user write a read-only directory (root)");
            AsmCommandTest.Run ro = run("asm", MACHINE, PROGRAM, "-o", locked.resolve("x.hex").toString());
            assertThat(ro.code()).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(ro.err()).contains("is not writable");
        } finally {
            Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void aRunStoppedBySigtermLeavesNoTemporaryFileAndThePreviousDumpWhole(@TempDir Path dir) throws Exception {
        Path vcd = dir.resolve("long.vcd");
        assertThat(run("run", MACHINE, PROGRAM, "--cycles", "20", "--vcd", vcd.toString()).code()).isZero();
        byte[] previous = Files.readAllBytes(vcd);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), Main.class.getName(),
                "run", MACHINE, PROGRAM, "--cycles", "100000000", "--vcd", vcd.toString(), "--vcd-all")
                .redirectErrorStream(true).redirectOutput(new File(dir.resolve("log.txt").toString())).start();
        try {
            long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(40);
            while (temporaries(dir).isEmpty() && p.isAlive() && System.nanoTime() < until) {
                Thread.sleep(50);
            }
            assertThat(temporaries(dir)).as("the run is writing its temporary file").hasSize(1);
            Thread.sleep(300);
            p.destroy();  // SIGTERM
            assertThat(p.waitFor(20, TimeUnit.SECONDS)).isTrue();
        } finally {
            p.destroyForcibly();
        }
        assertThat(temporaries(dir)).isEmpty();
        assertThat(Files.readAllBytes(vcd)).isEqualTo(previous);
    }

    private static List<String> temporaries(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(x -> x.getFileName().toString()).filter(n -> n.endsWith(".tmp")).toList();
        }
    }
}
