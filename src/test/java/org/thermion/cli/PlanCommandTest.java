package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.thermion.testing.Golden;
import tools.jackson.databind.JsonNode;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

class PlanCommandTest {
    private static final String C17 = "src/test/resources/org/thermion/faults/c17.machine";
    private static final Path DIR = Path.of("src", "test", "resources", "org", "thermion", "cli", "plan");

    @Test
    void c17PlanAsTextMatchesItsGoldenFile() {
        ReportChecks.Result r = ReportChecks.run("plan", C17);
        assertThat(r.code()).as(r.err()).isZero();
        ReportChecks.assertText(r.out());
        Golden.assertMatches(DIR.resolve("c17.txt"), r.out());
    }

    @Test
    void c17PlanAsJsonKeepsItsSchemaAndCountsFromTheBenchmark() {
        ReportChecks.Result r = ReportChecks.run("plan", C17, "--format", "json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode tree = ReportChecks.assertJson(r.out());
        // Brglez & Fujiwara 1985 (c17): 34 stuck-at faults, 22 after equivalence collapsing, all detected.
        assertThat(tree.path("stuck_at_faults").asInt()).isEqualTo(34);
        assertThat(tree.path("stuck_at_collapsed").asInt()).isEqualTo(22);
        assertThat(tree.path("aborted").asInt()).isZero();
        assertThat(tree.path("steps").asInt()).isLessThanOrEqualTo(5);
        ReportChecks.assertCsv(ReportChecks.run("plan", C17, "--format", "csv").out());
    }

    @Test
    void theBringUpPanelsDistinguishedPlanSaysWhyEachLargeGroupStaysAndWhichLampWouldSplitIt() {
        ReportChecks.Result r = ReportChecks.run("plan", "examples/bringup-panel/bringup-panel.machine", "--distinguish",
                "--format", "json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode tree = ReportChecks.assertJson(r.out());
        assertThat(tree.path("bridge_faults").asInt()).isGreaterThanOrEqualTo(tree.path("bridge_collapsed").asInt())
                .isPositive();
        JsonNode groups = tree.path("tables").path("groups");
        assertThat(groups.size()).isPositive();
        for (JsonNode g : groups) {
            assertThat(g.path("faults").asInt()).isGreaterThan(3);
            assertThat(g.path("proven").asString()).isEqualTo("yes");
            assertThat(g.path("lamp_on").asString()).isNotEqualTo("(none)");
            assertThat(g.path("other_program").asString()).isEqualTo("-");
        }
    }

    @Test
    void aMachineWithARomNeedsItsProgram() {
        ReportChecks.Result r = ReportChecks.run("plan", "examples/pumpstation/pumpstation.machine");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--program").doesNotContain("Exception");
    }
}
