package org.thermion.cli;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** The help a builder reads lists the builder's commands; developer tools stay out of it. */
class MainHelpTest {
    @Test
    void topLevelHelpListsTheBuildersCommandsButNotBench() {
        CheckCommandTest.Result r = CheckCommandTest.run("--help");
        assertThat(r.code()).isZero();
        assertThat(r.out()).containsPattern("(?m)^ +check ").contains("run ", "asm ", "budget ", "powerup ", "timing ", "verify ", "plan ", "diagnose ", "sheets ")
                .doesNotContainPattern("(?m)^ +bench ");
    }

    @Test
    void runHelpLeavesTheEngineChoiceToDevelopers() {
        CheckCommandTest.Result r = CheckCommandTest.run("run", "--help");
        assertThat(r.out()).contains("--cycles").doesNotContain("--engine");
    }

    @Test
    void theHiddenToolsStillWork() {
        assertThat(CheckCommandTest.run("bench", "--help").out()).contains("Usage: thermion bench");
        CheckCommandTest.Result r = CheckCommandTest.run("run", "examples/pumpstation/pumpstation.machine",
                "programs/pump.asm", "--engine", "array", "--cycles", "5");
        assertThat(r.code()).isZero();
    }
}
