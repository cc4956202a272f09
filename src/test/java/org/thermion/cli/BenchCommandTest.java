package org.thermion.cli;

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
        assertThat(r.out()).startsWith("{").contains("\"defaultEngine\": \"auto\"")
                .contains("\"machine\": \"demo\"", "\"machine\": \"synth 400\"")
                .contains("\"measure\": \"stage instances\", \"value\": 400,")
                .contains("\"measure\": \"heap per stage instance\"", "\"target\": \"<= 2 KB\"")
                .contains("\"measure\": \"array, 64 lanes / 1 lane (lane-evals)\"", "\"target\": \">= 40 x\"")
                .contains("skipped: 137 gates is past --compile-max 0")
                .contains("\"measure\": \"verify: cases/s\"", "\"measure\": \"powerup: solve 30 s\"", "\"target\": \"<= 0.2 s\"")
                .contains("\"target\": \"<= 2 s\"");
    }

    @Test
    void textTableNamesTheTargets() {
        CheckCommandTest.Result r = CheckCommandTest.run("bench", "--sizes", "300", "--seconds", "0.02", "--engine", "compiled");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("machine", "measurement", "target", "verdict", "synth 300", "parse + elaborate")
                .contains("straight-line reference: gate evals/s", "compiled (default) / straight-line reference")
                .contains("Default engine: auto");
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
