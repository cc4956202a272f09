package org.thermion.cli;

import tools.jackson.databind.JsonNode;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

/** `bench` in its shortest form: every figure present with its target; no timing is asserted. */
class BenchCommandTest {

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void jsonReportHasEveryMeasurementWithItsTarget() {
        CheckCommandTest.Result r = CheckCommandTest.run("bench", "--sizes", "400", "--seconds", "0.05", "--engine", "array",
                "--compile-max", "0", "--format", "json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode top = ReportChecks.assertJson(r.out());
        assertThat(top.path("default_engine").asString()).isEqualTo("auto");
        JsonNode rows = top.path("tables").path("rows");
        assertThat(rows.findValuesAsString("machine")).contains("demo", "synth 400");
        Map<String, JsonNode> byMeasure = new HashMap<>();
        rows.forEach(x -> byMeasure.putIfAbsent(x.path("machine").asString() + ": " + x.path("measure").asString(), x));
        assertThat(byMeasure.get("synth 400: stage instances").path("value").asInt()).isEqualTo(400);
        assertThat(byMeasure.get("synth 400: heap per stage instance").path("target").asString()).isEqualTo("<= 2 KB");
        assertThat(byMeasure.get("synth 400: array, 64 lanes / 1 lane (lane-evals)").path("target").asString()).isEqualTo(">= 40 x");
        assertThat(byMeasure.get("demo: powerup: solve 30 s").path("target").asString()).isEqualTo("<= 0.2 s");
        assertThat(byMeasure).containsKey("demo: verify: cases/s");
        assertThat(rows.findValuesAsString("target")).contains("<= 2 s");
        assertThat(r.out()).contains("skipped: 161 gates is past --compile-max 0");
    }

    @Test
    void textTableNamesTheTargets() {
        CheckCommandTest.Result r = CheckCommandTest.run("bench", "--sizes", "300", "--seconds", "0.02", "--engine", "compiled");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("machine", "measurement", "target", "verdict", "synth 300", "parse + elaborate")
                .contains("straight-line reference:", "compiled (default) /", "Default engine: auto");
        // the table keeps to 100 columns: long measurement names and verdicts wrap within their columns
        ReportChecks.assertText(r.out());
    }

    @Test
    void badOptionsExitTwo() {
        assertThat(CheckCommandTest.run("bench", "--sizes", "5").code()).isEqualTo(ExitCodes.BAD_INPUT);
        CheckCommandTest.Result r = CheckCommandTest.run("bench", "--engine", "fast");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("choose auto, compiled or array").doesNotContain("Exception");
        assertThat(CheckCommandTest.run("bench", "--engine", "auto").err()).contains("not one to measure");
    }
}
