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
    void aNextProgramNeedsDistinguishAndAMachineWithARom() {
        ReportChecks.Result r = ReportChecks.run("plan", "examples/pumpstation/pumpstation.machine", "--program",
                "programs/pump.asm", "--next-program", "programs/every-op.asm");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--distinguish").doesNotContain("Exception");
        r = ReportChecks.run("plan", "examples/bringup-panel/bringup-panel.machine", "--distinguish", "--next-program",
                "programs/every-op.asm");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("no ROM").doesNotContain("Exception");
    }

    @Test
    void theDemosPlanSpanningTwoProgramsNamesTheRestartAndKeepsItsSchema() {
        ReportChecks.Result r = ReportChecks.run("plan", "examples/pumpstation/pumpstation.machine", "--program",
                "programs/pump.asm", "--distinguish", "--next-program", "programs/every-op.asm", "--format", "json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode tree = ReportChecks.assertJson(r.out());
        JsonNode steps = tree.path("tables").path("steps");
        java.util.List<String> firsts = new java.util.ArrayList<>();
        for (JsonNode s : steps) {
            if (!s.path("first").isNull()) {
                firsts.add(s.path("first").asString());
            }
        }
        assertThat(firsts).isNotEmpty();
        assertThat(firsts.get(0)).isEqualTo("fit programs/every-op.asm");
        for (int k = 1; k < firsts.size(); k++) {
            assertThat(firsts.get(k)).isEqualTo("fit written program " + k + " (table written)");
        }
        int written = 0;
        for (JsonNode w : tree.path("tables").path("written")) {
            written = Math.max(written, w.path("program").asInt());
        }
        assertThat(written).isEqualTo(firsts.size() - 1);
        for (JsonNode g : tree.path("tables").path("groups")) {
            assertThat(g.path("faults").asInt()).isGreaterThan(3);
        }
    }

    @Test
    void aMachineWithARomNeedsItsProgram() {
        ReportChecks.Result r = ReportChecks.run("plan", "examples/pumpstation/pumpstation.machine");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--program").doesNotContain("Exception");
    }
}
