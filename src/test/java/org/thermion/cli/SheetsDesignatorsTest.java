package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The designators file: written only with --save, never over a file it did not write, read by every selection. */
class SheetsDesignatorsTest {
    static final Path REV_A = Path.of("src/test/resources/org/thermion/build/revisions/rev-a.machine");

    @TempDir
    Path dir;

    private Path machine() throws IOException {
        return Files.copy(REV_A, dir.resolve("panel.machine"));
    }

    @Test
    void withoutSaveNothingIsWrittenAndWithSaveTheFileHoldsEveryPart() throws IOException {
        Path m = machine();
        Path file = dir.resolve("panel.designators");
        assertThat(ReportChecks.run("sheets", "designators", m.toString()).code()).isZero();
        assertThat(file).doesNotExist();
        ReportChecks.Result r = ReportChecks.run("sheets", "designators", m.toString(), "--save");
        assertThat(r.code()).isZero();
        assertThat(Files.readString(file, StandardCharsets.UTF_8)).contains("\nR7      pull-down of w\n");
        // a second save replaces its own file
        assertThat(ReportChecks.run("sheets", "designators", m.toString(), "--save").code()).isZero();
    }

    @Test
    void aFileItDidNotWriteIsLeftAloneUnlessReplaceIsGiven() throws IOException {
        Path m = machine();
        Path file = dir.resolve("panel.designators");
        Files.writeString(file, "# my own notes about the panel\n", StandardCharsets.UTF_8);
        ReportChecks.Result r = ReportChecks.run("sheets", "designators", m.toString(), "--save");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("refusing to replace").contains("--replace");
        assertThat(Files.readString(file, StandardCharsets.UTF_8)).isEqualTo("# my own notes about the panel\n");
        assertThat(ReportChecks.run("sheets", "designators", m.toString(), "--save", "--replace").code()).isZero();
    }

    @Test
    void everySelectionReadsTheFileAndABadLineIsShownWithACaret() throws IOException {
        Path m = machine();
        Files.writeString(dir.resolve("panel.designators"), "R9 plate load of x\nR10 grid series 0 of x\n", StandardCharsets.UTF_8);
        ReportChecks.Result parts = ReportChecks.run("sheets", "wires", m.toString());
        assertThat(parts.out()).contains("R9-1").contains("R10-2");
        Files.writeString(dir.resolve("panel.designators"), "R1 plate load of x\nR-2 grid series 0 of x\n", StandardCharsets.UTF_8);
        ReportChecks.Result bad = ReportChecks.run("sheets", "parts", m.toString());
        assertThat(bad.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(bad.err()).contains("panel.designators:2:1").contains("'R-2' is not a designator").contains("^");
        assertThat(bad.out()).isEmpty();
    }
}
