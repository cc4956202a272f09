package org.thermion.cli;

import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class DiagnoseCommandTest {
    private static final String C17 = "src/test/resources/org/thermion/faults/c17.machine";

    /** Writes the lamps a builder saw into a temporary CSV file. */
    private static Path seen(Path dir, String... lines) throws IOException {
        Path f = dir.resolve("seen.csv");
        Files.write(f, List.of(lines), StandardCharsets.UTF_8);
        return f;
    }

    @Test
    void lampsOfAWorkingMachineSayNothingIsWrongAndExitZero(@org.junit.jupiter.api.io.TempDir Path dir) throws IOException {
        // What c17's plan expects at its four steps (the plan command's golden file): n22; n23; both; none.
        Path f = seen(dir, "step,n22,n23", "1,1,0", "2,0,1", "3,1,1", "4,0,0");
        ReportChecks.Result r = ReportChecks.run("diagnose", C17, f.toString(), "--format", "json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode tree = ReportChecks.assertJson(r.out());
        assertThat(tree.path("verdict").asString()).isEqualTo("looks_good");
        assertThat(tree.path("tables").path("suspects").get(0).path("fault").asString()).startsWith("no fault");
    }

    @Test
    void aLampStuckLitPointsAtItsNandStageAndTubeFirst(@org.junit.jupiter.api.io.TempDir Path dir) throws IOException {
        // n22 lit at every step where the plan expects it dark (steps 2 and 4): n22 stuck at 1.
        Path f = seen(dir, "step,n22,n23", "1,1,0", "2,1,1", "3,1,1", "4,1,0");
        ReportChecks.Result r = ReportChecks.run("diagnose", C17, f.toString(), "--format", "json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        JsonNode tree = ReportChecks.assertJson(r.out());
        assertThat(tree.path("verdict").asString()).isEqualTo("exact");
        JsonNode first = tree.path("tables").path("suspects").get(0);
        assertThat(first.path("rank").asInt()).isEqualTo(1);
        assertThat(first.path("net").asString()).isEqualTo("n22");
        assertThat(first.path("fault").asString()).contains("stuck-at-1");
        assertThat(first.path("tube").asString()).contains("6AU6");
    }
}
